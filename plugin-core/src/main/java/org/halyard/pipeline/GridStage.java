package org.halyard.pipeline;

import java.util.List;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.gridding.GradientSamples;
import org.halyard.gridding.GriddingOptions;
import org.halyard.gridding.GriddingResult;
import org.halyard.gridding.MeasuredGradientAnalyticSignal;
import org.halyard.gridding.SplineGridder;
import org.halyard.io.GeoTiffGrids;
import org.halyard.survey.GradientPoints;
import org.halyard.survey.SensorTrack;

/**
 * Grids the corrected samples of every sensor (splines in tension, gradient-enhanced with the measured
 * pair gradients) to {@code grids/total_field.tif}, and the analytic signal from the measured gradients to
 * {@code grids/analytic_signal_measured.tif} beside the grid-derived one.
 */
final class GridStage implements Stage {

    @Override
    public String name() {
        return "grid";
    }

    @Override
    public void run(RunContext ctx, Progress p) {
        Recipe.GridBlock g = ctx.recipe().grid();
        boolean[] rows = griddedRows(ctx, g.tieLines());
        int per = count(rows);
        List<SensorTrack> sensors = ctx.survey.sensors();
        double[] x = new double[per * sensors.size()], y = new double[x.length], v = new double[x.length];
        for (int s = 0; s < sensors.size(); s++) {
            SensorTrack t = sensors.get(s);
            requireRows(t.spec().column(), t.size(), rows);
            pick(rows, t.x(), x, s * per);
            pick(rows, t.y(), y, s * per);
            pick(rows, t.value(), v, s * per);
        }
        GridGeometry geometry = SplineGridder.geometryFor(x, y, g.cellM(), ctx.recipe().crs());
        GriddingOptions options = GriddingOptions.defaults().withTension(g.tension());
        if (Double.isFinite(g.blankingM())) {
            options = options.withBlankDistance(g.blankingM());
        }
        GradientSamples gradients = gradients(ctx.survey.gradients(), rows, per);
        GriddingResult res = gradients == null
                ? SplineGridder.grid(x, y, v, geometry, options, p.slice(0, 60))
                : SplineGridder.grid(x, y, v, gradients, geometry, options, p.slice(0, 60));
        ctx.totalField = res.grid();
        GeoTiffGrids.write(res.grid(), ctx.work().resolve("grids").resolve("total_field.tif"));
        ctx.log().param("grid", geometry.columns() + " x " + geometry.rows() + " cells of " + g.cellM() + " m");
        ctx.log().param("tension", g.tension());
        ctx.log().param("samples used", res.samplesUsed());
        ctx.log().param("blanking distance (m)", res.blankDistance());
        ctx.log().param("gradient-enhanced", gradients != null);
        ctx.log().param("converged", res.converged());
        if (!res.converged()) {
            ctx.note(String.format(java.util.Locale.ROOT, "gridding stopped at its sweep limit before the convergence"
                    + " limit: the last sweep still moved a node by %.3g against a limit of %.3g (unit of the data)",
                    res.lastChange(), res.convergenceLimit()));
        }
        if (gradients != null) {
            MeasuredGradientAnalyticSignal m = MeasuredGradientAnalyticSignal.compute(gradients, geometry, options,
                    p.slice(60, 100));
            GeoTiffGrids.write(m.amplitude(), ctx.work().resolve("grids").resolve("analytic_signal_measured.tif"));
        } else {
            ctx.note("one sensor only: no measured gradients, no gradient-enhanced grid");
        }
        p.report(100);
    }

    /**
     * Rows that go into the grid: every row, or with {@code tieLines} false only the traverse rows (when the
     * survey has traverse lines at all). The run log says which.
     */
    private static boolean[] griddedRows(RunContext ctx, boolean tieLines) {
        var lines = ctx.survey.lines();
        boolean[] tie = ctx.survey.tieMask();
        boolean[] rows = new boolean[lines.size()];
        boolean anyTraverse = false;
        for (int l = 0; l < lines.lineCount(); l++) {
            anyTraverse |= !tie[l];
        }
        boolean dropTies = !tieLines && anyTraverse;
        int dropped = 0;
        for (int l = 0; l < lines.lineCount(); l++) {
            boolean keep = !(dropTies && tie[l]);
            for (int r = lines.start(l); r < lines.end(l); r++) {
                rows[r] = keep;
            }
            dropped += keep ? 0 : 1;
        }
        ctx.log().param("tie lines gridded", dropTies ? "no (" + dropped + " tie lines used for levelling only)" : "yes");
        return rows;
    }

    private static int count(boolean[] mask) {
        int n = 0;
        for (boolean b : mask) {
            n += b ? 1 : 0;
        }
        return n;
    }

    /** Copies {@code from[i]} for the rows in {@code mask} to {@code to}, starting at index {@code at}. */
    private static void pick(boolean[] mask, double[] from, double[] to, int at) {
        for (int i = 0; i < mask.length; i++) {
            if (mask[i]) {
                to[at++] = from[i];
            }
        }
    }

    private static void requireRows(String what, int size, boolean[] rows) {
        if (size != rows.length) {
            throw new IllegalStateException(what + " has " + size + " rows, the survey " + rows.length);
        }
    }

    /**
     * The pair gradients of every sensor pair pooled over the gridded rows ({@code per} of them), or null
     * when there are none.
     */
    private static GradientSamples gradients(List<GradientPoints> pairs, boolean[] rows, int per) {
        if (pairs.isEmpty() || per == 0) {
            return null;
        }
        double[] x = new double[per * pairs.size()], y = new double[x.length];
        double[] gx = new double[x.length], gy = new double[x.length];
        for (int k = 0; k < pairs.size(); k++) {
            GradientPoints gp = pairs.get(k);
            requireRows("pair " + gp.pair(), gp.size(), rows);
            pick(rows, gp.x(), x, k * per);
            pick(rows, gp.y(), y, k * per);
            pick(rows, gp.gx(), gx, k * per);
            pick(rows, gp.gy(), gy, k * per);
        }
        return new GradientSamples(x, y, gx, gy);
    }
}
