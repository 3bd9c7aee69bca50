package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.halyard.io.ProjectedCrs;

/**
 * Builds the panel blocks of one sheet, in flow order: title, scale, north, colour bars, legend, key map,
 * cautions.
 */
final class SheetBlocks {

    private SheetBlocks() {
    }

    /**
     * The blocks of a sheet.
     *
     * @param sheetText heading of the title block
     * @param window    the sheet's window (scale, centre for the convergence)
     * @param keyMap    the key map, or null on the index sheet, which is its own key map
     */
    static List<PanelBlock> of(SheetRequest r, ProjectedCrs crs, String sheetText, MapWindow window,
                               KeyMap keyMap) {
        List<PanelBlock> b = new ArrayList<>();
        b.add(new TitleBlock(r.title(), sheetText, rows(r, crs, window)));
        b.add(new ScaleBar(window.scaleDenominator(), crs.code()));
        b.add(new NorthArrow(crs.convergenceDeg(window.centreX(), window.centreY()), window.centreX(),
                window.centreY()));
        r.content().rasters().forEach(l -> b.add(new ColourBar(l)));
        List<LegendEntry> legend = new ArrayList<>(TargetSymbols.legend(r.content().targets()));
        r.content().vectors().forEach(v -> legend.add(LegendEntry.of(v)));
        if (r.options().graticule()) {
            legend.add(new LegendEntry("Latitude/longitude on " + crs.datum(), (c, q) -> {
                c.stroke(0x0E6E6E, 0.4f, 3f, 2f);
                c.line(q.x(), q.y() + q.height() / 2, q.right(), q.y() + q.height() / 2);
            }));
        }
        legend.add(new LegendEntry("Grid intersection (" + NiceSteps.metres(FrameTicks.interval(window)) + " m)",
                (c, q) -> {
                    float cx = q.x() + q.width() / 2, cy = q.y() + q.height() / 2;
                    c.stroke(0x222222, 0.35f);
                    c.line(cx - FrameTicks.CROSS_PT, cy, cx + FrameTicks.CROSS_PT, cy);
                    c.line(cx, cy - FrameTicks.CROSS_PT, cx, cy + FrameTicks.CROSS_PT);
                }));
        b.add(new LegendBlock(legend));
        if (keyMap != null) {
            b.add(keyMap);
        }
        b.add(Cautions.block());
        return b;
    }

    private static List<String[]> rows(SheetRequest r, ProjectedCrs crs, MapWindow w) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"Layers", String.join("; ", r.content().layerNames())});
        rows.add(new String[] {"CRS", crs.name() + " (" + crs.code() + ")"});
        rows.add(new String[] {"Datum", crs.datum() + "; ellipsoid " + crs.ellipsoid()});
        StringBuilder units = new StringBuilder("coordinates metres (grid)");
        r.content().rasters().forEach(l -> units.append("; ").append(l.name()).append(' ').append(l.unit()));
        rows.add(new String[] {"Units", units.toString()});
        rows.add(new String[] {"Scale", ScaleBar.label(w.scaleDenominator(), r.options().format())});
        rows.add(new String[] {"Extent", String.format(Locale.ROOT, "%s-%smE, %s-%smN",
                NiceSteps.metres(Math.rint(w.west())), NiceSteps.metres(Math.rint(w.east())),
                NiceSteps.metres(Math.rint(w.south())), NiceSteps.metres(Math.rint(w.north())))});
        rows.add(new String[] {"Date", r.title().date()});
        rows.add(new String[] {"Revision", r.title().revision()});
        return rows;
    }
}
