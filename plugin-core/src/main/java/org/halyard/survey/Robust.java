package org.halyard.survey;

import java.util.Arrays;

/**
 * Robust location and scale: median and the median absolute deviation scaled to a Gaussian sigma
 * (factor 1.4826 = 1 / Phi^-1(3/4); Hampel 1974, J. Amer. Statist. Assoc. 69, 383-393).
 *
 * <p><b>Thread safety:</b> stateless. Methods reorder (sort) the array they are given.
 */
public final class Robust {

    /** MAD to Gaussian standard deviation. */
    public static final double MAD_TO_SIGMA = 1.4826;

    private Robust() {
    }

    /** Median of the non-NaN values of {@code a} (sorted in place); NaN when there are none. */
    public static double median(double[] a) {
        Arrays.sort(a); // NaN sorts last
        int n = a.length;
        while (n > 0 && Double.isNaN(a[n - 1])) {
            n--;
        }
        if (n == 0) {
            return Double.NaN;
        }
        return (n & 1) == 1 ? a[n / 2] : 0.5 * (a[n / 2 - 1] + a[n / 2]);
    }

    /** MAD-based sigma of the non-NaN values of {@code a} (reordered in place). */
    public static double sigma(double[] a) {
        double m = median(a);
        for (int i = 0; i < a.length; i++) {
            a[i] = Math.abs(a[i] - m);
        }
        return MAD_TO_SIGMA * median(a);
    }
}
