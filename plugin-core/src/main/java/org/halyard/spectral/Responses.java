package org.halyard.spectral;

import org.halyard.model.FieldDirection;

/**
 * The wavenumber responses of the potential-field filters (Blakely 1995, Potential Theory in Gravity and
 * Magnetic Applications, ch. 12). Conventions as {@link WavenumberResponse}: kx east, ky north, rad/m,
 * z down; heights in metres; outputs in the unit of the input times m^-n for an n-th derivative.
 */
public final class Responses {

    private Responses() {
    }

    /**
     * Upward continuation by {@code height} metres: {@code exp(-k h)} (Blakely 1995, eq. 12.8).
     *
     * @param height distance upward, metres, at least 0
     */
    public static WavenumberResponse upward(double height) {
        requireNonNegative(height, "upward continuation height");
        return real(k -> Math.exp(-k * height), t -> t);
    }

    /**
     * Downward continuation by {@code depth} metres, regularised (Tikhonov):
     * {@code exp(k d) / (1 + alpha exp(2 k d))}. Exact continuation is unstable (Blakely 1995, section
     * 12.3.2); with the damping the gain never exceeds {@code 1 / (2 sqrt(alpha))}.
     *
     * @param depth distance downward, metres, at least 0
     * @param alpha damping, dimensionless, positive (1e-3 caps the gain near 16)
     */
    public static WavenumberResponse downward(double depth, double alpha) {
        requireNonNegative(depth, "downward continuation depth");
        if (!(alpha > 0)) {
            throw new IllegalArgumentException("downward continuation needs a positive damping, got " + alpha);
        }
        return real(k -> {
            double g = Math.exp(Math.min(k * depth, 300));
            return g / (1 + alpha * g * g);
        }, t -> t);
    }

    /**
     * Vertical derivative of order {@code order} (fractional allowed): {@code k^n}, z down, so the result
     * is d^nT/dz^n with z positive down (Blakely 1995, eq. 12.12). Unit: input unit per metre^n.
     *
     * @param order derivative order, positive
     */
    public static WavenumberResponse verticalDerivative(double order) {
        if (!(order > 0) || order > 4) {
            throw new IllegalArgumentException("vertical derivative order must be in (0, 4], got " + order);
        }
        return real(k -> Math.pow(k, order), t -> LinearTrend.zero(t.x0(), t.y0()));
    }

    /** Derivative towards east, {@code i kx}; unit per metre. */
    public static WavenumberResponse dx() {
        return horizontalDerivative(true);
    }

    /** Derivative towards north, {@code i ky}; unit per metre. */
    public static WavenumberResponse dy() {
        return horizontalDerivative(false);
    }

    private static WavenumberResponse horizontalDerivative(boolean east) {
        return new WavenumberResponse() {
            @Override
            public void at(double kx, double ky, double k, double[] out) {
                out[0] = 0;
                out[1] = east ? kx : ky;
            }

            @Override
            public LinearTrend onTrend(LinearTrend t) {
                return new LinearTrend(east ? t.bx() : t.by(), 0, 0, t.x0(), t.y0());
            }
        };
    }

    /**
     * The vertical derivative (z down) contributed by a measured east gradient: {@code -i kx / k}. Summed
     * with {@link #verticalFromNorthGradient()} applied to the north gradient it gives Tz of a harmonic
     * field, F(Tz) = -i (kx F(Tx) + ky F(Ty)) / k (Nabighian 1984, Geophysics 49(6), the Hilbert-transform
     * pair; verified with a dipole in the tests).
     */
    public static WavenumberResponse verticalFromEastGradient() {
        return hilbert(true);
    }

    /** The north-gradient half of the vertical derivative from horizontal gradients: {@code -i ky / k}. */
    public static WavenumberResponse verticalFromNorthGradient() {
        return hilbert(false);
    }

    private static WavenumberResponse hilbert(boolean east) {
        return new WavenumberResponse() {
            @Override
            public void at(double kx, double ky, double k, double[] out) {
                out[0] = 0;
                out[1] = k == 0 ? 0 : -(east ? kx : ky) / k;
            }

            @Override
            public LinearTrend onTrend(LinearTrend t) {
                return LinearTrend.zero(t.x0(), t.y0()); // a uniform gradient has no vertical counterpart
            }
        };
    }

