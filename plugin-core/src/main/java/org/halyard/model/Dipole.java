package org.halyard.model;

/**
 * A point magnetic dipole and its field.
 *
 * <p><b>Algorithm:</b> B = mu0/(4 pi) [3 (m . r^) r^ - m] / r^3 (Blakely 1995, Potential Theory in Gravity
 * and Magnetic Applications, eq. 4.13). The total-field anomaly is the projection of B on the Earth-field
 * unit vector, valid while |B| is much smaller than the main field (Blakely 1995, section 12.1).
 *
 * <p><b>Conventions:</b> x east, y north, z down, metres; moment components in A m2; fields in nT.
 *
 * <p><b>Thread safety:</b> immutable.
 *
 * @param x  easting of the dipole, m
 * @param y  northing of the dipole, m
 * @param z  depth of the dipole, m, positive down (in the same vertical datum as the observation z)
 * @param mx east component of the moment, A m2
 * @param my north component of the moment, A m2
 * @param mz down component of the moment, A m2
 */
public record Dipole(double x, double y, double z, double mx, double my, double mz) {

    /** mu0 / (4 pi) in T m / A, times 1e9 to give nT. */
    static final double CM_NT = 1e-7 * 1e9;

    /** A dipole of moment {@code moment} (A m2) pointing along {@code direction}. */
    public static Dipole along(double x, double y, double z, double moment, FieldDirection direction) {
        return new Dipole(x, y, z, moment * direction.east(), moment * direction.north(), moment * direction.down());
    }

    /** Moment magnitude, A m2. */
    public double moment() {
        return Math.sqrt(mx * mx + my * my + mz * mz);
    }

    /**
     * The field vector at an observation point, written into {@code out} as {east, north, down} in nT.
     *
     * @param px easting of the observation, m
     * @param py northing of the observation, m
     * @param pz depth of the observation, m, positive down (a sensor above the source has {@code pz < z})
     */
    public void field(double px, double py, double pz, double[] out) {
        double rx = px - x, ry = py - y, rz = pz - z;
        double r2 = rx * rx + ry * ry + rz * rz;
        if (r2 == 0) {
            throw new IllegalArgumentException("observation point coincides with the dipole");
        }
        double r = Math.sqrt(r2);
        double mdotr = (mx * rx + my * ry + mz * rz) / r;
        double k = CM_NT / (r2 * r);
        out[0] = k * (3 * mdotr * rx / r - mx);
        out[1] = k * (3 * mdotr * ry / r - my);
        out[2] = k * (3 * mdotr * rz / r - mz);
    }

    /**
     * Total-field anomaly in nT: the field projected on the Earth-field direction {@code f}.
     *
     * @param pz depth of the observation, m, positive down
     */
    public double totalField(double px, double py, double pz, FieldDirection f) {
        return totalField(px - x, py - y, pz - z, mx, my, mz, f.east(), f.north(), f.down());
    }

    /**
     * The kernel of {@link #totalField(double, double, double, FieldDirection)} on plain numbers, for loops
     * over many dipoles (no allocation, no trigonometry): the anomaly in nT of moment (mx, my, mz) A m2 seen
     * from offset (rx, ry, rz) = observation minus dipole, metres (x east, y north, z down), projected on the
     * unit vector (fe, fn, fd).
     */
    public static double totalField(double rx, double ry, double rz, double mx, double my, double mz,
                                    double fe, double fn, double fd) {
        double r2 = rx * rx + ry * ry + rz * rz;
        if (r2 == 0) {
            throw new IllegalArgumentException("observation point coincides with the dipole");
        }
        double r = Math.sqrt(r2);
        double k = CM_NT / (r2 * r);
        double mdotr = (mx * rx + my * ry + mz * rz) / r2;
        double fdotr = fe * rx + fn * ry + fd * rz;
        return k * (3 * mdotr * fdotr - (mx * fe + my * fn + mz * fd));
    }
}
