package org.halyard.sheet;

import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.halyard.io.ProjectedCrs;

/**
 * Composes one map page: border, map body, information panel and the footer line.
 *
 * @param format     paper and orientation
 * @param layout     planned positions
 * @param window     the ground the frame shows
 * @param blocks     panel blocks, in flow order
 * @param content    map layers
 * @param crs        the sheet CRS
 * @param dpi        raster resolution, dots per inch
 * @param graticule  whether to draw latitude and longitude lines
 * @param overlay    sheet footprints drawn over the map (index sheet), may be empty
 * @param footer     one line printed under the border
 */
record MapSheetPage(PageFormat format, SheetLayout layout, MapWindow window, List<PanelBlock> blocks,
                    MapContent content, ProjectedCrs crs, int dpi, boolean graticule,
                    List<SheetFootprint> overlay, String footer) {

    /** Adds the page to {@code doc}. */
    void addTo(PDDocument doc) {
        PDPage page = new PDPage(new PDRectangle(format.widthPt(), format.heightPt()));
        doc.addPage(page);
        List<PageRect> places = PanelFlow.place(blocks, layout.columns()).orElseThrow(() ->
                new IllegalStateException("panel blocks outgrew the planned layout on " + footer));
        try (SheetCanvas c = new SheetCanvas(doc, page)) {
            MapBody.draw(c, window, content, dpi, crs, graticule, overlay);
            for (int i = 0; i < blocks.size(); i++) {
                PanelFlow.draw(c, blocks.get(i), places.get(i));
            }
            drawBorder(c, layout.border(), footer);
        }
    }

    /** The sheet border: a heavy rule with a thin one inside, and the footer line below it. */
    static void drawBorder(SheetCanvas c, PageRect border, String footer) {
        c.stroke(0x23414F, 1.4f);
        c.strokeRect(border);
        c.stroke(0x23414F, 0.3f);
        c.strokeRect(border.inset(1.8f));
        c.fill(0x555555);
        c.text(footer, border.x(), border.y() - 9, 5.5f, false);
        c.text("Halyard", border.right(), border.y() - 9, 5.5f, true, 1, 0);
    }
}
