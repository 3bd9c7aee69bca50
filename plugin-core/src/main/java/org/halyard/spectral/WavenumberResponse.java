package org.halyard.spectral;

/**
 * A linear filter given by its complex response in the wavenumber domain, for fields that are real and
 * harmonic above their sources.
 *
 * <p>Conventions: kx towards east, ky towards north, rad/m, k = sqrt(kx^2 + ky^2); F(d/dx) = i kx,
 * F(d/dy) = i ky, z down (Blakely 1995, ch. 12). A response must be Hermitian,
 * {@code H(-kx, -ky) = conj(H(kx, ky))}, so that filtered real fields stay real.
 */
public interface WavenumberResponse {

    /**
     * Writes the response at (kx, ky) into {@code out[0]} (real part) and {@code out[1]} (imaginary part).
     *
     * @param kx east wavenumber, rad/m
     * @param ky north wavenumber, rad/m
     * @param k  sqrt(kx^2 + ky^2), rad/m, given to save its computation
     */
    void at(double kx, double ky, double k, double[] out);

    /**
     * What the filter makes of the plane removed before the transform. A plane is harmonic, so the exact
     * answer is known: continuation keeps it, a derivative turns it into its slope or zero.
     */
    LinearTrend onTrend(LinearTrend trend);

    /**
     * Whether the response depends on k alone (continuation, vertical derivatives), so that the engine may
     * evaluate it once for each pair of wavenumbers {@code (kx, ky)} and {@code (kx, -ky)}.
     */
    default boolean radial() {
        return false;
    }

    /** The product of this response and {@code then}: this filter applied first. */
    default WavenumberResponse andThen(WavenumberResponse then) {
        WavenumberResponse first = this;
        return new WavenumberResponse() {
            @Override
            public void at(double kx, double ky, double k, double[] out) {
                first.at(kx, ky, k, out);
                double re = out[0], im = out[1];
                then.at(kx, ky, k, out);
                double re2 = out[0], im2 = out[1];
                out[0] = re * re2 - im * im2;
                out[1] = re * im2 + im * re2;
            }

            @Override
            public LinearTrend onTrend(LinearTrend trend) {
                return then.onTrend(first.onTrend(trend));
            }

            @Override
            public boolean radial() {
                return first.radial() && then.radial();
            }
        };
    }
}
