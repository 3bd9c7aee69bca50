package org.halyard.render;

import java.util.Arrays;
import org.halyard.grid.Grid;

/**
 * The sorted non-blank values of a grid, for percentiles and the empirical distribution function.
 *
 * <p><b>Algorithm:</b> sort, then nearest-rank percentile {@code sorted[round(p (n - 1))]} and the
 * empirical CDF by binary search (Hyndman and Fan 1996, Am. Stat. 50(4), definitions 1 and 7 agree at the
 * tabulated points). Grids above {@value #MAX_SAMPLES} cells are sampled on a regular stride, which
 * changes percentiles by well under one display grey level.
 *
 * <p><b>Thread safety:</b> immutable once built.
 */
public final class SampleQuantiles {

    /** Largest number of values kept; larger grids are sampled on a stride. */
    public static final int MAX_SAMPLES = 1 << 20;

    private final float[] sorted;

    private SampleQuantiles(float[] sorted) {
        this.sorted = sorted;
    }

    /** The quantiles of the non-blank cells of {@code grid}. */
    public static SampleQuantiles of(Grid grid) {
        return of(grid.toArray());
    }

    /** The quantiles of the non-NaN entries of {@code values} (the array is not modified). */
    public static SampleQuantiles of(float[] values) {
        int stride = Math.max(1, (int) Math.ceil(values.length / (double) MAX_SAMPLES));
        float[] keep = new float[(values.length + stride - 1) / stride];
        int n = 0;
        for (int i = 0; i < values.length; i += stride) {
            if (!Float.isNaN(values[i])) {
                keep[n++] = values[i];
            }
        }
        float[] s = Arrays.copyOf(keep, n);
        Arrays.sort(s);
        return new SampleQuantiles(s);
    }

    /** Number of values kept. */
    public int size() {
        return sorted.length;
    }

    /** The value at fraction {@code p} in [0, 1] (nearest rank); {@code NaN} when there are no values. */
    public double at(double p) {
        if (sorted.length == 0) {
            return Double.NaN;
        }
        double c = Math.max(0, Math.min(1, p));
        return sorted[(int) Math.round(c * (sorted.length - 1))];
    }

    /**
     * The mid-rank empirical distribution at {@code value}: (number below + half the number equal) / n,
     * in [0, 1]; {@code NaN} for a NaN value or no values.
     */
    public double fractionBelow(double value) {
        if (Double.isNaN(value) || sorted.length == 0) {
            return Double.NaN;
        }
        float v = (float) value;
        int lo = lowerBound(v);
        // Interpolated values rarely equal a sample, and then no second search is needed.
        int hi = lo < sorted.length && sorted[lo] == v ? upperBound(v) : lo;
        return (lo + 0.5 * (hi - lo)) / sorted.length;
    }

    private int lowerBound(float v) {
        int lo = 0, hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private int upperBound(float v) {
        int lo = 0, hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] <= v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
