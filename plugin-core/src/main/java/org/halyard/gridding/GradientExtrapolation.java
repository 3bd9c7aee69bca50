package org.halyard.gridding;

import java.util.Arrays;
import org.halyard.grid.GridGeometry;

/**
 * Values at empty cell centres near the lines, extrapolated from measured horizontal gradients, for
 * gradient-enhanced gridding.
 *
 * <p><b>Algorithm:</b> each gradient sample {@code p} first takes a value from the nearest merged value
 * sample {@code s} within {@value #VALUE_SEARCH_CELLS} cells, carried to {@code p} by its own gradient:
 * {@code T(p) = T(s) + g(p) . (p - s)}. Then every cell centre {@code n} without a value sample within the
 * reach of {@code p} receives the first-order Taylor estimate {@code T(p) + g(p) . (n - p)}; estimates
 * from several gradient samples are averaged with weights {@code 1 / d^2}. The spline solve then treats
 * these values as data, so the surface between lines follows the measured slopes at the lines instead of
 * only the curvature of the values. This is the Taylor-extrapolation form of gradient-enhanced gridding
 * (O'Connell, Smith and Vallee 2005, The Leading Edge 24(2), 142-145, from memory); docs/gridding.md
 * describes it.
 *
 * <p><b>Accuracy:</b> the truncation error of an estimate at distance d is about {@code T'' d^2 / 2}; the
 * reach should stay well under half the line spacing (see {@link #automaticReach(double)}).
 *
 * <p><b>Limitations:</b> a gradient sample with no value sample near it is not used.
 *
 * <p><b>Thread safety:</b> stateless; the static method may be called from any thread.
 */
public final class GradientExtrapolation {

    /** How far, in cells, a gradient sample looks for a value sample. */
    static final int VALUE_SEARCH_CELLS = 2;
    /** Automatic reach, in cells. */
    static final double AUTOMATIC_REACH_CELLS = 2;

    private GradientExtrapolation() {
    }

    /** The reach used when the options leave it automatic: {@value #AUTOMATIC_REACH_CELLS} cells, metres. */
    public static double automaticReach(double cellSize) {
        return AUTOMATIC_REACH_CELLS * cellSize;
    }

    /**
     * Extrapolated values at cell centres that hold no value sample.
     *
     * @param values   merged value samples on {@code geometry} (nT)
     * @param gx       merged east gradients on {@code geometry}, nT/m
     * @param gy       merged north gradients, nT/m, merged with the same statistic from the same points as
     *                 {@code gx} (so positions and order agree)
     * @param geometry the grid (row 0 north)
     * @param reach    largest distance from a gradient sample to an extrapolated cell centre, metres
     * @return pseudo-samples at cell centres (cell indices row-major), without skip counts
     */
    public static ReducedSamples extrapolate(ReducedSamples values, ReducedSamples gx, ReducedSamples gy,
                                             GridGeometry geometry, double reach) {
        if (gx.size() != gy.size()) {
            throw new IllegalArgumentException("east and north gradients merged to different cells: "
                    + gx.size() + " and " + gy.size());
        }
        int cols = geometry.columns(), rows = geometry.rows();
        double cs = geometry.cellSize();
        int[] valueAt = new int[geometry.size()];
        Arrays.fill(valueAt, -1);
        for (int s = 0; s < values.size(); s++) {
            valueAt[values.cell()[s]] = s;
        }
        int[] accAt = new int[geometry.size()];
        Arrays.fill(accAt, -1);
        double[] sumW = new double[64], sumWE = new double[64];
        int[] accCell = new int[64];
        int acc = 0;
        int r = (int) Math.ceil(reach / cs);
        double floor2 = 0.0625 * cs * cs;
        for (int p = 0; p < gx.size(); p++) {
            double px = gx.x()[p], py = gx.y()[p], gxp = gx.value()[p], gyp = gy.value()[p];
            int pc = gx.cell()[p] % cols, pr = gx.cell()[p] / cols;
            double tp = valueAtGradient(values, valueAt, px, py, pc, pr, gxp, gyp, geometry);
            if (Double.isNaN(tp)) {
                continue;
            }
            for (int rr = Math.max(0, pr - r); rr <= Math.min(rows - 1, pr + r); rr++) {
                double dy = geometry.y(rr) - py;
                for (int cc = Math.max(0, pc - r); cc <= Math.min(cols - 1, pc + r); cc++) {
                    int cell = geometry.index(cc, rr);
                    if (valueAt[cell] >= 0) {
                        continue;
                    }
                    double dx = geometry.x(cc) - px, d2 = dx * dx + dy * dy;
                    if (d2 > reach * reach) {
                        continue;
                    }
                    int a = accAt[cell];
                    if (a < 0) {
                        if (acc == sumW.length) {
                            sumW = Arrays.copyOf(sumW, acc * 2);
                            sumWE = Arrays.copyOf(sumWE, acc * 2);
                            accCell = Arrays.copyOf(accCell, acc * 2);
                        }
                        a = acc++;
                        accAt[cell] = a;
                        accCell[a] = cell;
                    }
                    double wgt = 1 / Math.max(d2, floor2);
                    sumW[a] += wgt;
                    sumWE[a] += wgt * (tp + gxp * dx + gyp * dy);
                }
            }
        }
        double[] ox = new double[acc], oy = new double[acc], ov = new double[acc];
        int[] oc = Arrays.copyOf(accCell, acc);
        for (int a = 0; a < acc; a++) {
            ox[a] = geometry.x(oc[a] % cols);
            oy[a] = geometry.y(oc[a] / cols);
            ov[a] = sumWE[a] / sumW[a];
        }
        return new ReducedSamples(ox, oy, ov, oc, 0, 0);
    }

    /** T at a gradient sample from the nearest value sample, carried by the gradient; NaN when none is near. */
    private static double valueAtGradient(ReducedSamples values, int[] valueAt, double px, double py, int pc, int pr,
                                          double gx, double gy, GridGeometry geometry) {
        int best = -1;
        double bestD2 = Double.POSITIVE_INFINITY;
        int n = VALUE_SEARCH_CELLS;
        for (int rr = Math.max(0, pr - n); rr <= Math.min(geometry.rows() - 1, pr + n); rr++) {
            for (int cc = Math.max(0, pc - n); cc <= Math.min(geometry.columns() - 1, pc + n); cc++) {
                int s = valueAt[geometry.index(cc, rr)];
                if (s < 0) {
                    continue;
                }
                double dx = values.x()[s] - px, dy = values.y()[s] - py, d2 = dx * dx + dy * dy;
                if (d2 < bestD2) {
                    bestD2 = d2;
                    best = s;
                }
            }
        }
        if (best < 0) {
            return Double.NaN;
        }
        return values.value()[best] + gx * (px - values.x()[best]) + gy * (py - values.y()[best]);
    }
}