    /**
     * Reduction to the pole: {@code 1 / (Theta_m Theta_f)} with
     * {@code Theta = n_z + i (n_x kx + n_y ky) / k} for the magnetisation and field unit vectors (Baranov
     * 1957; Blakely 1995, eq. 12.31).
     *
     * <p>Stabilisation: the phase always uses the true directions. Where an inclination is shallower than
     * {@code stabilisingInclinationDeg}, the amplitude of its Theta is taken from a pseudo-inclination of
     * that value (same declination), in the manner of MacLeod, Jones and Dai (1993); at or above it the
     * filter is exact. The response at k = 0 is {@code 1 / (n_z,m n_z,f)} (pseudo values when stabilised).
     *
     * @param field                     Earth-field direction (inclination positive down)
     * @param magnetisation             magnetisation direction; the field direction for induced
     * @param stabilisingInclinationDeg inclination in degrees below which the amplitude is stabilised, 0 to 90
     */
    public static WavenumberResponse reductionToPole(FieldDirection field, FieldDirection magnetisation,
                                                     double stabilisingInclinationDeg) {
        if (!(stabilisingInclinationDeg >= 0 && stabilisingInclinationDeg <= 90)) {
            throw new IllegalArgumentException("stabilising inclination must be 0 to 90 degrees, got "
                    + stabilisingInclinationDeg);
        }
        FieldDirection fa = pseudo(field, stabilisingInclinationDeg);
        FieldDirection ma = pseudo(magnetisation, stabilisingInclinationDeg);
        if (Math.abs(fa.down()) < 1e-3 || Math.abs(ma.down()) < 1e-3) {
            throw new IllegalArgumentException("reduction to the pole is undefined for a horizontal field or "
                    + "magnetisation; give a stabilising inclination above 0");
        }
        double[] f = field.unitVector(), m = magnetisation.unitVector();
        double[] fp = fa.unitVector(), mp = ma.unitVector();
        return new WavenumberResponse() {
            @Override
            public void at(double kx, double ky, double k, double[] out) {
                // P = Theta_f Theta_m with the true directions (phase and amplitude) ...
                double fi = horizontal(f, kx, ky, k), mi = horizontal(m, kx, ky, k);
                double pr = f[2] * m[2] - fi * mi;
                double pi = f[2] * mi + fi * m[2];
                // ... and the amplitude |Theta_f'| |Theta_m'| of the pseudo directions.
                double stabAmp = norm(fp[2], horizontal(fp, kx, ky, k))
                        * norm(mp[2], horizontal(mp, kx, ky, k));
                // 1/P = conj(P)/|P|^2, with one |P| replaced by the stabilised amplitude.
                double scale = 1.0 / (Math.sqrt(pr * pr + pi * pi) * stabAmp);
                out[0] = pr * scale;
                out[1] = -pi * scale;
            }

            @Override
            public LinearTrend onTrend(LinearTrend trend) {
                return trend; // a regional plane is kept as it is (common practice)
            }
        };
    }

    /** Imaginary part of Theta for unit vector n = {east, north, down}: (n_x kx + n_y ky) / k, 0 at k = 0. */
    private static double horizontal(double[] n, double kx, double ky, double k) {
        return k == 0 ? 0 : (n[0] * kx + n[1] * ky) / k;
    }

    private static double norm(double a, double b) {
        return Math.sqrt(a * a + b * b);
    }

    private static FieldDirection pseudo(FieldDirection d, double minInclination) {
        if (Math.abs(d.inclinationDeg()) >= minInclination) {
            return d;
        }
        double inc = d.inclinationDeg() < 0 ? -minInclination : minInclination;
        return new FieldDirection(inc, d.declinationDeg());
    }

    private interface RealOfK {
        double of(double k);
    }

    private static WavenumberResponse real(RealOfK f, java.util.function.UnaryOperator<LinearTrend> trend) {
        return new WavenumberResponse() {
            @Override
            public void at(double kx, double ky, double k, double[] out) {
                out[0] = f.of(k);
                out[1] = 0;
            }

            @Override
            public LinearTrend onTrend(LinearTrend t) {
                return trend.apply(t);
            }

            @Override
            public boolean radial() {
                return true;
            }
        };
    }

    private static void requireNonNegative(double v, String what) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be a non-negative number of metres, got " + v);
        }
    }
}
