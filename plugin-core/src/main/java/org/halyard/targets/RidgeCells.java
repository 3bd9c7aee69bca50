package org.halyard.targets;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;

/**
 * The cells of a grid that lie on the crest of an elongated ridge, with the ridge direction at each.
 *
 * <p><b>Algorithm:</b> at each cell above the threshold the Hessian (central differences) gives the
 * curvature across the ridge (its most negative eigenvalue, eigenvector n) and along it (the other). A cell
 * is a ridge cell when (1) the across curvature is negative and at least {@code minAnisotropy} times the
 * along curvature in magnitude, (2) the value is a maximum along n at one cell either side (bilinear), and
 * (3) the gradient along the ridge is small relative to the value. Test (3) is what separates a cable from
 * the flanks of a compact peak, where every cell is a maximum along the circle through it (differential
 * ridge definition after Eberly et al. 1994, J. Math. Imaging Vision 4, 353-373).
 *
 * <p><b>Limitations:</b> ridges narrower than about three cells are not resolved; blank cells and their
 * neighbours are never ridge cells.
 *
 * <p><b>Thread safety:</b> immutable after construction.
 */
public final class RidgeCells {

    private final Grid grid;
    private final boolean[] ridge;
    private final double[] direction;

    private RidgeCells(Grid grid, boolean[] ridge, double[] direction) {
        this.grid = grid;
        this.ridge = ridge;
        this.direction = direction;
    }

    /**
     * Finds the ridge cells of {@code grid} (any unit; x east, y north, row 0 north) that stand more than
     * {@code rise} above the local level {@code level} (same unit).
     */
    static RidgeCells find(Grid grid, LocalBackground level, double rise, LinearFeatureOptions o) {
        GridGeometry geo = grid.geometry();
        double h = geo.cellSize();
        boolean[] ridge = new boolean[geo.size()];
        double[] dir = new double[geo.size()];
        for (int r = 1; r < geo.rows() - 1; r++) {
            for (int c = 1; c < geo.columns() - 1; c++) {
                double f = grid.get(c, r);
                if (!(f > level.at(c, r) + rise)) {
                    continue;
                }
                double e = grid.get(c + 1, r), w = grid.get(c - 1, r);
                double n = grid.get(c, r - 1), s = grid.get(c, r + 1);
                // Row index runs south, so d/dy uses north minus south.
                double fx = (e - w) / (2 * h), fy = (n - s) / (2 * h);
                double fxx = (e - 2 * f + w) / (h * h), fyy = (n - 2 * f + s) / (h * h);
                double fxy = (grid.get(c + 1, r - 1) - grid.get(c - 1, r - 1) - grid.get(c + 1, r + 1)
                        + grid.get(c - 1, r + 1)) / (4 * h * h);
                double mean = 0.5 * (fxx + fyy);
                double rad = Math.hypot(0.5 * (fxx - fyy), fxy);
                double across = mean - rad, along = mean + rad;
                if (Double.isNaN(across) || !(across < 0) || Math.abs(across) < o.minAnisotropy() * Math.abs(along)) {
                    continue;
                }
                // Angle of the across eigenvector (from the x axis, counter-clockwise), then the along direction.
                double theta = 0.5 * Math.atan2(2 * fxy, fxx - fyy) + Math.PI / 2;
                double nx = Math.cos(theta), ny = Math.sin(theta);
                double x = geo.x(c), y = geo.y(r);
                if (grid.valueAt(x + nx * h, y + ny * h) > f || grid.valueAt(x - nx * h, y - ny * h) > f) {
                    continue;
                }
                double alongSlope = Math.abs(-ny * fx + nx * fy);
                if (alongSlope > o.maxAlongSlope() * f) {
                    continue;
                }
                int i = geo.index(c, r);
                ridge[i] = true;
                dir[i] = theta + Math.PI / 2;
            }
        }
        return new RidgeCells(grid, ridge, dir);
    }

    /** The grid the ridges were found on. */
    public Grid grid() {
        return grid;
    }

    /** Whether the cell at row-major index {@code i} is a ridge cell. */
    public boolean isRidge(int i) {
        return ridge[i];
    }

    /** Direction along the ridge at cell {@code i}, radians counter-clockwise from east, modulo pi. */
    public double direction(int i) {
        return direction[i];
    }

    /** Number of ridge cells. */
    public int count() {
        int n = 0;
        for (boolean b : ridge) {
            if (b) {
                n++;
            }
        }
        return n;
    }
}
