package org.halyard.gridding;

/** How {@link BlockReduction} merges the samples that fall in one grid cell. */
public enum BlockStatistic {
    /**
     * The sample holding the (lower) median value, at its own position: robust to spikes and keeps a real
     * measurement, so position and value stay consistent.
     */
    MEDIAN,
    /** The mean value at the mean position of the cell's samples: smoother, sensitive to spikes. */
    MEAN
}
