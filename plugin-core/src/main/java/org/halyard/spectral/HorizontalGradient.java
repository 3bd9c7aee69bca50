package org.halyard.spectral;

import org.halyard.grid.GridGeometry;

/**
 * Space-domain horizontal gradients, for grids that are not smooth enough for a transform (the tilt angle
 * is bounded and kinked).
 */
final class HorizontalGradient {

    private HorizontalGradient() {
    }

    /**
     * {@code sqrt((dv/dx)^2 + (dv/dy)^2)} by central differences (one-sided at edges and next to blanks),
     * in the unit of {@code v} per metre; blank where a cell or both its neighbours on an axis are blank.
     */
    static float[] centralDifferenceNorm(float[] v, GridGeometry g) {
        int w = g.columns(), h = g.rows();
        double d = g.cellSize();
        float[] out = new float[v.length];
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                int i = r * w + c;
                double gx = diff(v, i, c > 0 ? i - 1 : -1, c < w - 1 ? i + 1 : -1, d);
                // row index runs south: north neighbour is i - w
                double gy = diff(v, i, r < h - 1 ? i + w : -1, r > 0 ? i - w : -1, d);
                out[i] = Float.isNaN(v[i]) ? Float.NaN : (float) Math.sqrt(gx * gx + gy * gy);
            }
        }
        return out;
    }

    /** Derivative towards the {@code plus} neighbour; index -1 or a blank marks a missing neighbour. */
    private static double diff(float[] v, int i, int minus, int plus, double d) {
        boolean hasM = minus >= 0 && !Float.isNaN(v[minus]);
        boolean hasP = plus >= 0 && !Float.isNaN(v[plus]);
        if (hasM && hasP) {
            return (v[plus] - v[minus]) / (2 * d);
        }
        if (hasP) {
            return (v[plus] - v[i]) / d;
        }
        if (hasM) {
            return (v[i] - v[minus]) / d;
        }
        return Float.NaN;
    }
}
