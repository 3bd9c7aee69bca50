package org.halyard.spectral;

/**
 * The pad along one axis of a grid before a periodic transform: the grid mirrored about each edge, blended
 * between the two edges that meet across the pad (the transform wraps around), and tapered towards zero
 * (the mean, once the plane is removed) by a squared cosine that is 1 at both edges and 0 mid-pad. The
 * result is continuous with a continuous slope at both edges and across the wrap.
 *
 * <p>Pad cell {@code j} (at index {@code n + j}) is {@code nearWeight[j] * data[near[j]] + farWeight[j] *
 * data[far[j]]}: a fixed linear combination of two data cells. Because the transform is linear, the same
 * weights applied to the transforms of two data rows give the transform of a pad row, which is how
 * {@link GridSpectrum} pads rows without storing them.
 */
final class PadExtension {

    /** The data cells each pad cell draws on: mirrored about the near edge, and about the far one. */
    final int[] near, far;
    /** Blend (summing to 1) times taper, for the near and the far source cell. */
    final double[] nearWeight, farWeight;
    private final int dataCells;

    private PadExtension(int n, int padded) {
        int p = padded - n;
        dataCells = n;
        near = new int[p];
        far = new int[p];
        nearWeight = new double[p];
        farWeight = new double[p];
        for (int j = 0; j < p; j++) {
            near[j] = clamp(n - 1 - j, n);
            far[j] = clamp(p - 1 - j, n);
            double blend = 0.5 * (1 + Math.cos(Math.PI * (j + 1) / (p + 1)));
            double taper = Math.cos(Math.PI * (j + 0.5) / p);
            taper *= taper;
            nearWeight[j] = blend * taper;
            farWeight[j] = (1 - blend) * taper;
        }
    }

    /** The pad that takes {@code n} data cells to {@code padded} cells ({@code padded >= n >= 1}). */
    static PadExtension of(int n, int padded) {
        if (n < 1 || padded < n) {
            throw new IllegalArgumentException("cannot pad " + n + " cells to " + padded);
        }
        return new PadExtension(n, padded);
    }

    /** Number of pad cells. */
    int size() {
        return near.length;
    }

    /** Fills {@code v[off + n + j]} for every pad cell {@code j} from the data in {@code v[off .. off + n)}. */
    void fill(float[] v, int off) {
        for (int j = 0; j < near.length; j++) {
            v[off + dataCells + j] = (float) (nearWeight[j] * v[off + near[j]] + farWeight[j] * v[off + far[j]]);
        }
    }

    private static int clamp(int i, int n) {
        return Math.max(0, Math.min(n - 1, i));
    }
}
