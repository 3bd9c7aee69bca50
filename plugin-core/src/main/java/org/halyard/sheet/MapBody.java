package org.halyard.sheet;

import java.util.List;
import org.halyard.io.ProjectedCrs;

/**
 * Draws what is inside and around a map frame: rasters, vector lines, targets, sheet footprints, the
 * graticule, grid crosses, the neatline and the coordinate ticks.
 */
final class MapBody {

    private static final float TARGET_LABEL_PT = 5f;

    private MapBody() {
    }

    /**
     * Draws the map in {@code w}.
     *
     * @param dpi        raster resolution, dots per inch
     * @param crs        for the graticule
     * @param graticule  whether to draw latitude and longitude lines
     * @param footprints sheet outlines to draw over the content (the index sheet), may be empty
     */
    static void draw(SheetCanvas c, MapWindow w, MapContent content, int dpi, ProjectedCrs crs,
                     boolean graticule, List<SheetFootprint> footprints) {
        c.save();
        c.clip(w.frame());
        c.fill(0xFFFFFF);
        c.fillRect(w.frame());
        c.begin("Rasters");
        for (RasterLayer r : content.rasters()) {
            for (RasterImage.Strip s : RasterImage.render(r, w, dpi)) {
                c.image(s.image(), s.place());
            }
        }
        c.end();
        c.begin("Vectors");
        for (VectorLayer v : content.vectors()) {
            LineStyle s = v.style();
            c.stroke(s.rgb(), s.width(), s.dash());
            v.lines().forEach(p -> strokeGround(c, w, p, false));
        }
        c.end();
        drawTargets(c, w, content.targets());
        if (!footprints.isEmpty()) {
            // Over the targets: on the index sheet the sheet numbers matter most.
            Footprints.draw(c, w, footprints, 0, 14f);
        }
        if (graticule) {
            Graticule.draw(c, w, crs);
        }
        FrameTicks.drawCrosses(c, w);
        c.restore();
        c.begin("Neatline");
        c.stroke(0x111111, 0.9f);
        c.strokeRect(w.frame());
        c.end();
        FrameTicks.drawTicks(c, w);
    }

    private static void drawTargets(SheetCanvas c, MapWindow w, List<TargetMark> targets) {
        c.begin("Targets");
        PageRect f = w.frame();
        for (TargetMark t : targets) {
            float px = w.pageX(t.x()), py = w.pageY(t.y());
            if (f.contains(px, py)) {
                TargetSymbols.draw(c, t.targetClass(), px, py);
                c.begin("TargetLabel");
                c.haloText(t.id(), px + TargetSymbols.RADIUS + 1.5, py + 1.2, TARGET_LABEL_PT, false, 0, 0,
                        0x111111);
                c.end();
            }
        }
        c.end();
    }

    /** Strokes a ground polyline in the current stroke style. */
    static void strokeGround(SheetCanvas c, MapWindow w, Polyline p, boolean closed) {
        double[] x = p.x(), y = p.y();
        double[] px = new double[x.length], py = new double[y.length];
        for (int i = 0; i < x.length; i++) {
            px[i] = w.pageX(x[i]);
            py[i] = w.pageY(y[i]);
        }
        c.polyline(px, py, closed);
    }
}
