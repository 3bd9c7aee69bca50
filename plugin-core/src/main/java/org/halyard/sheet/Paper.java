package org.halyard.sheet;

/**
 * ISO 216 A-series paper sizes.
 *
 * <p>Sizes are the ISO 216 values in millimetres (portrait: width x height); points are
 * {@code mm * 72 / 25.4}.
 */
public enum Paper {
    A0(841, 1189),
    A1(594, 841),
    A2(420, 594),
    A3(297, 420),
    A4(210, 297);

    /** PDF points in a millimetre. */
    public static final double POINTS_PER_MM = 72.0 / 25.4;

    private final int shortMm;
    private final int longMm;

    Paper(int shortMm, int longMm) {
        this.shortMm = shortMm;
        this.longMm = longMm;
    }

    /** Length of the short side, millimetres (ISO 216). */
    public int shortSideMm() {
        return shortMm;
    }

    /** Length of the long side, millimetres (ISO 216). */
    public int longSideMm() {
        return longMm;
    }

    /** Parses {@code A4}, {@code a3} ...; the message lists the accepted names. */
    public static Paper parse(String s) {
        return parseEnum(Paper.class, s, "paper size");
    }

    /** The constant of {@code type} named {@code s} in any case; the message lists the accepted names. */
    static <E extends Enum<E>> E parseEnum(Class<E> type, String s, String what) {
        for (E e : type.getEnumConstants()) {
            if (e.name().equalsIgnoreCase(s.trim())) {
                return e;
            }
        }
        throw new IllegalArgumentException("unknown " + what + " '" + s + "': use one of "
                + java.util.Arrays.toString(type.getEnumConstants()).toLowerCase(java.util.Locale.ROOT));
    }
}
