package org.halyard.spectral;

/**
 * Transform lengths that JTransforms handles fast: even numbers whose prime factors are 2, 3 and 5 only.
 * JTransforms has dedicated passes for the factors 2, 3, 4 and 5; a factor 7 goes through its generic
 * pass, and such lengths took longer than the next 5-smooth length although that is longer (complex
 * forward and inverse, quick JIT compiler, this project's machines: 6272 = 2^7 7^2 in 329 us against
 * 182 us for 6400; 4704 in 405 us against 248 us for 4800; 1470 in 82 us against 55 us for 1500).
 */
public final class FftSizes {

    private FftSizes() {
    }

    /** The smallest even 2-3-5-smooth number that is at least {@code n} (n at least 1). */
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

    /** Whether {@code n} has no prime factor above 5. */
    public static boolean isSmooth(int n) {
        for (int p : new int[] {2, 3, 5}) {
            while (n % p == 0) {
                n /= p;
            }
        }
        return n == 1;
    }
}
