package org.halyard.gridding;

import org.halyard.grid.GridGeometry;

/**
 * Merges dense along-line samples to at most one per grid cell before a spline solve.
 *
 * <p><b>Algorithm:</b> a counting sort of the samples by cell index (two passes, O(n + cells)), then per cell
 * either the mean of positions and values, or the sample holding the lower median value found by
 * quickselect (Hoare 1961, Algorithm 65 FIND). Samples with a NaN or infinite coordinate or value are
 * skipped and counted, and so are samples outside the grid.
 *
 * <p><b>Accuracy:</b> mean reduction is exact arithmetic in double precision; the median keeps a measured
 * sample unchanged.
 *
 * <p><b>Limitations:</b> memory of two int arrays of the sample count and one of the cell count.
 *
 * <p><b>Thread safety:</b> stateless; the static method may be called from any thread.
 */
public final class BlockReduction {

    private BlockReduction() {
    }

    /**
     * Merges samples per cell of {@code geometry}.
     *
     * @param x         eastings, metres
     * @param y         northings, metres
     * @param value     values in any unit (nT, nT/m)
     * @param geometry  the grid whose cells group the samples (row 0 north, pixel-is-area)
     * @param statistic mean or median
     * @return the merged samples in cell order, with the counts of skipped samples
     */
    public static ReducedSamples reduce(double[] x, double[] y, double[] value, GridGeometry geometry,
                                        BlockStatistic statistic) {
        if (x.length != y.length || x.length != value.length) {
            throw new IllegalArgumentException("x, y and value arrays differ in length: " + x.length + ", "
                    + y.length + ", " + value.length);
        }
        int n = x.length;
        int cells = geometry.size();
        int[] cellOf = new int[n];
        int[] start = new int[cells + 1];
        int nonFinite = 0, outside = 0;
        double cs = geometry.cellSize();
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i]) || !Double.isFinite(value[i])) {
                cellOf[i] = -1;
                nonFinite++;
                continue;
            }
            double fc = (x[i] - geometry.west()) / cs;
            double fr = (geometry.north() - y[i]) / cs;
            if (!(fc >= 0 && fr >= 0 && fc < geometry.columns() && fr < geometry.rows())) {
                cellOf[i] = -1;
                outside++;
                continue;
            }
            int c = geometry.index((int) fc, (int) fr);
            cellOf[i] = c;
            start[c + 1]++;
        }
        int occupied = 0;
        for (int c = 0; c < cells; c++) {
            if (start[c + 1] > 0) {
                occupied++;
            }
            start[c + 1] += start[c];
        }
        int[] order = new int[start[cells]];
        int[] fill = start.clone();
        for (int i = 0; i < n; i++) {
            if (cellOf[i] >= 0) {
                order[fill[cellOf[i]]++] = i;
            }
        }
        double[] ox = new double[occupied], oy = new double[occupied], ov = new double[occupied];
        int[] oc = new int[occupied];
        int k = 0;
        for (int c = 0; c < cells; c++) {
            int s = start[c], e = start[c + 1];
            if (s == e) {
                continue;
            }
            oc[k] = c;
            if (statistic == BlockStatistic.MEAN || e - s == 1) {
                double sx = 0, sy = 0, sv = 0;
                for (int j = s; j < e; j++) {
                    int i = order[j];
                    sx += x[i];
                    sy += y[i];
                    sv += value[i];
                }
                int m = e - s;
                ox[k] = sx / m;
                oy[k] = sy / m;
                ov[k] = sv / m;
            } else {
                int i = select(order, s, e - 1, s + (e - s - 1) / 2, value);
                ox[k] = x[i];
                oy[k] = y[i];
                ov[k] = value[i];
            }
            k++;
        }
        return new ReducedSamples(ox, oy, ov, oc, nonFinite, outside);
    }

    /** Quickselect on {@code idx[lo..hi]} by {@code key[idx[.]]}; returns the sample index of rank {@code target}. */
    static int select(int[] idx, int lo, int hi, int target, double[] key) {
        while (hi > lo) {
            double pivot = key[idx[(lo + hi) >>> 1]];
            int i = lo, j = hi;
            while (i <= j) {
                while (key[idx[i]] < pivot) {
                    i++;
                }
                while (key[idx[j]] > pivot) {
                    j--;
                }
                if (i <= j) {
                    int t = idx[i];
                    idx[i] = idx[j];
                    idx[j] = t;
                    i++;
                    j--;
                }
            }
            if (target <= j) {
                hi = j;
            } else if (target >= i) {
                lo = i;
            } else {
                break;
            }
        }
        return idx[target];
    }
}
