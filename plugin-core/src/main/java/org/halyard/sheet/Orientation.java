package org.halyard.sheet;

/** Which way up the paper is: portrait (long side vertical) or landscape (long side horizontal). */
public enum Orientation {
    PORTRAIT,
    LANDSCAPE;

    /** Parses {@code portrait} or {@code landscape}, any case. */
    public static Orientation parse(String s) {
        for (Orientation o : values()) {
            if (o.name().equalsIgnoreCase(s.trim())) {
                return o;
            }
        }
        throw new IllegalArgumentException("unknown orientation '" + s + "': use portrait or landscape");
    }
}
