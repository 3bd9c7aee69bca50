package org.halyard.gridding;

import java.util.stream.IntStream;

/**
 * Exact Euclidean distance from every cell of a grid to the nearest marked cell, in cells.
 *
 * <p><b>Algorithm:</b> the separable squared-distance transform by lower envelopes of parabolas
 * (Felzenszwalb and Huttenlocher 2012, Distance Transforms of Sampled Functions, Theory of Computing 8,
 * 415-428, algorithm DT(f)): one 1-D pass down every column, then one along every row, O(cells) in all.
 * Columns and rows are shared between the cores.
 *
 * <p><b>Accuracy:</b> exact for distances between cell centres (squared distances are integers held in
 * doubles, exact far beyond any grid size).
 *
 * <p><b>Limitations:</b> with no marked cell every distance is {@code +Infinity}.
 *
 * <p><b>Thread safety:</b> stateless; the static method may be called from any thread.
 */
public final class DistanceTransform {

    private DistanceTransform() {
    }

    /**
     * Distances to the nearest marked cell.
     *
     * @param marked  row-major flags, {@code columns * rows} long
     * @param columns number of columns
     * @param rows    number of rows
     * @return row-major distances in cell widths (0 on marked cells)
     */
    public static float[] distances(boolean[] marked, int columns, int rows) {
        if (marked.length != (long) columns * rows) {
            throw new IllegalArgumentException("mask has " + marked.length + " cells, expected " + columns + " x " + rows);
        }
        double[] sq = new double[marked.length];
        IntStream.range(0, columns).parallel().forEach(c -> {
            double[] f = new double[rows];
            double[] d = new double[rows];
            Envelope env = new Envelope(rows);
            for (int r = 0; r < rows; r++) {
                f[r] = marked[r * columns + c] ? 0 : Double.POSITIVE_INFINITY;
            }
            env.transform(f, d, rows);
            for (int r = 0; r < rows; r++) {
                sq[r * columns + c] = d[r];
            }
        });
        float[] out = new float[marked.length];
        IntStream.range(0, rows).parallel().forEach(r -> {
            double[] f = new double[columns];
            double[] d = new double[columns];
            Envelope env = new Envelope(columns);
            System.arraycopy(sq, r * columns, f, 0, columns);
            env.transform(f, d, columns);
            for (int c = 0; c < columns; c++) {
                out[r * columns + c] = (float) Math.sqrt(d[c]);
            }
        });
        return out;
    }

    /** Work arrays of the 1-D transform, one per thread. */
    private static final class Envelope {
        private final int[] v;
        private final double[] z;

        Envelope(int n) {
            v = new int[n];
            z = new double[n + 1];
        }

        /** d[q] = min_p ((q - p)^2 + f[p]); infinite f marks cells without data. */
        void transform(double[] f, double[] d, int n) {
            int k = -1;
            for (int q = 0; q < n; q++) {
                if (f[q] == Double.POSITIVE_INFINITY) {
                    continue;
                }
                double s = Double.NEGATIVE_INFINITY;
                while (k >= 0) {
                    int p = v[k];
                    s = ((f[q] + (double) q * q) - (f[p] + (double) p * p)) / (2.0 * (q - p));
                    if (s <= z[k]) {
                        k--;
                    } else {
                        break;
                    }
                }
                k++;
                v[k] = q;
                z[k] = k == 0 ? Double.NEGATIVE_INFINITY : s;
                z[k + 1] = Double.POSITIVE_INFINITY;
            }
            if (k < 0) {
                java.util.Arrays.fill(d, 0, n, Double.POSITIVE_INFINITY);
                return;
            }
            int j = 0;
            for (int q = 0; q < n; q++) {
                while (z[j + 1] < q) {
                    j++;
                }
                double dq = q - v[j];
                d[q] = dq * dq + f[v[j]];
            }
        }
    }
}
