package org.halyard.pipeline;

import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.halyard.grid.Progress;
import org.halyard.sheet.LineStyle;
import org.halyard.sheet.MapContent;
import org.halyard.sheet.Orientation;
import org.halyard.sheet.PageFormat;
import org.halyard.sheet.Paper;
import org.halyard.sheet.RasterLayer;
import org.halyard.sheet.ReportPages;
import org.halyard.sheet.SheetInputs;
import org.halyard.sheet.SheetLayers;
import org.halyard.sheet.SheetRequest;
import org.halyard.sheet.SheetSeries;
import org.halyard.sheet.SheetSet;
import org.halyard.sheet.SheetTitle;
import org.halyard.sheet.VectorLayer;

/**
 * PDF map sheets of the total field and analytic signal with the targets and linear features, an index
 * sheet, the target list as table pages and the QC summary page. The sheet date is the survey date, so
 * reruns give the same pages.
 */
final class SheetsStage implements Stage {

    /** Revision printed in the title block of a fresh run. */
    static final String REVISION = "A (draft for interpretation)";

    @Override
    public String name() {
        return "sheets";
    }

    @Override
    public void run(RunContext ctx, Progress p) {
        Path dir = ctx.work().resolve("sheets");
        String date = Instant.ofEpochMilli(ctx.firstSampleMillis).atOffset(ZoneOffset.UTC).toLocalDate().toString();
        SheetTitle title = new SheetTitle(ctx.recipe().name(), "Magnetic survey: targets and derivative maps", date, REVISION);
        List<RasterLayer> rasters = List.of(
                SheetLayers.raster("Total field", ctx.totalField, "nT", SheetLayers.StretchKind.HISTOGRAM),
                SheetLayers.raster("Analytic signal", ctx.analyticSignal, "nT/m", SheetLayers.StretchKind.HISTOGRAM));
        SheetInputs.Targets targets = SheetInputs.targets(ctx.work().resolve("targets.csv"));
        List<VectorLayer> vectors = new ArrayList<>();
        vectors.add(new VectorLayer("Linear features (cables, pipes)", LineStyle.solid(0x1F4FB8, 1.1f),
                SheetInputs.wktLines(ctx.work().resolve("linear_features.csv"))));
        SheetSet set = SheetSeries.write(SheetRequest.of(title, ctx.recipe().crs(),
                new MapContent(rasters, vectors, targets.marks())), dir);
        p.report(80);
        ReportPages.write(targets.table(), title, new PageFormat(Paper.A4, Orientation.LANDSCAPE),
                dir.resolve("target-list.pdf"));
        if (ctx.qcSummary != null) {
            ReportPages.write(ctx.qcSummary.toTable(), title, new PageFormat(Paper.A4, Orientation.PORTRAIT),
                    dir.resolve("qc-summary.pdf"));
        }
        ctx.log().param("sheets", set.sheets().size() + " at 1:" + set.scaleDenominator());
        p.report(100);
    }
}
