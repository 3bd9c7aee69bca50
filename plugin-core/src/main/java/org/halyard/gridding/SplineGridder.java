package org.halyard.gridding;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;

/**
 * Scattered samples to a regular grid by continuous-curvature splines in tension, solved coarse to fine,
 * optionally constrained between lines by measured horizontal gradients.
 *
 * <p><b>Algorithm:</b> samples are merged per cell ({@link BlockReduction}); the internal lattice is padded
 * to sides of {@code a 2^L + 1} nodes ({@link CoarseningLayout}); starting from the least-squares plane on
 * the coarsest lattice, each level is relaxed ({@link TensionSplineRelaxation}) until no node moves by more
 * than the convergence limit in a sweep, then interpolated bilinearly to the next finer level (Smith and
 * Wessel 1990, Geophysics 55(3) 293-305, section "Computation"; Briggs 1974, Geophysics 39(1) 39-48). At
 * every level each node takes the closest sample within half a node spacing. The finest lattice is cropped
 * to the grid, then cells farther from data than the blanking distance are blanked using the exact
 * distance transform ({@link DistanceTransform}). With gradients, values extrapolated from them
 * ({@link GradientExtrapolation}) are added as data before the solve.
 *
 * <p>Automatic blanking distance: the larger of {@value #MIN_BLANK_CELLS} cells and 1.5 times the typical
 * half-gap between lines, the 75th percentile of the distance-to-data at its local maxima (the ridges
 * midway between lines); for parallel lines {@code S} apart that is {@code 0.75 S}, so gaps between lines are
 * kept and the surface reaches three quarters of a line spacing beyond the outer lines.
 *
 * <p><b>Accuracy:</b> samples are reproduced at their nodes to about the convergence limit; agreement with
 * GMT {@code surface} at equal tension is checked in {@code SplineGridderGmtTest}.
 *
 * <p><b>Limitations:</b> one sample per node at the finest level (the cell's merged sample), so detail finer
 * than a cell is lost; tension must be below 1; memory about 15 bytes per internal node, 30 per cell and
 * 8 per input sample ({@link #requiredBytes(GridGeometry, long)}), then 64 per merged sample.
 *
 * <p><b>Thread safety:</b> the static methods may be called from any thread; each solve uses the common
 * fork-join pool (both cores).
 */
public final class SplineGridder {

    /** The automatic blanking distance is never below this many cells. */
    public static final double MIN_BLANK_CELLS = 3;

    private final GridGeometry geometry;
    private final GriddingOptions options;
    private final Progress progress;

    private SplineGridder(GridGeometry geometry, GriddingOptions options, Progress progress) {
        this.geometry = geometry;
        this.options = options == null ? GriddingOptions.defaults() : options;
        this.progress = Progress.orNone(progress);
    }

    /**
     * Grids scattered samples.
     *
     * @param x        eastings, metres; NaN or infinite samples are skipped and counted
     * @param y        northings, metres
     * @param value    values (nT, or nT/m when gridding a gradient)
     * @param geometry the output grid (row 0 north, pixel-is-area); samples outside it are skipped and counted
     * @param options  tension, limits, block statistic, blanking; null for {@link GriddingOptions#defaults()}
     * @param progress progress 0-100 and cancellation; null for none
     * @return the grid in the unit of {@code value} and the counts of what was used
     * @throws IllegalArgumentException fewer than 3 usable samples, all at one position, a grid below 3 x 3
     *                                  cells or one that does not fit in memory
     * @throws java.util.concurrent.CancellationException when {@code progress} asks to stop
     */
    public static GriddingResult grid(double[] x, double[] y, double[] value, GridGeometry geometry,
                                      GriddingOptions options, Progress progress) {
        return new SplineGridder(geometry, options, progress).solve(x, y, value, null);
    }

