package org.halyard.targets;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;

/**
 * Smooths a grid along the local strike of its ridges only, leaving the profile across them as it is.
 *
 * <p><b>Why:</b> a cable or pipe crossed by survey lines is sampled once a line, and each line passes at its
 * own height: with the sensors 2 m above a line source whose analytic signal falls as 1/r^3 (Blakely 1995,
 * ch. 4), an altitude wander of 0.4 m changes the crest by a factor of two from one line to the next. The
 * crest then rises and falls along the ridge at random over a few line spacings, far longer than the
 * sensor-track ripple that {@link GaussianSmoother} removes, and as strongly curved as the ridge is across:
 * the Hessian ridge test of {@link RidgeCells} fails on the beads. Averaging along the strike removes that
 * variation and keeps the ridge's width, which is what the ridge test measures.
 *
 * <p><b>Algorithm:</b> the Hessian of the grid (central differences) is averaged over a Gaussian window of
 * {@code orientationM} (its components separately, so that the across curvature, of one sign all along a
 * ridge, dominates the along curvature, whose sign alternates from bead to bead); the eigenvector of its
 * larger eigenvalue is the strike. Each cell's output is the Gaussian-weighted mean (standard deviation
 * {@code alongM}, truncated at 3 standard deviations, one-cell steps) of the bilinear values along the
 * strike line through it, blank samples left out. This is the orientation-adaptive smoothing of
 * coherence-enhancing filters (Weickert 1999, Int. J. Computer Vision 31(2/3), 111-127) in its simplest,
 * one-pass form, with the averaged Hessian in place of the structure tensor because a ridge crest has no
 * gradient across it.
 *
 * <p><b>Accuracy:</b> a straight ridge keeps its position and across profile (the samples lie along it); a
 * ridge curving with radius R is widened by about alongM^2 / (2 R) (the chord's sagitta), 0.04 m for 3 m
 * and a radius of 100 m.
 *
 * <p><b>Limitations:</b> a round peak is smoothed along its radii (its strike there), so it is lowered and
 * widened but stays round; at a crossing of two ridges the weaker one is smoothed along the stronger.
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class StrikeSmoother {

    private StrikeSmoother() {
    }

    /**
     * The grid (any unit; x east, y north, row 0 north) averaged along the local ridge strike with a
     * Gaussian of standard deviation {@code alongM} metres, the strike taken from the Hessian averaged over
     * {@code orientationM} metres; the grid itself when {@code alongM} is under a cell. Blank cells stay blank.
     */
    static Grid smooth(Grid g, double alongM, double orientationM) {
        GridGeometry geo = g.geometry();
        double h = geo.cellSize();
        if (!(alongM >= h)) {
            return g;
        }
        int nc = geo.columns(), nr = geo.rows();
        // The Hessian's square, H H: its larger eigenvector is the direction of strongest curvature whatever
        // its sign, across a ridge on its crest (negative) and its flanks (positive) alike, so averaging it
        // neither cancels the crest against the flanks nor lets the beads' alternating along-curvature win.
        float[] txx = blank(geo), tyy = blank(geo), txy = blank(geo);
        for (int r = 1; r < nr - 1; r++) {
            for (int c = 1; c < nc - 1; c++) {
                int i = geo.index(c, r);
                double f = g.get(i);
                // Row index runs south: the mixed derivative takes north minus south, as in RidgeCells.
                double fxx = (g.get(c + 1, r) - 2 * f + g.get(c - 1, r)) / (h * h);
                double fyy = (g.get(c, r - 1) - 2 * f + g.get(c, r + 1)) / (h * h);
                double fxy = (g.get(c + 1, r - 1) - g.get(c - 1, r - 1) - g.get(c + 1, r + 1)
                        + g.get(c - 1, r + 1)) / (4 * h * h);
                txx[i] = (float) (fxx * fxx + fxy * fxy);
                tyy[i] = (float) (fyy * fyy + fxy * fxy);
                txy[i] = (float) (fxy * (fxx + fyy));
            }
        }
        Grid axx = GaussianSmoother.smooth(Grid.wrap(geo, txx), orientationM);
        Grid ayy = GaussianSmoother.smooth(Grid.wrap(geo, tyy), orientationM);
        Grid axy = GaussianSmoother.smooth(Grid.wrap(geo, txy), orientationM);
        int k = (int) Math.ceil(3 * alongM / h);
        double[] w = new double[k + 1];
        for (int j = 0; j <= k; j++) {
            w[j] = Math.exp(-0.5 * (j * h) * (j * h) / (alongM * alongM));
        }
        float[] out = new float[geo.size()];
        for (int r = 0; r < nr; r++) {
            for (int c = 0; c < nc; c++) {
                int i = geo.index(c, r);
                float f = g.get(i);
                double xx = axx.get(i), yy = ayy.get(i), xy = axy.get(i);
                if (Float.isNaN(f) || Double.isNaN(xx + yy + xy)) {
                    out[i] = f;
                    continue;
                }
                // Larger eigenvector of the averaged H H: across the ridge; the strike is at right angles.
                double phi = 0.5 * Math.atan2(2 * xy, xx - yy) + Math.PI / 2;
                double sx = Math.cos(phi) * h, sy = Math.sin(phi) * h;
                double x = geo.x(c), y = geo.y(r);
                double num = w[0] * f, den = w[0];
                for (int j = 1; j <= k; j++) {
                    double a = g.valueAt(x + j * sx, y + j * sy), b = g.valueAt(x - j * sx, y - j * sy);
                    if (!Double.isNaN(a)) {
                        num += w[j] * a;
                        den += w[j];
                    }
                    if (!Double.isNaN(b)) {
                        num += w[j] * b;
                        den += w[j];
                    }
                }
                out[i] = (float) (num / den);
            }
        }
        return Grid.wrap(geo, out);
    }

    private static float[] blank(GridGeometry geo) {
        float[] v = new float[geo.size()];
        java.util.Arrays.fill(v, Float.NaN);
        return v;
    }
}
