package org.halyard.pipeline;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.halyard.grid.Grid;
import org.halyard.grid.Progress;
import org.halyard.io.FeatureLayer;
import org.halyard.io.GeoPackageReader;
import org.halyard.io.GeoTiffGrids;
import org.halyard.io.InfrastructureLayer;
import org.halyard.io.TargetTables;
import org.halyard.model.FieldDirection;
import org.halyard.targets.Asset;
import org.halyard.targets.FieldGrids;
import org.halyard.targets.PeakOptions;
import org.halyard.targets.TargetAnalysis;
import org.halyard.targets.TargetInputs;
import org.halyard.targets.TargetOptions;
import org.halyard.targets.TargetResult;

/**
 * Picks and characterises targets, finds linear features and matches both against charted infrastructure;
 * writes {@code targets.csv} and {@code linear_features.csv} (with their method sidecars).
 */
final class TargetsStage implements Stage {

    /** Main-field intensity assumed when neither the recipe nor the base station gives one, nT (from memory:
     * the North Sea's is about 49 000 to 50 000 nT). */
    static final double FALLBACK_INTENSITY_NT = 49_500;

    @Override
    public String name() {
        return "targets";
    }

    @Override
    public void run(RunContext ctx, Progress p) {
        Recipe r = ctx.recipe();
        TargetOptions d = TargetOptions.DEFAULT;
        TargetOptions options = new TargetOptions(new PeakOptions(r.targets().thresholdSigma(),
                d.peaks().windowCells(), r.targets().minSeparationM()), d.discreteEuler(), d.linearEuler(), d.fit(),
                d.mass(), d.linear(), r.targets().assetBufferM(), d.assetMinShare(), d.startDepthM());
        FieldDirection field = ctx.field;
        if (field == null) {
            field = FieldDirection.POLE;
            ctx.note("targets: field direction unknown, dipole fits assume a vertical field");
        }
        double intensity = ctx.fieldIntensityNt;
        if (!(intensity > 0)) {
            intensity = FALLBACK_INTENSITY_NT;
            ctx.note("targets: field intensity unknown, masses assume " + intensity + " nT");
        }
        Optional<Grid> bathymetry = Optional.empty();
        if (r.bathymetry() != null) {
            bathymetry = Optional.of(GeoTiffGrids.read(r.bathymetry()));
        }
        TargetInputs in = new TargetInputs(new FieldGrids(ctx.totalField, ctx.eastDerivative, ctx.northDerivative,
                ctx.verticalDerivative), Optional.of(ctx.analyticSignal), ctx.samples, field, intensity, bathymetry,
                assets(ctx));
        TargetResult result = TargetAnalysis.run(in, options, p.slice(0, 95));
        result.notes().forEach(ctx::note);
        TargetTables.writeAll(ctx.work(), result);
        ctx.targets = result;
        ctx.log().param("method", options.describe());
        ctx.log().param("targets", result.targets().size());
        ctx.log().param("linear features", result.features().size());
        p.report(100);
    }

    /** Every layer of the infrastructure GeoPackage, ids from its {@code asset} column where it has one. */
    private static List<Asset> assets(RunContext ctx) {
        Path gpkg = ctx.recipe().infrastructure();
        List<Asset> assets = new ArrayList<>();
        if (gpkg == null) {
            ctx.note("infrastructure block absent: no asset matching, every linear feature is reported uncharted");
            return assets;
        }
        for (String layer : GeoPackageReader.layerNames(gpkg)) {
            FeatureLayer fl = GeoPackageReader.read(gpkg, layer);
            boolean hasAsset = fl.columns().stream().anyMatch(c -> c.name().equals("asset"));
            InfrastructureLayer.Result res = InfrastructureLayer.of(fl, gpkg + ": layer " + layer,
                    hasAsset ? "asset" : null, ctx.recipe().crs());
            if (res.reprojected()) {
                ctx.note("infrastructure layer " + layer + " reprojected from " + res.sourceCrs() + " to "
                        + ctx.recipe().crs());
            }
            assets.addAll(res.assets());
        }
        ctx.log().param("infrastructure features", assets.size());
        return assets;
    }
}
