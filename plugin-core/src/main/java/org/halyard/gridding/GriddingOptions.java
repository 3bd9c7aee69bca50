package org.halyard.gridding;

/**
 * Parameters of {@link SplineGridder}: an immutable value with checked ranges.
 *
 * @param tension          tension of the spline, 0 (pure minimum curvature, may overshoot between lines)
 *                         to below 1 (harmonic, no overshoot); dimensionless, default {@value #DEFAULT_TENSION}
 * @param convergenceLimit the solve at each level stops when no node changes by more than this in one sweep,
 *                         in the unit of the values (nT); {@code NaN} means {@value #DEFAULT_RELATIVE_LIMIT}
 *                         of the data range
 * @param maxSweeps        cap on relaxation sweeps per level, at least 1
 * @param statistic        how samples sharing a cell are merged
 * @param blankDistance    cells whose centre is farther than this from the nearest cell with data are blanked,
 *                         metres; {@code NaN} means automatic ({@link SplineGridder} states the rule),
 *                         {@code +Infinity} keeps every cell
 * @param gradientReach    gradient-enhanced mode only: how far each gradient sample extrapolates to nodes
 *                         without data, metres; {@code NaN} means automatic ({@link GradientExtrapolation})
 */
public record GriddingOptions(double tension, double convergenceLimit, int maxSweeps, BlockStatistic statistic,
                              double blankDistance, double gradientReach) {

    /** Default tension; tension above zero avoids false maxima between lines (Smith and Wessel 1990). */
    public static final double DEFAULT_TENSION = 0.25;
    /** Default convergence limit as a fraction of the data range. */
    public static final double DEFAULT_RELATIVE_LIMIT = 1e-5;
    /** Default cap on sweeps per level. */
    public static final int DEFAULT_MAX_SWEEPS = 500;

    public GriddingOptions {
        if (!(tension >= 0 && tension < 1)) {
            throw new IllegalArgumentException("tension must be at least 0 and below 1, got " + tension);
        }
        if (!(convergenceLimit > 0) && !Double.isNaN(convergenceLimit)) {
            throw new IllegalArgumentException("convergence limit must be positive, got " + convergenceLimit);
        }
        if (maxSweeps < 1) {
            throw new IllegalArgumentException("sweeps per level must be at least 1, got " + maxSweeps);
        }
        if (statistic == null) {
            throw new IllegalArgumentException("block statistic must be MEDIAN or MEAN, got null");
        }
        if (!(blankDistance > 0) && !Double.isNaN(blankDistance)) {
            throw new IllegalArgumentException("blanking distance must be positive metres, got " + blankDistance);
        }
        if (!(gradientReach > 0) && !Double.isNaN(gradientReach)) {
            throw new IllegalArgumentException("gradient reach must be positive metres, got " + gradientReach);
        }
    }

    /**
     * Tension 0.25, automatic limit and blanking, mean block reduction (it averages sensor noise; on the
     * benchmark data it was 4 % closer to the exact field than the median, docs/benchmarks.md).
     */
    public static GriddingOptions defaults() {
        return new GriddingOptions(DEFAULT_TENSION, Double.NaN, DEFAULT_MAX_SWEEPS, BlockStatistic.MEAN,
                Double.NaN, Double.NaN);
    }

    /** @param t tension, dimensionless, 0 to below 1 */
    public GriddingOptions withTension(double t) {
        return new GriddingOptions(t, convergenceLimit, maxSweeps, statistic, blankDistance, gradientReach);
    }

    /** @param limit largest change per sweep at convergence, in the unit of the values */
    public GriddingOptions withConvergenceLimit(double limit) {
        return new GriddingOptions(tension, limit, maxSweeps, statistic, blankDistance, gradientReach);
    }

    /** @param n cap on relaxation sweeps per level, at least 1 */
    public GriddingOptions withMaxSweeps(int n) {
        return new GriddingOptions(tension, convergenceLimit, n, statistic, blankDistance, gradientReach);
    }

    /** @param s how samples sharing a cell are merged */
    public GriddingOptions withStatistic(BlockStatistic s) {
        return new GriddingOptions(tension, convergenceLimit, maxSweeps, s, blankDistance, gradientReach);
    }

    /** @param metres blanking distance; {@code Double.POSITIVE_INFINITY} keeps every cell */
    public GriddingOptions withBlankDistance(double metres) {
        return new GriddingOptions(tension, convergenceLimit, maxSweeps, statistic, metres, gradientReach);
    }

    /** @param metres reach of each gradient sample in gradient-enhanced mode */
    public GriddingOptions withGradientReach(double metres) {
        return new GriddingOptions(tension, convergenceLimit, maxSweeps, statistic, blankDistance, metres);
    }
}
