package org.halyard.targets;

import java.util.Optional;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;

/**
 * Euler deconvolution in a square window: the source position, depth and background that best satisfy
 * Euler's homogeneity equation over the window's cells.
 *
 * <p><b>Algorithm:</b> (x - x0) Tx + (y - y0) Ty + (z - z0) Tz = N (B - T) (Thompson 1982, Geophysics
 * 47(1) 31-37, eq. 1; Reid et al. 1990, Geophysics 55(1) 80-91, eq. 2), with z down and the observations at
 * z = 0, is rearranged to x0 Tx + y0 Ty + z0 Tz + N B = x Tx + y Ty + N T and solved by least squares (QR,
 * Commons Math). The parameter covariance is s^2 (A^T A)^-1 with s^2 the residual variance; a solution is
 * kept when sigma(z0)/z0 and its distance to the window centre are within {@link EulerOptions}. Of several
 * window sizes the accepted solution with the smallest relative depth error wins.
 *
 * <p><b>Accuracy:</b> exact for a noise-free homogeneous field of degree -N (a dipole, N = 3; an infinite
 * line of dipoles, N = 2) when the derivatives are exact; errors grow with noise, derivative error and
 * neighbouring sources inside the window.
 *
 * <p><b>Limitations:</b> a window much smaller than the source depth is ill-conditioned (rejected by the
 * depth-error test); blank cells are skipped.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class EulerDeconvolution {

    private EulerDeconvolution() {
    }

    /** Horizontal unknowns of the full 3-D solve: east and north offsets. */
    private static final double[][] PLAN = {{1, 0}, {0, 1}};

    /**
     * The best accepted solution around (x, y), or empty when no window gives one.
     *
     * @param x easting of the window centre, m
     * @param y northing of the window centre, m
     * @return depth below the grid's observation level, positive down
     */
    public static Optional<EulerSolution> solve(FieldGrids grids, double x, double y, EulerOptions options) {
        return best(grids, x, y, options, PLAN);
    }

    /**
     * As {@link #solve}, for a source elongated along {@code strikeDeg} (degrees clockwise from north): the
     * position along the strike is held at the window centre and only the offset across it is solved, the
     * 2-D form of the equation (Thompson 1982). A line source leaves the along-strike position undetermined,
     * so the 3-D solve would be ill-conditioned.
     */
    public static Optional<EulerSolution> solveAcross(FieldGrids grids, double x, double y, double strikeDeg,
                                                      EulerOptions options) {
        double s = Math.toRadians(strikeDeg);
        // Across-strike unit vector (east, north): the strike (sin s, cos s) turned by 90 degrees.
        return best(grids, x, y, options, new double[][] {{Math.cos(s), -Math.sin(s)}});
    }

    private static Optional<EulerSolution> best(FieldGrids grids, double x, double y, EulerOptions options,
                                                double[][] plan) {
        EulerSolution best = null;
        for (double w : options.windowSizesM()) {
            Optional<EulerSolution> s = solveWindow(grids, x, y, w, options.structuralIndex(), plan);
            if (s.isPresent() && accepted(s.get(), x, y, options)
                    && (best == null || s.get().relativeDepthError() < best.relativeDepthError())) {
                best = s.get();
            }
        }
        return Optional.ofNullable(best);
    }

    /**
     * The least-squares solution in one window of side {@code windowM} metres, before acceptance tests;
     * empty when fewer than 8 cells are usable or the system is singular.
     *
     * @param plan unit vectors (east, north) along which the source may move horizontally
     */
    static Optional<EulerSolution> solveWindow(FieldGrids grids, double x, double y, double windowM, double n,
                                               double[][] plan) {
        GridGeometry geo = grids.total().geometry();
        int half = (int) Math.max(1, Math.round(0.5 * windowM / geo.cellSize()));
        int c0 = (int) Math.round(geo.column(x));
        int r0 = (int) Math.round(geo.row(y));
        int side = 2 * half + 1;
        int k = plan.length;
        double[][] a = new double[side * side][];
        double[] b = new double[side * side];
        int m = 0;
        for (int r = Math.max(0, r0 - half); r <= Math.min(geo.rows() - 1, r0 + half); r++) {
            for (int c = Math.max(0, c0 - half); c <= Math.min(geo.columns() - 1, c0 + half); c++) {
                double t = grids.total().get(c, r), tx = grids.dx().get(c, r);
                double ty = grids.dy().get(c, r), tz = grids.dz().get(c, r);
                if (Double.isNaN(t + tx + ty + tz)) {
                    continue;
                }
                // Coordinates relative to the window centre keep the system well scaled.
                double px = geo.x(c) - x, py = geo.y(r) - y;
                double[] row = new double[k + 2];
                for (int j = 0; j < k; j++) {
                    row[j] = plan[j][0] * tx + plan[j][1] * ty;
                }
                row[k] = tz;
                row[k + 1] = n;
                a[m] = row;
                b[m] = px * tx + py * ty + n * t;
                m++;
            }
        }
        if (m < 8) {
            return Optional.empty();
        }
        RealMatrix am = new Array2DRowRealMatrix(java.util.Arrays.copyOf(a, m), false);
        RealVector bv = new ArrayRealVector(java.util.Arrays.copyOf(b, m), false);
        DecompositionSolver solver = new QRDecomposition(am, 1e-12).getSolver();
        if (!solver.isNonSingular()) {
            return Optional.empty();
        }
        RealVector p = solver.solve(bv);
        RealVector res = am.operate(p).subtract(bv);
        double s2 = res.dotProduct(res) / Math.max(1, m - (k + 2));
        RealMatrix cov;
        try {
            cov = new QRDecomposition(am.transpose().multiply(am)).getSolver().getInverse().scalarMultiply(s2);
        } catch (org.apache.commons.math3.linear.SingularMatrixException e) {
            return Optional.empty();
        }
        double ex = 0, ey = 0;
        for (int j = 0; j < k; j++) {
            ex += p.getEntry(j) * plan[j][0];
            ey += p.getEntry(j) * plan[j][1];
        }
        double sigmaZ = Math.sqrt(Math.max(0, cov.getEntry(k, k)));
        return Optional.of(new EulerSolution(x + ex, y + ey, p.getEntry(k), p.getEntry(k + 1), sigmaZ, n, windowM, m));
    }

    private static boolean accepted(EulerSolution s, double x, double y, EulerOptions o) {
        double dist = Math.hypot(s.x() - x, s.y() - y);
        return s.depth() > 0 && s.relativeDepthError() <= o.maxRelativeDepthError()
                && dist <= o.maxDistanceFactor() * s.windowM();
    }
}
