package org.halyard.targets;

import java.util.ArrayList;
import java.util.List;
import org.halyard.grid.GridGeometry;

/**
 * A set of linked ridge cells and its principal axis: the unit from which linear features are built.
 *
 * <p><b>Algorithm:</b> the axis is the principal eigenvector of the 2 x 2 covariance of the cell centres
 * (principal component analysis); the extent is the span of the cells' projections on it.
 *
 * <p><b>Thread safety:</b> immutable.
 */
final class RidgePiece {

    final int[] cells;
    final double cx, cy;
    /** Unit axis (east, north). */
    final double ux, uy;
    final double minT, maxT;
    /** Mean |cos| of the angle between each cell's ridge direction and the axis. */
    final double alignment;

    RidgePiece(int[] cells, RidgeCells ridges) {
        GridGeometry geo = ridges.grid().geometry();
        this.cells = cells.clone();
        double sx = 0, sy = 0;
        for (int i : cells) {
            sx += geo.x(i % geo.columns());
            sy += geo.y(i / geo.columns());
        }
        cx = sx / cells.length;
        cy = sy / cells.length;
        double sxx = 0, syy = 0, sxy = 0;
        for (int i : cells) {
            double dx = geo.x(i % geo.columns()) - cx, dy = geo.y(i / geo.columns()) - cy;
            sxx += dx * dx;
            syy += dy * dy;
            sxy += dx * dy;
        }
        double theta = 0.5 * Math.atan2(2 * sxy, sxx - syy);
        ux = Math.cos(theta);
        uy = Math.sin(theta);
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY, align = 0;
        for (int i : cells) {
            double t = along(geo.x(i % geo.columns()), geo.y(i / geo.columns()));
            lo = Math.min(lo, t);
            hi = Math.max(hi, t);
            align += Math.abs(Math.cos(ridges.direction(i) - theta));
        }
        minT = lo;
        maxT = hi;
        alignment = align / cells.length;
    }

    /** Position along the axis of a point, m from the centroid. */
    double along(double x, double y) {
        return (x - cx) * ux + (y - cy) * uy;
    }

    /** Distance of a point from the axis line, m. */
    double across(double x, double y) {
        return Math.abs(-(x - cx) * uy + (y - cy) * ux);
    }

    double length() {
        return maxT - minT;
    }

    /** End points {x0, y0, x1, y1} of the axis segment. */
    double[] ends() {
        return new double[] {cx + minT * ux, cy + minT * uy, cx + maxT * ux, cy + maxT * uy};
    }

    /**
     * Whether {@code other} continues this piece: axes within {@code maxTurnDeg}, a gap between their nearest
     * ends of at most {@code maxGap} or the pieces' mean length (or overlapping), and each of the two facing ends within
     * {@code maxOffset} of the other piece's axis.
     */
    boolean continues(RidgePiece other, double maxTurnDeg, double maxGap, double maxOffset) {
        double cos = Math.abs(ux * other.ux + uy * other.uy);
        if (cos < Math.cos(Math.toRadians(maxTurnDeg))) {
            return false;
        }
        double[] a = ends(), b = other.ends();
        double gap = Double.POSITIVE_INFINITY;
        int ai = 0, bj = 0;
        for (int i = 0; i < 4; i += 2) {
            for (int j = 0; j < 4; j += 2) {
                double d = Math.hypot(a[i] - b[j], a[i + 1] - b[j + 1]);
                if (d < gap) {
                    gap = d;
                    ai = i;
                    bj = j;
                }
            }
        }
        // Offsets at the facing ends: a bend keeps them small, a parallel neighbour does not.
        double offset = Math.max(across(b[bj], b[bj + 1]), other.across(a[ai], a[ai + 1]));
        boolean overlapping = other.along(a[0], a[1]) * other.along(a[2], a[3]) < 0
                || along(b[0], b[1]) * along(b[2], b[3]) < 0;
        // A gap up to the mean length of the two pieces is bridged too: a strong object lying on a cable, or
        // a crossing pipe, hides the ridge over a few times its depth or width, and both sides stay long and
        // collinear. The offset test keeps the bridge straight: 2 m over 40 m is 3 degrees.
        double allowed = Math.max(maxGap, 0.5 * (length() + other.length()));
        return (gap <= allowed || overlapping) && offset <= maxOffset;
    }

    /** The piece made of this one's cells and {@code other}'s. */
    static RidgePiece merge(List<RidgePiece> parts, RidgeCells ridges) {
        List<Integer> all = new ArrayList<>();
        for (RidgePiece p : parts) {
            for (int i : p.cells) {
                all.add(i);
            }
        }
        return new RidgePiece(all.stream().mapToInt(Integer::intValue).toArray(), ridges);
    }
}
