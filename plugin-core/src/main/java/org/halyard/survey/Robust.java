package org.halyard.survey;

/**
 * Robust location and scale: median and the median absolute deviation scaled to a Gaussian sigma
 * (factor 1.4826 = 1 / Phi^-1(3/4); Hampel 1974, J. Amer. Statist. Assoc. 69, 383-393).
 *
 * <p><b>Algorithm:</b> the median by quickselect (Hoare 1961, Comm. ACM 4(7) 321), expected O(n), rather than
 * a full sort: the spike detector takes a median of every line of every sensor.
 *
 * <p><b>Thread safety:</b> stateless. Methods reorder the array they are given.
 */
public final class Robust {

    /** MAD to Gaussian standard deviation. */
    public static final double MAD_TO_SIGMA = 1.4826;

    private Robust() {
    }

    /** Median of the non-NaN values of {@code a} (sorted in place); NaN when there are none. */
    public static double median(double[] a) {
        int n = 0;
        for (int i = 0; i < a.length; i++) { // NaN to the end
            if (!Double.isNaN(a[i])) {
                double t = a[n];
                a[n++] = a[i];
                a[i] = t;
            }
        }
        if (n == 0) {
            return Double.NaN;
        }
        double hi = select(a, n, n / 2);
        if ((n & 1) == 1) {
            return hi;
        }
        double lo = a[0]; // after select, a[0 .. n/2) holds the smaller half: its maximum is the other middle
        for (int i = 1; i < n / 2; i++) {
            lo = Math.max(lo, a[i]);
        }
        return 0.5 * (lo + hi);
    }

    /** The k-th smallest of a[0, n), leaving smaller values before index k and larger after. */
    static double select(double[] a, int n, int k) {
        int lo = 0, hi = n - 1;
        while (hi > lo) {
            int mid = (lo + hi) >>> 1;
            // median of three as pivot
            if (a[mid] < a[lo]) {
                swap(a, mid, lo);
            }
            if (a[hi] < a[lo]) {
                swap(a, hi, lo);
            }
            if (a[hi] < a[mid]) {
                swap(a, hi, mid);
            }
            double pivot = a[mid];
            int i = lo, j = hi;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    swap(a, i++, j--);
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return a[k];
            }
        }
        return a[k];
    }

    private static void swap(double[] a, int i, int j) {
        double t = a[i];
        a[i] = a[j];
        a[j] = t;
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
