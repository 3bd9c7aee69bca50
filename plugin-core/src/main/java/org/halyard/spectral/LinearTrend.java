package org.halyard.spectral;

import org.halyard.grid.GridGeometry;

/**
 * A plane {@code a + bx (x - x0) + by (y - y0)} fitted to a grid by least squares, removed before the
 * transform and put back, transformed by the filter, afterwards.
 *
 * @param a  value at the reference point, in the grid's unit
 * @param bx gradient towards east, unit per metre
 * @param by gradient towards north, unit per metre
 * @param x0 easting of the reference point, m
 * @param y0 northing of the reference point, m
 */
public record LinearTrend(double a, double bx, double by, double x0, double y0) {

    /** The zero plane about the given reference point. */
    public static LinearTrend zero(double x0, double y0) {
        return new LinearTrend(0, 0, 0, x0, y0);
    }

    /** Value of the plane at (x, y), metres. */
    public double at(double x, double y) {
        return a + bx * (x - x0) + by * (y - y0);
    }

    /**
     * Least-squares plane through the non-blank cells of a grid on {@code g} whose row {@code r} starts at
     * {@code v[r * stride]}, about the grid centre.
     */
    public static LinearTrend fit(GridGeometry g, float[] v, int stride) {
        double x0 = (g.west() + g.east()) / 2, y0 = (g.north() + g.south()) / 2;
        // Sums within each row (rows in parallel), then over rows in order: the same result on any core count.
        double[] rowSums = new double[5 * g.rows()];
        java.util.stream.IntStream.range(0, g.rows()).parallel().forEach(r -> {
            double n = 0, sx = 0, sxx = 0, sv = 0, sxv = 0;
            for (int c = 0, off = r * stride; c < g.columns(); c++) {
                float z = v[off + c];
                if (!Float.isNaN(z)) {
                    double x = g.x(c) - x0;
                    n++;
                    sx += x;
                    sxx += x * x;
                    sv += z;
                    sxv += x * z;
                }
            }
            rowSums[5 * r] = n;
            rowSums[5 * r + 1] = sx;
            rowSums[5 * r + 2] = sxx;
            rowSums[5 * r + 3] = sv;
            rowSums[5 * r + 4] = sxv;
        });
        double n = 0, sx = 0, sy = 0, sxx = 0, syy = 0, sxy = 0, sv = 0, sxv = 0, syv = 0;
        for (int r = 0; r < g.rows(); r++) {
            double y = g.y(r) - y0, nr = rowSums[5 * r], rx = rowSums[5 * r + 1], rv = rowSums[5 * r + 3];
            n += nr;
            sx += rx;
            sy += nr * y;
            sxx += rowSums[5 * r + 2];
            syy += nr * y * y;
            sxy += rx * y;
            sv += rv;
            sxv += rowSums[5 * r + 4];
            syv += rv * y;
        }
        if (n == 0) {
            throw new IllegalArgumentException("every cell of the grid is blank");
        }
        // Normal equations of v = a + bx x + by y, solved by Cramer's rule (3 x 3).
        double[][] m = {{n, sx, sy}, {sx, sxx, sxy}, {sy, sxy, syy}};
        double[] rhs = {sv, sxv, syv};
        double det = det3(m);
        if (Math.abs(det) < 1e-12 * Math.max(1, n * sxx * syy)) {
            return new LinearTrend(sv / n, 0, 0, x0, y0); // one row or column: only a level is defined
        }
        double[] sol = new double[3];
        for (int k = 0; k < 3; k++) {
            double[][] mk = {m[0].clone(), m[1].clone(), m[2].clone()};
            for (int i = 0; i < 3; i++) {
                mk[i][k] = rhs[i];
            }
            sol[k] = det3(mk) / det;
        }
        return new LinearTrend(sol[0], sol[1], sol[2], x0, y0);
    }

    private static double det3(double[][] m) {
        return m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1])
                - m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0])
                + m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
    }
}
