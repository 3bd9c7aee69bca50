package org.halyard.cli;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import org.halyard.grid.GridGeometry;
import org.halyard.gridding.BlockStatistic;
import org.halyard.gridding.GradientSamples;
import org.halyard.gridding.GriddingOptions;
import org.halyard.gridding.GriddingResult;
import org.halyard.gridding.SplineGridder;
import org.halyard.io.CsvTableReader;
import org.halyard.io.GeoTiffGrids;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code halyard grid LINES.csv OUT.tif --x COL --y COL --value COL --cell M [--crs EPSG:n]}: samples of a
 * delimited table to a float32 GeoTIFF by splines in tension ({@link SplineGridder}). Rows with an empty or
 * NaN x, y or value are skipped and counted on stderr; progress goes to stderr when it is a terminal.
 */
@Command(name = "grid", description = {
        "Grid line samples (x, y, value columns of a CSV) to a float32 GeoTIFF with splines in tension.",
        "Cells farther from data than the blanking distance are nodata. Default blanking: the larger of 3 cells",
        "and 0.75 x the typical line spacing. Rows with an empty or NaN x, y or value are skipped and counted."})
final class GridCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "LINES.csv", description = "Comma-separated table with a header row.")
    Path lines;

    @Parameters(index = "1", paramLabel = "OUT.tif", description = "GeoTIFF to write.")
    Path out;

    @Option(names = "--x", required = true, paramLabel = "COL", description = "Column of eastings, metres.")
    String xColumn;

    @Option(names = "--y", required = true, paramLabel = "COL", description = "Column of northings, metres.")
    String yColumn;

    @Option(names = "--value", required = true, paramLabel = "COL", description = "Column to grid (nT, or nT/m).")
    String valueColumn;

    @Option(names = "--cell", required = true, paramLabel = "M", description = "Cell size, metres.")
    double cell;

    @Option(names = "--crs", paramLabel = "EPSG:n", description = "Projected CRS of x and y, e.g. EPSG:32631.")
    String crs;

    @Option(names = "--tension", paramLabel = "T", defaultValue = "0.25",
            description = "Spline tension, 0 (minimum curvature) to below 1. Default: ${DEFAULT-VALUE}.")
    double tension;

    @Option(names = "--blank", paramLabel = "M",
            description = "Blanking distance from data, metres; 'none' keeps every cell. Default: automatic.")
    String blank;

    @Option(names = "--merge", paramLabel = "mean|median", defaultValue = "mean",
            description = "How samples sharing a cell are merged. Default: ${DEFAULT-VALUE}.")
    String merge;

    @Option(names = "--limit", paramLabel = "V",
            description = "Convergence limit in the unit of the values. Default: 1e-5 of the data range.")
    Double limit;

    @Option(names = "--gradient-east", paramLabel = "COL",
            description = "Column of measured east gradients (nT/m): gradient-enhanced gridding, with --gradient-north.")
    String gradientEast;

    @Option(names = "--gradient-north", paramLabel = "COL", description = "Column of measured north gradients (nT/m).")
    String gradientNorth;

    @Override
    public Integer call() {
        if (crs == null || crs.isBlank()) {
            throw new IllegalArgumentException("no CRS for " + out + ": give the projected CRS of the x and y"
                    + " columns with --crs EPSG:n (e.g. --crs EPSG:32631)");
        }
        if (!crs.trim().matches("(?i)EPSG:\\d+")) {
            throw new IllegalArgumentException("--crs expects an EPSG code such as EPSG:32631, got '" + crs + "'");
        }
        // GeoTools' first CRS lookup builds its EPSG database (seconds of CPU): overlap it with reading and solving.
        CompletableFuture<Void> crsReady = CompletableFuture.runAsync(() -> GeoTiffGrids.decode(crs));
        if ((gradientEast == null) != (gradientNorth == null)) {
            throw new IllegalArgumentException("--gradient-east and --gradient-north go together; give both or neither");
        }
        GriddingOptions options = options();
        Columns t = read();
        GridGeometry g = SplineGridder.geometryFor(t.x, t.y, cell, crs);
        TerminalProgress progress = new TerminalProgress("grid " + out.getFileName());
        GriddingResult r = t.gx == null
                ? SplineGridder.grid(t.x, t.y, t.v, g, options, progress)
                : SplineGridder.grid(t.x, t.y, t.v, new GradientSamples(t.x, t.y, t.gx, t.gy), g, options, progress);
        progress.done();
        try {
            crsReady.join();
        } catch (CompletionException e) {
            throw e.getCause() instanceof RuntimeException re ? re : e;
        }
        GeoTiffGrids.write(r.grid(), out);
        System.err.printf(Locale.ROOT, "%s: %d x %d cells of %s m from %d samples (%d rows skipped for empty or NaN"
                        + " numbers)%s; blanked beyond %.3f m%s%n", out, g.columns(), g.rows(), fmt(cell), r.samplesUsed(),
                t.skipped + r.nonFinite(), r.gradientNodes() > 0 ? ", " + r.gradientNodes() + " nodes from gradients" : "",
                r.blankDistance(), r.converged() ? "" : String.format(Locale.ROOT, "; warning: not converged to the limit (the last sweep still"
                        + " moved a node by %.3g against %.3g), raise --limit or check the data", r.lastChange(),
                        r.convergenceLimit()));
        return 0;
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    private GriddingOptions options() {
        GriddingOptions o = GriddingOptions.defaults().withTension(tension);
        if (blank != null) {
            if (blank.equalsIgnoreCase("none")) {
                o = o.withBlankDistance(Double.POSITIVE_INFINITY);
            } else {
                try {
                    o = o.withBlankDistance(Double.parseDouble(blank));
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException("--blank expects metres or 'none', got '" + blank + "'");
                }
            }
        }
        switch (merge.toLowerCase(Locale.ROOT)) {
            case "median" -> o = o.withStatistic(BlockStatistic.MEDIAN);
            case "mean" -> o = o.withStatistic(BlockStatistic.MEAN);
            default -> throw new IllegalArgumentException("--merge expects median or mean, got '" + merge + "'");
        }
        if (limit != null) {
            o = o.withConvergenceLimit(limit);
        }
        return o;
    }

    /** The table's numeric columns; rows with an empty or NaN field among those needed are left out. */
    private record Columns(double[] x, double[] y, double[] v, double[] gx, double[] gy, long skipped) {
    }

    private Columns read() {
        try (CsvTableReader in = CsvTableReader.open(lines)) {
            int cx = in.column(xColumn), cy = in.column(yColumn), cv = in.column(valueColumn);
            boolean grads = gradientEast != null;
            int ce = grads ? in.column(gradientEast) : -1, cn = grads ? in.column(gradientNorth) : -1;
            int need = Math.max(Math.max(cx, cy), Math.max(cv, Math.max(ce, cn))) + 1;
            double[] x = new double[1 << 16], y = new double[x.length], v = new double[x.length];
            double[] gx = grads ? new double[x.length] : null, gy = grads ? new double[x.length] : null;
            int n = 0;
            long skipped = 0;
            while (in.next()) {
                in.requireFields(need);
                double a = in.number(cx), b = in.number(cy), c = in.number(cv);
                double d = grads ? in.number(ce) : 0, e = grads ? in.number(cn) : 0;
                if (Double.isNaN(a) || Double.isNaN(b) || Double.isNaN(c) || Double.isNaN(d) || Double.isNaN(e)) {
                    skipped++;
                    continue;
                }
                if (n == x.length) {
                    int m = n + (n >> 1);
                    x = Arrays.copyOf(x, m);
                    y = Arrays.copyOf(y, m);
                    v = Arrays.copyOf(v, m);
                    if (grads) {
                        gx = Arrays.copyOf(gx, m);
                        gy = Arrays.copyOf(gy, m);
                    }
                }
                x[n] = a;
                y[n] = b;
                v[n] = c;
                if (grads) {
                    gx[n] = d;
                    gy[n] = e;
                }
                n++;
            }
            if (n < 3) {
                throw new IllegalArgumentException(lines + ": gridding needs at least 3 rows with numbers in '" + xColumn
                        + "', '" + yColumn + "' and '" + valueColumn + "', found " + n + " (" + skipped
                        + " rows skipped for empty or NaN fields)");
            }
            return new Columns(Arrays.copyOf(x, n), Arrays.copyOf(y, n), Arrays.copyOf(v, n),
                    grads ? Arrays.copyOf(gx, n) : null, grads ? Arrays.copyOf(gy, n) : null, skipped);
        }
    }
}
