package org.halyard.targets;

/**
 * Demagnetising factors of a prolate spheroid (a rod-like body), for the moment-to-mass relation.
 *
 * <p><b>Algorithm:</b> along the long axis, with aspect ratio a = length / diameter and eccentricity
 * e = sqrt(1 - 1/a^2), N = (1/e^2 - 1) [ln((1 + e)/(1 - e)) / (2 e) - 1] (Osborn 1945, Phys. Rev. 67,
 * 351-357, eq. 2.5); across it, (1 - N) / 2 since the three factors sum to one (Osborn 1945). A sphere
 * (a = 1) has 1/3 on every axis.
 *
 * <p><b>Accuracy:</b> closed form; near a = 1 a series avoids the cancellation.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class SpheroidDemagnetisation {

    private SpheroidDemagnetisation() {
    }

    /** Factor along the long axis (dimensionless, 0 to 1/3) for aspect ratio {@code a >= 1}. */
    public static double axial(double aspect) {
        if (!(aspect >= 1)) {
            throw new IllegalArgumentException("spheroid aspect ratio (length/diameter) must be at least 1, got " + aspect);
        }
        double e2 = 1 - 1 / (aspect * aspect);
        if (e2 < 1e-4) {
            // Series of the closed form in e^2 (from the Taylor expansion of ln((1+e)/(1-e))).
            return 1.0 / 3 - 2.0 / 15 * e2;
        }
        double e = Math.sqrt(e2);
        return (1 / e2 - 1) * (Math.log((1 + e) / (1 - e)) / (2 * e) - 1);
    }

    /** Factor across the long axis (dimensionless, 1/3 to 1/2) for aspect ratio {@code a >= 1}. */
    public static double transverse(double aspect) {
        return 0.5 * (1 - axial(aspect));
    }
}
