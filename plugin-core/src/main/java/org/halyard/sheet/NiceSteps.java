package org.halyard.sheet;

/**
 * Round step sizes for scale bars and coordinate ticks: 1, 2, 2.5 and 5 times a power of ten.
 */
final class NiceSteps {

    private static final double[] MANTISSAS = {1, 2, 2.5, 5};

    private NiceSteps() {
    }

    /** The smallest round value at least {@code minimum} (positive). */
    static double atLeast(double minimum) {
        double p = Math.pow(10, Math.floor(Math.log10(minimum)));
        for (int k = 0; k < 3; k++, p *= 10) {
            for (double m : MANTISSAS) {
                if (m * p >= minimum * (1 - 1e-12)) {
                    return m * p;
                }
            }
        }
        throw new IllegalStateException("unreachable for positive " + minimum);
    }

    /** The largest round value not above {@code maximum} (positive). */
    static double atMost(double maximum) {
        double p = Math.pow(10, Math.floor(Math.log10(maximum)));
        for (int k = 0; k < 3; k++, p /= 10) {
            for (int i = MANTISSAS.length - 1; i >= 0; i--) {
                if (MANTISSAS[i] * p <= maximum * (1 + 1e-12)) {
                    return MANTISSAS[i] * p;
                }
            }
        }
        throw new IllegalStateException("unreachable for positive " + maximum);
    }

    /** Formats a ground distance or coordinate in metres without a trailing {@code .0}. */
    static String metres(double v) {
        if (Math.abs(v - Math.rint(v)) < 1e-6) {
            return String.format(java.util.Locale.ROOT, "%d", Math.round(v));
        }
        return String.format(java.util.Locale.ROOT, "%.1f", v);
    }
}
