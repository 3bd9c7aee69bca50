package org.halyard.targets;

/**
 * How ridges of the analytic signal become linear features.
 *
 * @param thresholdFactor  ridge cells must exceed {@code background + k sigma} of the grid, k
 * @param minAnisotropy    |curvature across| / |curvature along| at least this (1 or more)
 * @param maxAlongSlope    |gradient along the ridge| / value at most this, 1/m: a cable's analytic signal
 *                         varies slowly along it, the flank of a compact peak falls fast
 * @param maxTurnDeg       neighbouring ridge cells link when their directions differ by at most this, degrees
 * @param minLengthM       shortest feature kept, m
 * @param maxGapM          collinear pieces closer than this are merged, m
 * @param maxDeviationDeg  a feature's cells may turn from its overall axis by this on average, degrees
 * @param vertexSpacingM   spacing of the polyline vertices before simplification, m
 * @param labelDistanceM   a pick this close to a feature is labelled {@code linear}, m
 * @param dominance        ...unless its amplitude exceeds this times the feature's median amplitude
 * @param smoothingM       standard deviation of the Gaussian applied before the ridge test, m: about half the
 *                         survey's sensor-track spacing, to join the beads that line data leave along a ridge
 *                         (0 for none)
 * @param strikeSmoothingM standard deviation of a second Gaussian applied along the local ridge strike only
 *                         ({@link StrikeSmoother}), m: about one survey-line spacing, to even out a crest that
 *                         changes from line to line with the sensors' altitude (0 for none)
 * @param minEulerShare    a ridge is kept as a feature only where Euler deconvolution with the line-source
 *                         index gives an accepted depth at this share of its stations, 0 to 1 (0 keeps every
 *                         ridge); used where the field grids are known ({@link TargetAnalysis})
 */
public record LinearFeatureOptions(double thresholdFactor, double minAnisotropy, double maxAlongSlope,
                                   double maxTurnDeg, double minLengthM, double maxGapM, double maxDeviationDeg,
                                   double vertexSpacingM, double labelDistanceM, double dominance,
                                   double smoothingM, double strikeSmoothingM, double minEulerShare) {

    /**
     * Defaults for sensors 1 to 5 m above the objects, cells of 0.25 to 1 m, sensor tracks 1 to 3 m apart
     * (common practice); the gap bridges two lines of a 3 m line spacing and more, the strike smoothing averages
     * the crest over about five lines of that spacing.
     */
    public static final LinearFeatureOptions DEFAULT = new LinearFeatureOptions(5, 3, 0.1, 20, 20, 8, 25, 2, 3, 2,
            1.0, 3.0, 0.5);

    public LinearFeatureOptions {
        requirePositive(thresholdFactor, "ridge threshold factor");
        requirePositive(maxAlongSlope, "maximum along-ridge slope (1/m)");
        requirePositive(maxTurnDeg, "maximum turn between ridge cells (degrees)");
        requirePositive(minLengthM, "minimum feature length (m)");
        requirePositive(maxDeviationDeg, "maximum deviation from the feature axis (degrees)");
        requirePositive(vertexSpacingM, "vertex spacing (m)");
        requirePositive(dominance, "dominance factor");
        if (!(minAnisotropy >= 1)) {
            throw new IllegalArgumentException("minimum ridge anisotropy must be at least 1, got " + minAnisotropy);
        }
        if (!(minEulerShare >= 0 && minEulerShare <= 1)) {
            throw new IllegalArgumentException("Euler share must be between 0 and 1, got " + minEulerShare);
        }
        if (!(smoothingM >= 0) || !(strikeSmoothingM >= 0)) {
            throw new IllegalArgumentException("ridge smoothing must be 0 m or more, got " + smoothingM
                    + " and " + strikeSmoothingM + " along the strike");
        }
        if (!(maxGapM >= 0) || !(labelDistanceM >= 0)) {
            throw new IllegalArgumentException("gap and label distances must be 0 m or more, got " + maxGapM
                    + " and " + labelDistanceM);
        }
    }

    /** The same options with another ridge threshold factor and shortest length (the process's parameters). */
    public LinearFeatureOptions withThresholdAndLength(double k, double minLength) {
        return new LinearFeatureOptions(k, minAnisotropy, maxAlongSlope, maxTurnDeg, minLength, maxGapM,
                maxDeviationDeg, vertexSpacingM, labelDistanceM, dominance, smoothingM, strikeSmoothingM,
                minEulerShare);
    }

    private static void requirePositive(double v, String what) {
        if (!(v > 0)) {
            throw new IllegalArgumentException(what + " must be positive, got " + v);
        }
    }
}
