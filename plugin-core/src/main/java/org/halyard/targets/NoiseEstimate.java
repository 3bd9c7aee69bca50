package org.halyard.targets;

import java.util.Arrays;
import org.halyard.grid.Grid;

/**
 * A robust level and spread of a grid's values: the median and the scaled median absolute deviation.
 *
 * <p><b>Algorithm:</b> sigma = 1.4826 MAD, which equals the standard deviation for Gaussian values
 * (Hampel 1974, J. Am. Stat. Assoc. 69, 383-393). Targets cover a small fraction of a survey grid, so
 * they barely move either figure.
 *
 * <p><b>Limitations:</b> a grid where anomalies cover more than about half of the cells gives a noise
 * figure that is too high (picks are then missed, never invented).
 *
 * @param background median of the non-blank values, in the grid's unit (nT/m for the analytic signal)
 * @param sigma      1.4826 x median absolute deviation about the median, same unit
 */
public record NoiseEstimate(double background, double sigma) {

    /** Scale from the MAD to a Gaussian standard deviation (Hampel 1974). */
    static final double MAD_TO_SIGMA = 1.4826;

    /** The estimate over the non-blank cells of {@code grid}; refuses an all-blank grid. */
    public static NoiseEstimate of(Grid grid) {
        float[] v = grid.toArray();
        int n = 0;
        for (float f : v) {
            if (!Float.isNaN(f)) {
                v[n++] = f;
            }
        }
        if (n == 0) {
            throw new IllegalArgumentException("cannot estimate noise: every cell of the grid is blank");
        }
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = v[i];
        }
        double median = median(d);
        for (int i = 0; i < n; i++) {
            d[i] = Math.abs(d[i] - median);
        }
        return new NoiseEstimate(median, MAD_TO_SIGMA * median(d));
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
