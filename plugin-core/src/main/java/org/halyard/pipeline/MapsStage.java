package org.halyard.pipeline;

import java.nio.file.Path;
import org.halyard.grid.Grid;
import org.halyard.grid.Progress;
import org.halyard.io.GeoTiffGrids;
import org.halyard.spectral.FilterBank;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Derivative maps of the total-field grid: analytic signal, first vertical derivative, tilt and, when the
 * field direction is known, the reduction to the pole (induced magnetisation assumed). Keeps the
 * derivative grids for the target stage.
 */
final class MapsStage implements Stage {

    @Override
    public String name() {
        return "maps";
    }

    @Override
    public void run(RunContext ctx, Progress p) {
        if (ctx.totalField == null) {
            throw new IllegalStateException("no total-field grid to filter");
        }
        FilterSettings settings = FilterSettings.defaults().withField(ctx.field);
        FilterBank bank = new FilterBank(ctx.totalField, settings);
        Path grids = ctx.work().resolve("grids");
        ctx.eastDerivative = bank.apply(FilterOperation.DX, p.slice(0, 30));
        ctx.northDerivative = bank.apply(FilterOperation.DY, p.slice(30, 45));
        ctx.verticalDerivative = bank.apply(FilterOperation.VERTICAL_DERIVATIVE, p.slice(45, 60));
        ctx.analyticSignal = bank.apply(FilterOperation.ANALYTIC_SIGNAL, p.slice(60, 65));
        Grid tilt = bank.apply(FilterOperation.TILT, p.slice(65, 70));
        GeoTiffGrids.write(ctx.analyticSignal, grids.resolve("analytic_signal.tif"));
        GeoTiffGrids.write(ctx.verticalDerivative, grids.resolve("vertical_derivative.tif"));
        GeoTiffGrids.write(tilt, grids.resolve("tilt.tif"));
        ctx.log().param("padding factor", settings.padFactor());
        if (ctx.field != null) {
            Grid rtp = bank.apply(FilterOperation.REDUCE_TO_POLE, p.slice(70, 100));
            GeoTiffGrids.write(rtp, grids.resolve("reduced_to_pole.tif"));
            ctx.log().param("reduction to pole", "induced, inclination " + ctx.field.inclinationDeg()
                    + ", declination " + ctx.field.declinationDeg() + ", stabilised below "
                    + settings.stabilisingInclinationDeg() + " degrees");
        } else {
            ctx.note("reduced_to_pole.tif skipped: the field direction is unknown (no field block, no usable base station)");
        }
        p.report(100);
    }
}
