package org.halyard.targets;

/**
 * How peaks are picked.
 *
 * @param thresholdFactor k in the threshold {@code background + k sigma} of {@link NoiseEstimate}; positive
 * @param windowCells     half-width of the local-maximum window, cells (1 gives 3 x 3); at least 1
 * @param minSeparationM  two picks closer than this keep only the stronger, metres; non-negative
 */
public record PeakOptions(double thresholdFactor, int windowCells, double minSeparationM) {

    /** k = 5, a 5 x 5 window, 1.5 m separation (common practice for sensors 2-4 m above the objects). */
    public static final PeakOptions DEFAULT = new PeakOptions(5, 2, 1.5);

    public PeakOptions {
        if (!(thresholdFactor > 0)) {
            throw new IllegalArgumentException("peak threshold factor must be positive, got " + thresholdFactor);
        }
        if (windowCells < 1) {
            throw new IllegalArgumentException("peak window half-width must be at least 1 cell, got " + windowCells);
        }
        if (!(minSeparationM >= 0)) {
            throw new IllegalArgumentException("peak separation must be 0 m or more, got " + minSeparationM);
        }
    }
}
