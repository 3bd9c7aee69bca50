package org.halyard.ui.map;

/** Round numbers of the 1-2-5 series for grid lines and scale bars (common practice in map making). */
final class NiceSteps {

    private NiceSteps() {
    }

    /** The smallest 1, 2 or 5 times a power of ten that is at least {@code minimum} (&gt; 0). */
    static double atLeast(double minimum) {
        double p = Math.pow(10, Math.floor(Math.log10(minimum)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * p >= minimum * (1 - 1e-12)) {
                return m * p;
            }
        }
        return 10 * p;
    }

    /** The largest 1, 2 or 5 times a power of ten that is at most {@code maximum} (&gt; 0). */
    static double atMost(double maximum) {
        double p = Math.pow(10, Math.floor(Math.log10(maximum)));
        for (double m : new double[] {5, 2, 1}) {
            if (m * p <= maximum * (1 + 1e-12)) {
                return m * p;
            }
        }
        return p;
    }
}
