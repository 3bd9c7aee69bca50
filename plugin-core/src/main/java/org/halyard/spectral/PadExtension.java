package org.halyard.spectral;

/**
 * Fills the pad around a grid before a periodic transform: the grid mirrored about each edge, blended
 * between the two edges that meet across the pad (the transform wraps around), and tapered towards zero
 * (the mean, once the plane is removed) by a squared cosine that is 1 at both edges and 0 mid-pad. The
 * result is continuous with a continuous slope at both edges and across the wrap.
 */
final class PadExtension {

    private PadExtension() {
    }

    /**
     * Fills the pad of {@code out}, whose top-left {@code w x h} cells (row stride {@code stride}) already
     * hold the data, out to the padded size {@code nc x nr}.
     */
    static void extend(float[] out, int w, int h, int stride, int nc, int nr) {
        int pc = nc - w;
        double[] blendC = weights(pc);
        for (int r = 0; r < h; r++) {
            int off = r * stride;
            for (int j = 0; j < pc; j++) {
                float right = out[off + clamp(w - 1 - j, w)];
                float left = out[off + clamp(pc - 1 - j, w)];
                out[off + w + j] = (float) (blendC[2 * j] * right + blendC[2 * j + 1] * left);
            }
        }
        int pr = nr - h;
        double[] blendR = weights(pr);
        for (int j = 0; j < pr; j++) {
            int near = clamp(h - 1 - j, h), far = clamp(pr - 1 - j, h);
            int off = (h + j) * stride;
            for (int c = 0; c < nc; c++) {
                out[off + c] = (float) (blendR[2 * j] * out[near * stride + c] + blendR[2 * j + 1] * out[far * stride + c]);
            }
        }
    }

    /** Weights {near edge, far edge} for each pad cell: blend (sums to 1) times the squared-cosine taper. */
    private static double[] weights(int p) {
        double[] wts = new double[2 * p];
        for (int j = 0; j < p; j++) {
            double d1 = j + 1;                        // cells from the edge before the pad
            double blend = 0.5 * (1 + Math.cos(Math.PI * d1 / (p + 1)));
            double taper = Math.cos(Math.PI * (j + 0.5) / p);
            taper *= taper;
            wts[2 * j] = blend * taper;
            wts[2 * j + 1] = (1 - blend) * taper;
        }
        return wts;
    }

    private static int clamp(int i, int n) {
        return Math.max(0, Math.min(n - 1, i));
    }
}
