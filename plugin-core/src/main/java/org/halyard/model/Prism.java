package org.halyard.model;

/**
 * A uniformly magnetised rectangular prism with sides parallel to the axes, and its total-field anomaly.
 *
 * <p><b>Algorithm:</b> the closed form of Bhattacharyya (1964, Geophysics 29(4) 517-531, eq. 11) for a
 * prism extending from its top to infinite depth, in the arrangement of Blakely (1995, Potential Theory in
 * Gravity and Magnetic Applications, section 9.4 and subroutine {@code mbox}); a finite prism is the
 * difference of two semi-infinite ones, top minus bottom. The logarithm arguments
 * {@code (r - a) / (r + a)} are evaluated in the cancellation-free form {@code (r - a)^2 / (r^2 - a^2)} or
 * {@code (r^2 - a^2) / (r + a)^2}, whichever avoids subtracting nearly equal numbers, so the far field
 * stays accurate.
 *
 * <p><b>Conventions:</b> x east, y north, z down, metres; magnetisation components in A/m in the same
 * frame (east, north, down); anomalies in nT. The total-field anomaly is the projection of the prism's
 * field on the Earth-field unit vector, valid while that field is much smaller than the main field.
 *
 * <p><b>Accuracy:</b> double precision closed form; tested against a fine sum of dipoles and against the
 * far field of a dipole of equal moment.
 *
 * <p><b>Limitations:</b> the observation point must lie above the prism's top ({@code pz < zTop}), which is
 * how a survey sees buried geology; no self-demagnetisation.
 *
 * <p><b>Thread safety:</b> immutable.
 *
 * @param xMin    west face, m
 * @param xMax    east face, m
 * @param yMin    south face, m
 * @param yMax    north face, m
 * @param zTop    depth of the top face, m, positive down
 * @param zBottom depth of the bottom face, m, positive down, greater than {@code zTop}
 * @param mEast   east component of the magnetisation, A/m
 * @param mNorth  north component of the magnetisation, A/m
 * @param mDown   down component of the magnetisation, A/m
 */
public record Prism(double xMin, double xMax, double yMin, double yMax, double zTop, double zBottom,
                    double mEast, double mNorth, double mDown) {

    /** mu0 / (4 pi) in T m / A. */
    private static final double CM = 1e-7;
    /** Tesla to nanotesla. */
    private static final double T_TO_NT = 1e9;

    public Prism {
        if (!(xMax > xMin) || !(yMax > yMin) || !(zBottom > zTop)) {
            throw new IllegalArgumentException("prism needs xMax > xMin, yMax > yMin and zBottom > zTop, got x "
                    + xMin + ".." + xMax + ", y " + yMin + ".." + yMax + ", z " + zTop + ".." + zBottom);
        }
        if (!Double.isFinite(mEast + mNorth + mDown)) {
            throw new IllegalArgumentException("prism magnetisation must be finite");
        }
    }

    /**
     * A prism magnetised by induction only: M = chi B0 / mu0 along the Earth field.
     *
     * @param susceptibility volume susceptibility, SI (dimensionless), small compared with 1
     * @param fieldNt        Earth-field intensity, nT
     * @param field          Earth-field direction (inclination positive down, declination clockwise from north)
     */
    public static Prism induced(double xMin, double xMax, double yMin, double yMax, double zTop, double zBottom,
                                double susceptibility, double fieldNt, FieldDirection field) {
        double m = susceptibility * fieldNt / T_TO_NT / (4 * Math.PI * CM);
        return new Prism(xMin, xMax, yMin, yMax, zTop, zBottom,
                m * field.east(), m * field.north(), m * field.down());
    }

    /** Volume, m3. */
    public double volume() {
        return (xMax - xMin) * (yMax - yMin) * (zBottom - zTop);
    }

    /**
     * Total-field anomaly in nT at an observation point above the prism.
     *
     * @param px    easting of the observation, m
     * @param py    northing of the observation, m
     * @param pz    depth of the observation, m, positive down; must be less than {@link #zTop()}
     * @param field Earth-field direction onto which the anomaly is projected
     */
    public double totalField(double px, double py, double pz, FieldDirection field) {
        if (!(pz < zTop)) {
            throw new IllegalArgumentException("prism anomaly is computed only above the prism top (z "
                    + zTop + " m), observation at z " + pz + " m");
        }
        // Bhattacharyya's frame is (north, east, down): a = north, b = east, c = down.
        double ma = mNorth, mb = mEast, mc = mDown;
        double fa = field.north(), fb = field.east(), fc = field.down();
        double[] fm = {ma * fb + mb * fa, ma * fc + mc * fa, mb * fc + mc * fb, ma * fa, mb * fb, mc * fc};
        double a1 = yMin - py, a2 = yMax - py, b1 = xMin - px, b2 = xMax - px;
        double top = semiInfinite(a1, a2, b1, b2, zTop - pz, fm);
        double bottom = semiInfinite(a1, a2, b1, b2, zBottom - pz, fm);
        return (top - bottom) * CM * T_TO_NT;
    }

    /** Blakely's {@code mbox} sum over the four vertical edges, without the constant factor. */
    private static double semiInfinite(double a1, double a2, double b1, double b2, double h, double[] fm) {
        double[] alpha = {a1, a2};
        double[] beta = {b1, b2};
        double hsq = h * h;
        double t = 0;
        for (int i = 0; i < 2; i++) {
            double al = alpha[i];
            double alsq = al * al;
            for (int j = 0; j < 2; j++) {
                double be = beta[j];
                double sign = i == j ? 1 : -1;
                double r0sq = alsq + be * be + hsq;
                double r0 = Math.sqrt(r0sq);
                double r0h = r0 * h;
                double ab = al * be;
                double tlog = fm[2] * Math.log(ratio(r0, al, be * be + hsq)) / 2
                        + fm[1] * Math.log(ratio(r0, be, alsq + hsq)) / 2
                        - fm[0] * Math.log(r0 + h);
                double tatan = -fm[3] * Math.atan2(ab, alsq + r0h + hsq)
                        - fm[4] * Math.atan2(ab, r0sq + r0h - alsq)
                        + fm[5] * Math.atan2(ab, r0h);
                t += sign * (tlog + tatan);
            }
        }
        return t;
    }

    /** {@code (r - a) / (r + a)} where {@code rest = r^2 - a^2 > 0}, without cancellation. */
    private static double ratio(double r, double a, double rest) {
        return a > 0 ? rest / ((r + a) * (r + a)) : (r - a) * (r - a) / rest;
    }
}
