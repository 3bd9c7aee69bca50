package org.halyard.survey;

/**
 * What to do about the time lag between positions and readings ({@link LagEstimator}, {@link LagShift}).
 *
 * @param estimate      whether to estimate the lag from neighbouring traverse lines run in opposite directions
 * @param applyEstimate whether to shift the positions by the estimated lag (needs {@code estimate})
 * @param givenLagS     a known lag to shift the positions by, s (positive: readings late); NaN for none
 * @param maxLagS       the largest lag the estimate tries either way, s (&gt; 0); default 2
 */
public record LagOptions(boolean estimate, boolean applyEstimate, double givenLagS, double maxLagS) {

    /** Default search range of the estimate, s. */
    public static final double DEFAULT_MAX_LAG_S = 2;

    /** Neither estimated nor applied (the default). */
    public static final LagOptions OFF = new LagOptions(false, false, Double.NaN, DEFAULT_MAX_LAG_S);

    public LagOptions {
        if (applyEstimate && !estimate) {
            throw new IllegalArgumentException("applying the estimated lag needs the lag estimate turned on");
        }
        if (applyEstimate && !Double.isNaN(givenLagS)) {
            throw new IllegalArgumentException("give either a lag to apply or ask for the estimate to be applied, not both");
        }
        if (Double.isInfinite(givenLagS)) {
            throw new IllegalArgumentException("the lag must be a finite number of seconds");
        }
        if (!(maxLagS > 0) || Double.isInfinite(maxLagS)) {
            throw new IllegalArgumentException("the largest lag tried must be a positive number of seconds, got " + maxLagS);
        }
    }

    /** Whether any lag work is asked for. */
    public boolean any() {
        return estimate || !Double.isNaN(givenLagS);
    }
}
