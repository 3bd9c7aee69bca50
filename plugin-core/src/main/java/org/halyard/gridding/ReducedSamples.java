package org.halyard.gridding;

/**
 * Samples merged to at most one per grid cell by {@link BlockReduction}, in cell order.
 *
 * @param x         easting of each merged sample, metres
 * @param y         northing of each merged sample, metres
 * @param value     merged value, unit of the input (nT, nT/m)
 * @param cell      row-major index of the grid cell holding each sample (row 0 north)
 * @param nonFinite input samples skipped because x, y or the value was NaN or infinite
 * @param outside   input samples skipped because they lie outside the grid
 */
public record ReducedSamples(double[] x, double[] y, double[] value, int[] cell, int nonFinite, int outside) {

    /** Number of merged samples (occupied cells). */
    public int size() {
        return value.length;
    }
}