    /**
     * Grids scattered samples with measured horizontal gradients constraining the surface between lines
     * (gradient-enhanced mode, {@link GradientExtrapolation}).
     *
     * @param gradients gradient samples (nT/m towards east and north), usually at the sensor-pair midpoints
     * @see #grid(double[], double[], double[], GridGeometry, GriddingOptions, Progress)
     */
    public static GriddingResult grid(double[] x, double[] y, double[] value, GradientSamples gradients,
                                      GridGeometry geometry, GriddingOptions options, Progress progress) {
        return new SplineGridder(geometry, options, progress).solve(x, y, value, gradients);
    }

    /**
     * A grid geometry covering the finite samples with cells of {@code cellSize}, corner snapped to whole
     * cells (see {@link GridGeometry#covering}).
     *
     * @param cellSize cell side, metres
     * @param crsCode  such as {@code "EPSG:32631"}, or null
     * @throws IllegalArgumentException fewer than 3 finite samples, all at one position, or a cell so large
     *                                  that the grid would have fewer than 3 cells a side
     */
    public static GridGeometry geometryFor(double[] x, double[] y, double cellSize, String crsCode) {
        if (!(cellSize > 0) || Double.isInfinite(cellSize)) {
            throw new IllegalArgumentException("cell size must be a positive number of metres, got " + cellSize);
        }
        double[] e = finiteExtent(x, y, null);
        double xmin = e[1], xmax = e[2], ymin = e[3], ymax = e[4];
        requireSpread((int) e[0], x.length - (int) e[0], xmax - xmin, ymax - ymin);
        GridGeometry g = GridGeometry.covering(xmin, ymin, xmax, ymax, cellSize, crsCode);
        if (g.columns() < 3 || g.rows() < 3) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "cell of %s m is too large for the data extent of %.3f m x %.3f m (a grid needs at least"
                            + " 3 x 3 cells); use a smaller cell", cellSize, xmax - xmin, ymax - ymin));
        }
        return g;
    }

    /** {count, xmin, xmax, ymin, ymax} of the samples whose x, y (and value, when given) are finite. */
    private static double[] finiteExtent(double[] x, double[] y, double[] value) {
        double xmin = Double.POSITIVE_INFINITY, xmax = Double.NEGATIVE_INFINITY;
        double ymin = Double.POSITIVE_INFINITY, ymax = Double.NEGATIVE_INFINITY;
        int n = 0;
        for (int i = 0; i < x.length; i++) {
            if (Double.isFinite(x[i]) && Double.isFinite(y[i]) && (value == null || Double.isFinite(value[i]))) {
                xmin = Math.min(xmin, x[i]);
                xmax = Math.max(xmax, x[i]);
                ymin = Math.min(ymin, y[i]);
                ymax = Math.max(ymax, y[i]);
                n++;
            }
        }
        return new double[] {n, xmin, xmax, ymin, ymax};
    }

    private static void requireSpread(int finite, int skipped, double width, double height) {
        if (finite < 3) {
            throw new IllegalArgumentException("gridding needs at least 3 samples with finite x, y and value, got "
                    + finite + (skipped > 0 ? " (" + skipped + " skipped for NaN or infinite numbers)" : ""));
        }
        if (width == 0 && height == 0) {
            throw new IllegalArgumentException("all " + finite + " samples are at one position; gridding needs"
                    + " samples spread over an area");
        }
    }

    /**
     * Memory a solve needs before its samples are merged, bytes, for {@code samples} input samples on
     * {@code geometry}: the double and int lattices of the two finest levels, the per-cell arrays (merged
     * samples, data mask, blanking) and the merge's sort arrays, which hold 8 bytes a sample while one
     * reduction runs (values and the two gradient components are reduced one after another).
     */
    public static long requiredBytes(GridGeometry geometry, long samples) {
        CoarseningLayout layout = CoarseningLayout.of(geometry.columns(), geometry.rows());
        long nodes = (long) (layout.columns() + 4) * (layout.rows() + 4);
        return nodes * 15 + (long) geometry.size() * 30 + samples * 8;
    }

    /** Memory of the solve once the samples are merged: lattices and 64 bytes per placed sample. */
    private static long solveBytes(CoarseningLayout layout, GridGeometry geometry, long placed) {
        long nodes = (long) (layout.columns() + 4) * (layout.rows() + 4);
        return nodes * 15 + (long) geometry.size() * 12 + placed * 64;
    }

    /**
     * Refuses a solve that would not fit in the heap, with what it needs. Garbage left by earlier stages
     * counts as used until collected, so a shortfall is confirmed after one collection.
     */
    private static void requireMemory(GridGeometry geometry, long samples, long need) {
        if (need <= freeBytes()) {
            return;
        }
        System.gc();
        long free = freeBytes();
        if (need > free) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "a grid of %d x %d cells from %d samples needs about %d MB of memory but only %d MB is free;"
                            + " use a larger cell or give Java more memory (-Xmx)", geometry.columns(),
                    geometry.rows(), samples, need >> 20, free >> 20));
        }
    }

    private static long freeBytes() {
        Runtime rt = Runtime.getRuntime();
        return rt.maxMemory() - (rt.totalMemory() - rt.freeMemory());
    }

    private GriddingResult solve(double[] x, double[] y, double[] value, GradientSamples gradients) {
        if (x.length != y.length || x.length != value.length) {
            throw new IllegalArgumentException("x, y and value arrays differ in length: " + x.length + ", "
                    + y.length + ", " + value.length);
        }
        if (geometry.columns() < 3 || geometry.rows() < 3) {
            throw new IllegalArgumentException("a spline grid needs at least 3 x 3 cells, got "
                    + geometry.columns() + " x " + geometry.rows() + "; use a smaller cell");
        }
        long samples = x.length + (gradients == null ? 0 : 2L * gradients.size());
        requireMemory(geometry, samples, requiredBytes(geometry, Math.max(x.length,
                gradients == null ? 0 : gradients.size())));
        progress.report(0);
        ReducedSamples data = BlockReduction.reduce(x, y, value, geometry, options.statistic());
        int used = x.length - data.nonFinite() - data.outside();
        if (used < 3) {
            throw new IllegalArgumentException("gridding needs at least 3 samples with finite x, y and value inside"
                    + " the grid, got " + used + " (" + data.nonFinite() + " not finite, " + data.outside()
                    + " outside)");
        }
        double[] e = finiteExtent(x, y, value);
        requireSpread((int) e[0], x.length - (int) e[0], e[2] - e[1], e[4] - e[3]);
        ReducedSamples pseudo = null;
        boolean[] dataCells = new boolean[geometry.size()];
        for (int c : data.cell()) {
            dataCells[c] = true;
        }
        if (gradients != null) {
            ReducedSamples gx = BlockReduction.reduce(gradients.x(), gradients.y(), gradients.gx(), geometry,
                    BlockStatistic.MEAN);
            ReducedSamples gy = BlockReduction.reduce(gradients.x(), gradients.y(), gradients.gy(), geometry,
                    BlockStatistic.MEAN);
            double reach = Double.isNaN(options.gradientReach())
                    ? GradientExtrapolation.automaticReach(geometry.cellSize()) : options.gradientReach();
            pseudo = GradientExtrapolation.extrapolate(data, gx, gy, geometry, reach);
            for (int c : gx.cell()) {
                dataCells[c] = true;
            }
        }
        progress.report(5);
        progress.checkCanceled();

        double[] range = range(data.value());
        double limit = Double.isNaN(options.convergenceLimit())
                ? Math.max(GriddingOptions.DEFAULT_RELATIVE_LIMIT * (range[1] - range[0]), Double.MIN_NORMAL)
                : options.convergenceLimit();
        CoarseningLayout layout = CoarseningLayout.of(geometry.columns(), geometry.rows());
        int n = data.size() + (pseudo == null ? 0 : pseudo.size());
        requireMemory(geometry, samples, solveBytes(layout, geometry, n));
        double[] fi = new double[n], fj = new double[n], v = new double[n];
        place(data, layout, fi, fj, v, 0);
        if (pseudo != null) {
            place(pseudo, layout, fi, fj, v, data.size());
        }
        Solve s = relaxLevels(layout, fi, fj, v, limit, progress.slice(5, 95));

        float[] out = new float[geometry.size()];
        for (int r = 0; r < geometry.rows(); r++) {
            for (int c = 0; c < geometry.columns(); c++) {
                out[geometry.index(c, r)] = (float) s.finest.u[s.finest.at(c + layout.padWest(), r + layout.padNorth())];
            }
        }
        double blank = blank(out, dataCells);
        progress.report(100);
        return new GriddingResult(Grid.wrap(geometry, out), used, data.nonFinite(), data.outside(), data.size(),
                pseudo == null ? 0 : pseudo.size(), blank, limit, s.sweeps, s.converged, s.lastChange);
    }

    private void place(ReducedSamples r, CoarseningLayout layout, double[] fi, double[] fj, double[] v, int offset) {
        for (int s = 0; s < r.size(); s++) {
            fi[offset + s] = geometry.column(r.x()[s]) + layout.padWest();
            fj[offset + s] = geometry.row(r.y()[s]) + layout.padNorth();
            v[offset + s] = r.value()[s];
        }
    }

    private record Solve(TensionSplineRelaxation finest, int sweeps, boolean converged, double lastChange) {
    }

    private Solve relaxLevels(CoarseningLayout layout, double[] fi, double[] fj, double[] v, double limit,
                              Progress p) {
        double total = 0;
        for (int l = layout.halvings(); l >= 0; l--) {
            total += (double) layout.columnsAt(l) * layout.rowsAt(l);
        }
        double done = 0;
        TensionSplineRelaxation level = null;
        int sweeps = 0;
        boolean converged = true;
        double lastChange = Double.NaN;
        double[] li = new double[v.length], lj = new double[v.length];
        for (int l = layout.halvings(); l >= 0; l--) {
            int stride = layout.stride(l);
            TensionSplineRelaxation next = new TensionSplineRelaxation(layout.columnsAt(l), layout.rowsAt(l),
                    options.tension());
            if (level == null) {
                plane(next, stride, fi, fj, v);
            } else {
                refine(level, next);
            }
            level = next;
            for (int s = 0; s < v.length; s++) {
                li[s] = fi[s] / stride;
                lj[s] = fj[s] / stride;
            }
            level.constrain(li, lj, v);
            double share = level.nx * (double) level.ny / total;
            double first = Double.NaN, shown = 0;
            boolean met = false;
            for (int k = 0; k < options.maxSweeps(); k++) {
                p.checkCanceled();
                double change = level.sweep();
                lastChange = change;
                sweeps++;
                if (change <= limit) {
                    met = true;
                    break;
                }
                if (Double.isNaN(first)) {
                    first = change;
                }
                double f = Math.max((k + 1.0) / options.maxSweeps(),
                        Math.log(first / change) / Math.log(Math.max(first / limit, 1.0000001)));
                shown = Math.max(shown, Math.min(1, f));
                p.report(100 * (done + share * shown));
            }
            converged &= met;
            done += share;
            p.report(100 * done);
        }
        return new Solve(level, sweeps, converged, lastChange);
    }

    /** Least-squares plane through the samples, on the coarsest level. */
    private static void plane(TensionSplineRelaxation level, int stride, double[] fi, double[] fj, double[] v) {
        double n = v.length, si = 0, sj = 0, sv = 0, sii = 0, sjj = 0, sij = 0, siv = 0, sjv = 0;
        for (int s = 0; s < v.length; s++) {
            si += fi[s];
            sj += fj[s];
            sv += v[s];
        }
        double mi = si / n, mj = sj / n, mv = sv / n;
        for (int s = 0; s < v.length; s++) {
            double di = fi[s] - mi, dj = fj[s] - mj, dv = v[s] - mv;
            sii += di * di;
            sjj += dj * dj;
            sij += di * dj;
            siv += di * dv;
            sjv += dj * dv;
        }
        double det = sii * sjj - sij * sij;
        double bi = 0, bj = 0;
        if (det > 1e-12 * (sii * sjj + 1e-300)) {
            bi = (siv * sjj - sjv * sij) / det;
            bj = (sjv * sii - siv * sij) / det;
        }
        for (int j = 0; j < level.ny; j++) {
            for (int i = 0; i < level.nx; i++) {
                level.u[level.at(i, j)] = mv + bi * (i * stride - mi) + bj * (j * stride - mj);
            }
        }
    }

    /** Bilinear interpolation of a converged level onto the next finer one (half the spacing). */
    private static void refine(TensionSplineRelaxation coarse, TensionSplineRelaxation fine) {
        double[] c = coarse.u, f = fine.u;
        for (int j = 0; j < fine.ny; j++) {
            int jc = j >> 1;
            boolean oddJ = (j & 1) == 1;
            for (int i = 0; i < fine.nx; i++) {
                int ic = i >> 1;
                int k = coarse.at(ic, jc);
                double val;
                if ((i & 1) == 0) {
                    val = oddJ ? 0.5 * (c[k] + c[k + coarse.w]) : c[k];
                } else if (!oddJ) {
                    val = 0.5 * (c[k] + c[k + 1]);
                } else {
                    val = 0.25 * (c[k] + c[k + 1] + c[k + coarse.w] + c[k + coarse.w + 1]);
                }
                f[fine.at(i, j)] = val;
            }
        }
    }

    /** Blanks cells far from data in place; returns the distance used, metres. */
    private double blank(float[] out, boolean[] dataCells) {
        if (options.blankDistance() == Double.POSITIVE_INFINITY) {
            return Double.POSITIVE_INFINITY;
        }
        float[] d = DistanceTransform.distances(dataCells, geometry.columns(), geometry.rows());
        double limitCells = Double.isNaN(options.blankDistance())
                ? automaticBlankCells(d, geometry.columns(), geometry.rows())
                : options.blankDistance() / geometry.cellSize();
        for (int k = 0; k < out.length; k++) {
            if (d[k] > limitCells) {
                out[k] = Float.NaN;
            }
        }
        return limitCells * geometry.cellSize();
    }

    /** 1.5 times the 75th percentile of the distance at its interior local maxima, at least 3 cells. */
    static double automaticBlankCells(float[] d, int cols, int rows) {
        float[] ridge = new float[Math.max(16, d.length / 8)];
        int n = 0;
        for (int r = 1; r < rows - 1; r++) {
            for (int c = 1; c < cols - 1; c++) {
                int k = r * cols + c;
                float v = d[k];
                if (v > 0 && v >= d[k - 1] && v >= d[k + 1] && v >= d[k - cols] && v >= d[k + cols]
                        && v >= d[k - cols - 1] && v >= d[k - cols + 1] && v >= d[k + cols - 1] && v >= d[k + cols + 1]) {
                    if (n == ridge.length) {
                        ridge = java.util.Arrays.copyOf(ridge, n * 2);
                    }
                    ridge[n++] = v;
                }
            }
        }
        if (n == 0) {
            return MIN_BLANK_CELLS;
        }
        java.util.Arrays.sort(ridge, 0, n);
        return Math.max(MIN_BLANK_CELLS, 1.5 * ridge[(int) (0.75 * (n - 1))]);
    }

    private static double[] range(double[] v) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double a : v) {
            lo = Math.min(lo, a);
            hi = Math.max(hi, a);
        }
        return new double[] {lo, hi};
    }
}
