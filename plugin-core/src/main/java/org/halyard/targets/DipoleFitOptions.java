package org.halyard.targets;

/**
 * How a dipole is fitted to the line samples around a pick.
 *
 * @param radiusM        samples within this horizontal distance of the start position are used, metres
 * @param background     the background fitted with the dipole
 * @param minSamples     fewer usable samples than this and no fit is attempted
 * @param maxIterations  Levenberg-Marquardt iteration cap
 * @param maxShiftFactor a fit landing farther from the analytic-signal peak than this times its depth below
 *                       the sensors (and more than 1 m) is rejected: the peak of the analytic signal lies
 *                       nearly over a compact source whatever its magnetisation (Roest et al. 1992)
 */
public record DipoleFitOptions(double radiusM, Background background, int minSamples, int maxIterations,
                               double maxShiftFactor) {

    /** What is fitted beside the dipole. */
    public enum Background {
        /** Nothing: the anomaly is the dipole alone. */
        NONE(0),
        /** A constant, nT. */
        CONSTANT(1),
        /** A plane a + b (x - x0) + c (y - y0), nT and nT/m: absorbs the flank of a neighbouring source. */
        PLANE(3),
        /** A quadratic surface, adding (x - x0)^2, (x - x0)(y - y0), (y - y0)^2 to the plane. */
        QUADRATIC(6),
        /**
         * The plane or the quadratic, whichever the Bayesian information criterion prefers (Schwarz 1978,
         * Annals of Statistics 6(2), 461-464): the quadratic only when the curvature of a neighbour's field
         * (a pipe or a stronger object a few metres off) is worth its three extra terms.
         */
        AUTO(-1);

        /** Number of background parameters. */
        final int terms;

        Background(int terms) {
            this.terms = terms;
        }
    }

    /** 6 m radius, plane or quadratic background by BIC, at least 20 samples, 200 iterations, shift up to half the depth. */
    public static final DipoleFitOptions DEFAULT = new DipoleFitOptions(6, Background.AUTO, 20, 200, 0.5);

    public DipoleFitOptions {
        if (!(radiusM > 0)) {
            throw new IllegalArgumentException("dipole fit radius must be positive metres, got " + radiusM);
        }
        if (background == null) {
            throw new IllegalArgumentException("dipole fit background must be NONE, CONSTANT, PLANE, QUADRATIC or AUTO");
        }
        if (minSamples < 8) {
            throw new IllegalArgumentException("a dipole fit needs at least 8 samples, got " + minSamples);
        }
        if (!(maxShiftFactor > 0)) {
            throw new IllegalArgumentException("dipole fit shift factor must be positive, got " + maxShiftFactor);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("dipole fit needs at least one iteration, got " + maxIterations);
        }
    }
}
