package org.halyard.targets;

import java.util.Arrays;
import org.halyard.grid.Grid;

/**
 * A robust level and noise figure of a grid: the median of its values and the scatter of its fine-scale
 * roughness.
 *
 * <p><b>Algorithm:</b> the background is the median of the non-blank cells. The noise is taken from the
 * fourth difference d4 = v[i-2] - 4 v[i-1] + 6 v[i] - 4 v[i+1] + v[i+2] along rows and along columns
 * (the usual noise measure of magnetometer records, common practice; DOMAIN.md): for white noise of
 * standard deviation s, d4 has standard deviation s sqrt(70) (the sum of the squared weights), and
 * sigma = 1.4826 MAD(d4) / sqrt(70) (MAD to Gaussian sigma, Hampel 1974, J. Am. Stat. Assoc. 69, 383-393),
 * the larger of the row and column figures. Anomalies a few cells wide and wider are nearly polynomial over
 * five cells, so d4 sees the noise and not the targets, cables or geology, which would inflate a MAD of
 * the values themselves (on the demo survey: 0.62 nT/m from the values, 0.10 nT/m from d4).
 *
 * <p><b>Limitations:</b> noise correlated over many cells (smoothed by the gridder) is under-stated by
 * d4; the pickers therefore work on a grid smoothed to suppress that texture ({@link GaussianSmoother}).
 *
 * @param background median of the non-blank values, in the grid's unit (nT/m for the analytic signal)
 * @param sigma      robust standard deviation of the cell-to-cell noise, same unit
 */
public record NoiseEstimate(double background, double sigma) {

    /** Scale from the MAD to a Gaussian standard deviation (Hampel 1974). */
    static final double MAD_TO_SIGMA = 1.4826;
    /** White-noise variance gain of the fourth difference, 1 + 16 + 36 + 16 + 1. */
    static final double D4_GAIN = 70;

    /** The estimate over the non-blank cells of {@code grid}; refuses an all-blank grid. */
    public static NoiseEstimate of(Grid grid) {
        float[] v = grid.toArray();
        int n = 0;
        double[] d = new double[v.length];
        for (float f : v) {
            if (!Float.isNaN(f)) {
                d[n++] = f;
            }
        }
        if (n == 0) {
            throw new IllegalArgumentException("cannot estimate noise: every cell of the grid is blank");
        }
        double median = median(Arrays.copyOf(d, n));
        int nc = grid.columns(), nr = grid.rows();
        double rows = d4Sigma(v, nr, nc, 1, nc, d), cols = d4Sigma(v, nc, nr, nc, 1, d);
        double sigma = Double.isNaN(rows) ? cols : Double.isNaN(cols) ? rows : Math.max(rows, cols);
        return new NoiseEstimate(median, Double.isNaN(sigma) ? 0 : sigma);
    }

    /**
     * Robust sigma of the fourth differences along {@code lines} lines of {@code len} cells, step
     * {@code step} within a line and {@code stride} between line starts; NaN when no difference exists.
     */
    private static double d4Sigma(float[] v, int lines, int len, int step, int stride, double[] work) {
        int m = 0;
        for (int l = 0; l < lines; l++) {
            for (int k = 2; k < len - 2; k++) {
                int i = l * stride + k * step;
                double q = v[i - 2 * step] - 4.0 * v[i - step] + 6.0 * v[i] - 4.0 * v[i + step] + v[i + 2 * step];
                if (!Double.isNaN(q)) {
                    work[m++] = Math.abs(q);
                }
            }
        }
        return m == 0 ? Double.NaN : MAD_TO_SIGMA * median(Arrays.copyOf(work, m)) / Math.sqrt(D4_GAIN);
    }

    /** The level {@code background + k sigma}. */
    public double threshold(double k) {
        return background + k * sigma;
    }

    /** Median of {@code values}; sorts the array in place. */
    static double median(double[] values) {
        Arrays.sort(values);
        int n = values.length;
        return n % 2 == 1 ? values[n / 2] : 0.5 * (values[n / 2 - 1] + values[n / 2]);
    }
}
