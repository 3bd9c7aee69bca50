package org.halyard.survey;

import org.halyard.model.FieldDirection;

/**
 * The Earth's field used by the processing, and where it came from.
 *
 * @param direction   inclination (positive down) and declination (clockwise from north), degrees
 * @param intensityNt total intensity, nT
 * @param source      a sentence saying where the values come from, for the run's messages
 */
public record FieldEstimate(FieldDirection direction, double intensityNt, String source) {

    /**
     * The field from the median base-station components over the survey span: I = atan2(Z, H),
     * D = atan2(Y, X), F = sqrt(X^2 + Y^2 + Z^2) (the definitions of the geomagnetic elements, e.g.
     * Campbell 2003, Introduction to Geomagnetic Fields, ch. 1).
     *
     * <p><b>Limitations:</b> D is from geographic north; the grid convergence of the map projection is not
     * applied (under a degree near a UTM central meridian). The base station's own crustal field is
     * included.
     *
     * @param base the base station
     * @param tmin start of the survey, epoch seconds
     * @param tmax end of the survey, epoch seconds
     * @throws IllegalArgumentException when the base station has no valid components in that span
     */
    public static FieldEstimate fromBaseStation(BaseStation base, double tmin, double tmax) {
        double[] t = base.time();
        int n = 0;
        double[] xs = new double[t.length], ys = new double[t.length], zs = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            if (t[i] >= tmin && t[i] <= tmax && !Double.isNaN(base.north()[i]) && !Double.isNaN(base.east()[i])
                    && !Double.isNaN(base.down()[i])) {
                xs[n] = base.north()[i];
                ys[n] = base.east()[i];
                zs[n] = base.down()[i];
                n++;
            }
        }
        if (n == 0) {
            throw new IllegalArgumentException(base.source() + ": no valid X, Y, Z (or H, D, Z) samples during the "
                    + "survey to derive the field direction from; give a 'field' block in the recipe");
        }
        double x = Robust.median(java.util.Arrays.copyOf(xs, n));
        double y = Robust.median(java.util.Arrays.copyOf(ys, n));
        double z = Robust.median(java.util.Arrays.copyOf(zs, n));
        FieldDirection d = FieldDirection.ofVector(y, x, z);
        double f = Math.sqrt(x * x + y * y + z * z);
        String msg = String.format(java.util.Locale.ROOT,
                "field direction and intensity taken from base station %s (median of %d samples during the survey): "
                        + "inclination %.2f deg, declination %.2f deg, intensity %.0f nT; the recipe has no 'field' block",
                base.stationCode().isBlank() ? base.source() : base.stationCode(), n, d.inclinationDeg(),
                d.declinationDeg(), f);
        return new FieldEstimate(d, f, msg);
    }
}
