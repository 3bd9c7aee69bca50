package org.halyard.pipeline;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.halyard.grid.Progress;
import org.halyard.io.FeatureLayer;
import org.halyard.io.GeoPackageWriter;
import org.halyard.io.TargetTables;

/**
 * Writes {@code halyard.gpkg} with the layers {@code targets}, {@code linear_features} and {@code tracks}.
 * The recorded change time is the survey's first sample time (or the epoch), so reruns give the same bytes.
 */
final class GeoPackageStage implements Stage {

    @Override
    public String name() {
        return "geopackage";
    }

    @Override
    public void run(RunContext ctx, Progress p) {
        List<FeatureLayer> layers = new ArrayList<>(TargetTables.layers(ctx.targets, ctx.recipe().crs()));
        layers.add(ctx.tracks);
        GeoPackageWriter.write(ctx.work().resolve("halyard.gpkg"), layers, Instant.ofEpochMilli(ctx.firstSampleMillis));
        p.report(100);
    }
}
