package org.halyard.targets;

/**
 * How a dipole is fitted to the line samples around a pick.
 *
 * @param radiusM        samples within this horizontal distance of the start position are used, metres
 * @param background     the background fitted with the dipole
 * @param minSamples     fewer usable samples than this and no fit is attempted
 * @param maxIterations  Levenberg-Marquardt iteration cap
 */
public record DipoleFitOptions(double radiusM, Background background, int minSamples, int maxIterations) {

    /** What is fitted beside the dipole. */
    public enum Background {
        /** Nothing: the anomaly is the dipole alone. */
        NONE(0),
        /** A constant, nT. */
        CONSTANT(1),
        /** A plane a + b (x - x0) + c (y - y0), nT and nT/m: absorbs the flank of a neighbouring source. */
        PLANE(3);

        /** Number of background parameters. */
        final int terms;

        Background(int terms) {
            this.terms = terms;
        }
    }

    /** 6 m radius, a plane background, at least 20 samples, 200 iterations. */
    public static final DipoleFitOptions DEFAULT = new DipoleFitOptions(6, Background.PLANE, 20, 200);

    public DipoleFitOptions {
        if (!(radiusM > 0)) {
            throw new IllegalArgumentException("dipole fit radius must be positive metres, got " + radiusM);
        }
        if (background == null) {
            throw new IllegalArgumentException("dipole fit background must be NONE, CONSTANT or PLANE");
        }
        if (minSamples < 8) {
            throw new IllegalArgumentException("a dipole fit needs at least 8 samples, got " + minSamples);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("dipole fit needs at least one iteration, got " + maxIterations);
        }
    }
}
