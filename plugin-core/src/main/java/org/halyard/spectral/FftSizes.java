package org.halyard.spectral;

/**
 * Transform lengths that JTransforms handles fast: even numbers whose prime factors are 2, 3, 5 and 7
 * only. Their cost stays within about 10% of the next power of two's at a fraction of the padding
 * (see ../shared/STACK.md, JTransforms).
 */
public final class FftSizes {

    private FftSizes() {
    }

    /** The smallest even 2-3-5-7-smooth number that is at least {@code n} (n at least 1). */
    public static int smoothAtLeast(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("transform length must be positive, got " + n);
        }
        for (int m = Math.max(2, n + (n & 1)); ; m += 2) {
            if (isSmooth(m)) {
                return m;
            }
        }
    }

    /** Whether {@code n} has no prime factor above 7. */
    public static boolean isSmooth(int n) {
        for (int p : new int[] {2, 3, 5, 7}) {
            while (n % p == 0) {
                n /= p;
            }
        }
        return n == 1;
    }
}
