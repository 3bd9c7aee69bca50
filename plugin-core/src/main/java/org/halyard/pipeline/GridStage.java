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
        List<SensorTrack> sensors = ctx.survey.sensors();
        int n = 0;
        for (SensorTrack s : sensors) {
            n += s.size();
        }
        double[] x = new double[n], y = new double[n], v = new double[n];
        int k = 0;
        for (SensorTrack s : sensors) {
            System.arraycopy(s.x(), 0, x, k, s.size());
            System.arraycopy(s.y(), 0, y, k, s.size());
            System.arraycopy(s.value(), 0, v, k, s.size());
            k += s.size();
        }
        GridGeometry geometry = SplineGridder.geometryFor(x, y, g.cellM(), ctx.recipe().crs());
        GriddingOptions options = GriddingOptions.defaults().withTension(g.tension());
        if (Double.isFinite(g.blankingM())) {
            options = options.withBlankDistance(g.blankingM());
        }
        GradientSamples gradients = gradients(ctx.survey.gradients());
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

    /** The pair gradients of every sensor pair pooled, or null when there are none. */
    private static GradientSamples gradients(List<GradientPoints> pairs) {
        int n = 0;
        for (GradientPoints gp : pairs) {
            n += gp.size();
        }
        if (n == 0) {
            return null;
        }
        double[] x = new double[n], y = new double[n], gx = new double[n], gy = new double[n];
        int k = 0;
        for (GradientPoints gp : pairs) {
            System.arraycopy(gp.x(), 0, x, k, gp.size());
            System.arraycopy(gp.y(), 0, y, k, gp.size());
            System.arraycopy(gp.gx(), 0, gx, k, gp.size());
            System.arraycopy(gp.gy(), 0, gy, k, gp.size());
            k += gp.size();
        }
        return new GradientSamples(x, y, gx, gy);
    }
}
