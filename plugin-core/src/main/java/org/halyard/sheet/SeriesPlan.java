package org.halyard.sheet;

import java.util.List;
import org.halyard.io.ProjectedCrs;

/**
 * The layout, scale and footprints of a sheet series, decided before anything is drawn.
 *
 * @param crs           the sheet CRS
 * @param layout        layout of the numbered sheets
 * @param indexLayout   layout of the index sheet (no key map)
 * @param scale         scale denominator of the numbered sheets
 * @param footprints    numbered footprints
 * @param coverageLines outline of the coverage for the key map
 */
record SeriesPlan(ProjectedCrs crs, SheetLayout layout, SheetLayout indexLayout, int scale,
                  List<SheetFootprint> footprints, List<Polyline> coverageLines) {

    /** Share of the frame's shorter side a corridor may take when its scale is fitted. */
    static final double CORRIDOR_SHARE = 0.5;

    static SeriesPlan of(SheetRequest r) {
        ProjectedCrs crs = ProjectedCrs.decode(r.crsCode());
        double[] ext = r.content().extent();
        MapWindow probe = MapWindow.centred(0, 0, new PageRect(0, 0, 100, 100),
                Math.max(1, r.options().scaleDenominator()));
        SheetFootprint dummy = new SheetFootprint(1, 0, 0, 1, 1);
        SheetLayout layout = SheetLayout.plan(r.options().format(), SheetBlocks.of(r.perRaster().get(0), crs,
                "SHEET 1 OF 1",
                probe, new KeyMap(List.of(dummy), 1, List.of())));
        SheetLayout indexLayout = SheetLayout.plan(r.options().format(),
                SheetBlocks.of(r.withoutRasters(), crs, "INDEX", probe, null));
        PageRect f = layout.frame();
        int scale = r.options().scaleDenominator();
        List<SheetFootprint> fps;
        List<Polyline> outline;
        if (r.coverage() instanceof Coverage.Corridor c) {
            if (scale == 0) {
                scale = corridorScale(2 * c.halfWidth(), Math.min(f.width(), f.height()));
            }
            double ppm = StandardScales.pointsPerMetre(scale);
            fps = CorridorTiler.tile(c.route(), c.halfWidth(), f.width() / ppm, f.height() / ppm,
                    r.options().overlap());
            outline = List.of(c.route());
        } else {
            double[] box = r.coverage() instanceof Coverage.Area a
                    ? new double[] {a.xmin(), a.ymin(), a.xmax(), a.ymax()} : ext;
            if (scale == 0) {
                scale = StandardScales.fit(box[2] - box[0], box[3] - box[1], f.width(), f.height());
            }
            double ppm = StandardScales.pointsPerMetre(scale);
            fps = AreaTiler.tile(box, f.width() / ppm, f.height() / ppm, r.options().overlap());
            outline = List.of(new Polyline(new double[] {box[0], box[2], box[2], box[0], box[0]},
                    new double[] {box[1], box[1], box[3], box[3], box[1]}));
        }
        return new SeriesPlan(crs, layout, indexLayout, scale, fps, outline);
    }

    private static int corridorScale(double corridorWidth, double frameSide) {
        for (int d : StandardScales.DENOMINATORS) {
            if (corridorWidth * StandardScales.pointsPerMetre(d) <= CORRIDOR_SHARE * frameSide) {
                return d;
            }
        }
        throw new IllegalArgumentException("corridor of " + Math.round(corridorWidth) + " m is too wide for any"
                + " standard scale on this paper");
    }
}
