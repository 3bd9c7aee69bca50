package org.halyard.targets;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;

/**
 * Smooths a grid with a Gaussian kernel that ignores blank cells.
 *
 * <p><b>Why:</b> a grid of line data is sharp on the lines and softer between them, and a grid from
 * crossing lines carries a fine checkerboard where tie and traverse lines disagree. Both ripple at the
 * sensor-track spacing and break ridges into beads and add false maxima. A Gaussian of standard deviation
 * s multiplies a ripple of wavelength L by exp(-2 pi^2 s^2 / L^2) (the Fourier transform of a Gaussian):
 * s = half the track spacing removes 99% of it and keeps anomalies a few metres wide.
 *
 * <p><b>Algorithm:</b> separable convolution, rows then columns, truncated at 3 s; each output is the
 * weighted mean of the non-blank cells in reach (normalised convolution, Knutsson and Westin 1993, CVPR,
 * 515-523), so blanks do not pull edges down. A blank cell stays blank.
 *
 * <p><b>Accuracy:</b> the kernel is sampled at cell centres and renormalised to unit sum; a linear trend
 * passes unchanged away from blanks and edges; a symmetric peak keeps its position.
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class GaussianSmoother {

    private GaussianSmoother() {
    }

    /**
     * The grid smoothed by a Gaussian of standard deviation {@code sigmaM} metres (same unit as the grid's
     * values); the grid itself when {@code sigmaM} is under a tenth of a cell.
     */
    static Grid smooth(Grid g, double sigmaM) {
        GridGeometry geo = g.geometry();
        double s = sigmaM / geo.cellSize();
        if (!(s >= 0.1)) {
            return g;
        }
        int rad = (int) Math.ceil(3 * s);
        double[] w = new double[2 * rad + 1];
        for (int k = -rad; k <= rad; k++) {
            w[k + rad] = Math.exp(-0.5 * k * k / (s * s));
        }
        int nc = geo.columns(), nr = geo.rows();
        float[] in = g.toArray();
        // First pass keeps numerator and weight sum apart, so the second pass weights by data present.
        double[] num = new double[in.length], den = new double[in.length];
        for (int r = 0; r < nr; r++) {
            for (int c = 0; c < nc; c++) {
                double a = 0, b = 0;
                for (int k = Math.max(-rad, -c); k <= Math.min(rad, nc - 1 - c); k++) {
                    float v = in[r * nc + c + k];
                    if (!Float.isNaN(v)) {
                        a += w[k + rad] * v;
                        b += w[k + rad];
                    }
                }
                num[r * nc + c] = a;
                den[r * nc + c] = b;
            }
        }
        float[] out = new float[in.length];
        for (int r = 0; r < nr; r++) {
            for (int c = 0; c < nc; c++) {
                int i = r * nc + c;
                if (Float.isNaN(in[i])) {
                    out[i] = Float.NaN;
                    continue;
                }
                double a = 0, b = 0;
                for (int k = Math.max(-rad, -r); k <= Math.min(rad, nr - 1 - r); k++) {
                    a += w[k + rad] * num[i + k * nc];
                    b += w[k + rad] * den[i + k * nc];
                }
                out[i] = (float) (a / b);
            }
        }
        return Grid.wrap(geo, out);
    }
}
