package org.halyard.io;

/**
 * Parses decimal numbers from a char range without creating a string. Plain decimals of up to 15
 * significant digits with a power-of-ten scale of at most 22 are exact (both operands of the final
 * division or product are exactly representable, so IEEE 754 rounds the result correctly); anything else
 * falls back on {@link Double#parseDouble}.
 */
final class FastDecimal {

    private static final double[] POW10 = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POW10.length; i++) {
            POW10[i] = p;
            p *= 10;
        }
    }

    private FastDecimal() {
    }

    /** The number in {@code s[from, to)}, or {@code NaN} when it is not one. */
    static double parse(char[] s, int from, int to) {
        int i = from;
        boolean neg = false;
        if (i < to && (s[i] == '-' || s[i] == '+')) {
            neg = s[i] == '-';
            i++;
        }
        long mant = 0;
        int digits = 0;
        int scale = 0;
        boolean any = false;
        boolean dot = false;
        for (; i < to; i++) {
            char c = s[i];
            if (c >= '0' && c <= '9') {
                any = true;
                if (mant == 0 && c == '0') {
                    if (dot) {
                        scale--;
                    }
                    continue;
                }
                if (digits >= 15) {
                    return slow(s, from, to);
                }
                mant = mant * 10 + (c - '0');
                digits++;
                if (dot) {
                    scale--;
                }
            } else if (c == '.' && !dot) {
                dot = true;
            } else if (c == 'e' || c == 'E') {
                if (!any) {
                    return Double.NaN;
                }
                int exp = 0;
                boolean eneg = false;
                int j = i + 1;
                if (j < to && (s[j] == '-' || s[j] == '+')) {
                    eneg = s[j] == '-';
                    j++;
                }
                if (j == to) {
                    return Double.NaN;
                }
                for (; j < to; j++) {
                    char d = s[j];
                    if (d < '0' || d > '9' || exp > 10000) {
                        return exp > 10000 ? slow(s, from, to) : Double.NaN;
                    }
                    exp = exp * 10 + (d - '0');
                }
                scale += eneg ? -exp : exp;
                break;
            } else {
                return slow(s, from, to);
            }
        }
        if (!any) {
            return Double.NaN;
        }
        double v;
        if (mant == 0) {
            v = 0;
        } else if (scale >= 0 && scale < POW10.length) {
            if (digits + scale > 15) {
                return slow(s, from, to); // the product might not be an exact integer below 2^53
            }
            v = mant * POW10[scale];
        } else if (scale < 0 && -scale < POW10.length) {
            v = mant / POW10[-scale];
        } else {
            return slow(s, from, to);
        }
        return neg ? -v : v;
    }

    /** Whether {@code s[from, to)} spells NaN, which {@link #parse} returns for non-numbers too. */
    static boolean isNanLiteral(char[] s, int from, int to) {
        return to - from == 3 && (s[from] | 32) == 'n' && (s[from + 1] | 32) == 'a' && (s[from + 2] | 32) == 'n';
    }

    private static double slow(char[] s, int from, int to) {
        try {
            return Double.parseDouble(new String(s, from, to - from));
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
