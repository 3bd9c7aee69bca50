package org.halyard.targets;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;

/**
 * Picks the local maxima of a grid that stand above a noise-adaptive threshold.
 *
 * <p><b>Algorithm:</b> the noise sigma is the fourth-difference figure of {@link NoiseEstimate}. Maxima are
 * sought on the grid smoothed by a Gaussian of one cell ({@link GaussianSmoother}), which removes the
 * cell-scale texture of gridded line data that would otherwise give false maxima. A cell is a candidate
 * when its smoothed value exceeds the local level ({@link LocalBackground}, medians of
 * {@value #BACKGROUND_TILE_M} m tiles) by {@code k sigma} and is the largest of the smoothed grid in a
 * square window (ties go to the first cell in row-major order, so a flat top yields one candidate).
 * Candidates are taken strongest first and one closer than the minimum separation to a stronger pick is
 * dropped. The position is refined by a parabola through the cell and its two neighbours along each axis
 * of the smoothed grid (common practice), clamped to half a cell; the amplitude is the vertex of the
 * same parabolas on the grid as given.
 *
 * <p><b>Accuracy:</b> the parabola is exact for a quadratic peak; for analytic-signal peaks sampled at a
 * quarter of the source depth or finer, the bias is a few hundredths of a cell.
 *
 * <p><b>Limitations:</b> maxima on the grid edge or next to a blank are not refined (kept at the cell
 * centre). Ridges (cables) also give maxima; {@link LinearFeatureDetector} labels those.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class PeakPicker {

    /** Side of the tiles of the local level, m: several times the width of a compact anomaly. */
    static final double BACKGROUND_TILE_M = 10;
    /** Standard deviation of the smoothing before the maximum test, cells. */
    static final double SMOOTHING_CELLS = 1;

    private PeakPicker() {
    }

    /**
     * The result of a pick.
     *
     * @param peaks     picks, strongest first
     * @param noise     the robust level and spread of the grid, in its unit
     * @param threshold the level a pick had to exceed where the local level equals the grid's median, in the
     *                  grid's unit
     */
    public record Result(List<Peak> peaks, NoiseEstimate noise, double threshold) {
        public Result {
            peaks = List.copyOf(peaks);
        }
    }

    /**
     * Picks the peaks of {@code grid} (any unit; x east, y north, row 0 north).
     *
     * @param progress reports 0 to 100 and is checked for cancellation once a row
     */
    public static Result pick(Grid grid, PeakOptions options, Progress progress) {
        return pick(grid, NoiseEstimate.of(grid), options, progress);
    }

    /**
     * As {@link #pick(Grid, PeakOptions, Progress)} with the grid's noise estimate already made (the
     * estimate sorts the whole grid; a caller that also traces ridges makes it once for both).
     *
     * @param noise {@link NoiseEstimate#of} of {@code grid}, in the grid's unit
     */
    public static Result pick(Grid grid, NoiseEstimate noise, PeakOptions options, Progress progress) {
        double threshold = noise.threshold(options.thresholdFactor());
        double rise = threshold - noise.background();
        Grid smooth = GaussianSmoother.smooth(grid, SMOOTHING_CELLS * grid.geometry().cellSize());
        LocalBackground level = LocalBackground.of(smooth, BACKGROUND_TILE_M, noise.background());
        List<Peak> candidates = new ArrayList<>();
        int w = options.windowCells();
        for (int r = 0; r < grid.rows(); r++) {
            progress.checkCanceled();
            for (int c = 0; c < grid.columns(); c++) {
                float v = smooth.get(c, r);
                if (v > level.at(c, r) + rise && isWindowMaximum(smooth, c, r, w)) {
                    candidates.add(refine(smooth, grid, c, r));
                }
            }
            progress.report(90.0 * (r + 1) / grid.rows());
        }
        candidates.sort(Comparator.comparingDouble(Peak::amplitude).reversed());
        List<Peak> kept = separate(candidates, options.minSeparationM());
        progress.report(100);
        return new Result(kept, noise, threshold);
    }

    /** Whether (c, r) holds the largest value of its window; equal values earlier in row-major order win. */
    static boolean isWindowMaximum(Grid g, int c, int r, int w) {
        float v = g.get(c, r);
        for (int rr = Math.max(0, r - w); rr <= Math.min(g.rows() - 1, r + w); rr++) {
            for (int cc = Math.max(0, c - w); cc <= Math.min(g.columns() - 1, c + w); cc++) {
                float o = g.get(cc, rr);
                boolean earlier = rr < r || (rr == r && cc < c);
                if (o > v || (earlier && o == v)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** Position from the parabolas of {@code pos} at (c, r), amplitude from those of {@code amp}. */
    private static Peak refine(Grid pos, Grid amp, int c, int r) {
        GridGeometry geo = pos.geometry();
        double[][] p = parabolas(pos, c, r), a = parabolas(amp, c, r);
        double x = geo.x(c) + p[0][0] * geo.cellSize();
        double y = geo.y(r) - p[1][0] * geo.cellSize();
        return new Peak(x, y, amp.get(c, r) + a[0][1] + a[1][1], c, r);
    }

    /** The {@link #vertex} along the row and down the column at (c, r); {0, 0} on the edges. */
    private static double[][] parabolas(Grid g, int c, int r) {
        double v = g.get(c, r);
        double[] along = {0, 0};
        double[] down = {0, 0};
        if (c > 0 && c < g.columns() - 1) {
            along = vertex(g.get(c - 1, r), v, g.get(c + 1, r));
        }
        if (r > 0 && r < g.rows() - 1) {
            down = vertex(g.get(c, r - 1), v, g.get(c, r + 1));
        }
        return new double[][] {along, down};
    }

    /**
     * The vertex of the parabola through (-1, a), (0, b), (1, c): {offset, rise above b}, the offset clamped
     * to half a cell; {0, 0} where the three values are not concave or one is blank.
     */
    static double[] vertex(double a, double b, double c) {
        double curvature = a - 2 * b + c;
        if (!(curvature < 0)) {
            return new double[] {0, 0};
        }
        double t = Math.max(-0.5, Math.min(0.5, 0.5 * (a - c) / curvature));
        return new double[] {t, 0.5 * (c - a) * t + 0.5 * curvature * t * t};
    }

    private static List<Peak> separate(List<Peak> sorted, double minSeparation) {
        List<Peak> kept = new ArrayList<>();
        double s2 = minSeparation * minSeparation;
        for (Peak p : sorted) {
            boolean clear = true;
            for (Peak k : kept) {
                double dx = p.x() - k.x(), dy = p.y() - k.y();
                if (dx * dx + dy * dy < s2) {
                    clear = false;
                    break;
                }
            }
            if (clear) {
                kept.add(p);
            }
        }
        return kept;
    }
}
