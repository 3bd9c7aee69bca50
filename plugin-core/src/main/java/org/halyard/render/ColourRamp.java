package org.halyard.render;

import java.util.List;
import java.util.Locale;

/**
 * A continuous colour ramp from position 0 to 1, defined by control points in OKLCh and interpolated in
 * OKLab, tabulated to {@value #SIZE} colours (odd, so that 0.5 falls on an entry).
 *
 * <p>Halyard's ramps are its own design:
 * <ul>
 * <li>{@link #SHOAL}: sequential, from a dark kelp blue-green through sea teal and lichen to pale sand;
 *     lightness rises linearly, so equal steps in value read as equal steps in the picture. For
 *     one-signed fields (total field, analytic signal, bathymetry).</li>
 * <li>{@link #WAKE}: diverging for signed fields (derivatives, tilt): a cool slate-indigo arm and a warm
 *     brick arm of equal lightness at equal distance from a pale stone centre at 0.5. Pair it with
 *     {@link LinearStretch#symmetric} so that zero lands on the centre.</li>
 * <li>{@link #PEWTER}: a neutral grey from near black to near white, for shaded relief on its own.</li>
 * </ul>
 *
 * <p><b>Algorithm:</b> piecewise-linear interpolation in OKLab (Ottosson 2020, see {@link Oklab}); the
 * control points lie inside the sRGB gamut so no colour is clipped (checked by a test).
 *
 * <p><b>Thread safety:</b> immutable.
 */
public final class ColourRamp {

    /** Number of tabulated colours. */
    public static final int SIZE = 1025;

    /** Sequential ramp: kelp, teal, lichen, sand. */
    public static final ColourRamp SHOAL = new ColourRamp("shoal", false,
            Oklab.fromLch(0.24, 0.045, 235),
            Oklab.fromLch(0.42, 0.066, 205),
            Oklab.fromLch(0.60, 0.085, 165),
            Oklab.fromLch(0.78, 0.080, 110),
            Oklab.fromLch(0.95, 0.035, 85));

    /** Diverging ramp for signed fields: indigo, pale stone at 0.5, brick. */
    public static final ColourRamp WAKE = new ColourRamp("wake", true,
            Oklab.fromLch(0.34, 0.090, 270),
            Oklab.fromLch(0.62, 0.080, 255),
            Oklab.fromLch(0.94, 0.012, 80),
            Oklab.fromLch(0.62, 0.105, 40),
            Oklab.fromLch(0.34, 0.090, 30));

    /** Neutral grey ramp. */
    public static final ColourRamp PEWTER = new ColourRamp("pewter", false,
            Oklab.fromLch(0.12, 0.005, 250),
            Oklab.fromLch(0.97, 0.005, 250));

    private final String name;
    private final boolean diverging;
    private final double[][] controlPoints;
    private final int[] table = new int[SIZE];

    private ColourRamp(String name, boolean diverging, double[]... controlPointsLab) {
        this.name = name;
        this.diverging = diverging;
        this.controlPoints = controlPointsLab;
        for (int i = 0; i < SIZE; i++) {
            table[i] = Oklab.toArgb(lab(i / (double) (SIZE - 1)));
        }
    }

    /** Every built-in ramp, sequential first. */
    public static List<ColourRamp> all() {
        return List.of(SHOAL, WAKE, PEWTER);
    }

    /** The built-in ramp of that name (case-insensitive). */
    public static ColourRamp named(String name) {
        for (ColourRamp r : all()) {
            if (r.name.equalsIgnoreCase(name)) {
                return r;
            }
        }
        throw new IllegalArgumentException("unknown colour ramp '" + name + "'; choose one of "
                + all().stream().map(ColourRamp::name).toList());
    }

    public String name() {
        return name;
    }

    /** Whether the ramp is diverging (meant for a signed field centred on zero at position 0.5). */
    public boolean isDiverging() {
        return diverging;
    }

    /**
     * The colour at position {@code t}, packed opaque ARGB; {@code t} is clamped to [0, 1] and a
     * {@code NaN} gives fully transparent 0.
     */
    public int argb(double t) {
        if (Double.isNaN(t)) {
            return 0;
        }
        double c = Math.max(0, Math.min(1, t));
        return table[(int) Math.round(c * (SIZE - 1))];
    }

    /** The exact (untabulated) OKLab colour {@code {L, a, b}} at position {@code t} in [0, 1]. */
    public double[] lab(double t) {
        double c = Math.max(0, Math.min(1, t)) * (controlPoints.length - 1);
        int i = Math.min((int) Math.floor(c), controlPoints.length - 2);
        double f = c - i;
        double[] p = controlPoints[i], q = controlPoints[i + 1];
        return new double[] {p[0] + f * (q[0] - p[0]), p[1] + f * (q[1] - p[1]), p[2] + f * (q[2] - p[2])};
    }

    @Override
    public String toString() {
        return name.toUpperCase(Locale.ROOT).charAt(0) + name.substring(1);
    }
}
