package org.halyard.sheet;

import java.util.List;

/** Draws sheet footprints with their numbers, for the index sheet and the key map. */
final class Footprints {

    private static final int LINE_RGB = 0x23414F;
    private static final int HIGHLIGHT_RGB = 0xF2C14E;

    private Footprints() {
    }

    /**
     * Draws every footprint in {@code w}; the one numbered {@code highlight} (0 for none) is filled.
     *
     * @param labelPt size of the sheet numbers, points (0 for none)
     */
    static void draw(SheetCanvas c, MapWindow w, List<SheetFootprint> sheets, int highlight, float labelPt) {
        c.begin("Footprints");
        for (SheetFootprint s : sheets) {
            PageRect r = rect(w, s);
            if (s.number() == highlight) {
                c.fill(HIGHLIGHT_RGB);
                c.fillRect(r);
            }
        }
        for (SheetFootprint s : sheets) {
            PageRect r = rect(w, s);
            c.stroke(LINE_RGB, s.number() == highlight ? 1.2f : 0.6f);
            c.strokeRect(r);
            if (labelPt > 0) {
                c.haloText(Integer.toString(s.number()), r.x() + r.width() / 2, r.y() + r.height() / 2 - labelPt / 3,
                        labelPt, true, 0.5, 0, LINE_RGB);
            }
        }
        c.end();
    }

    static PageRect rect(MapWindow w, SheetFootprint s) {
        float x0 = w.pageX(s.west()), y0 = w.pageY(s.south());
        return new PageRect(x0, y0, w.pageX(s.east()) - x0, w.pageY(s.north()) - y0);
    }

    /** Union of the footprints' boxes, {@code {xmin, ymin, xmax, ymax}}, metres. */
    static double[] extent(List<SheetFootprint> sheets) {
        double[] b = {Double.MAX_VALUE, Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (SheetFootprint s : sheets) {
            b[0] = Math.min(b[0], s.west());
            b[1] = Math.min(b[1], s.south());
            b[2] = Math.max(b[2], s.east());
            b[3] = Math.max(b[3], s.north());
        }
        return b;
    }

    /** The window of the given frame that shows {@code extent} whole, at whatever scale that takes. */
    static MapWindow fitting(double[] extent, PageRect frame) {
        double ppmNeeded = Math.min(frame.width() / (extent[2] - extent[0]), frame.height() / (extent[3] - extent[1]));
        int denom = (int) Math.ceil(72.0 / 0.0254 / ppmNeeded);
        return MapWindow.centred((extent[0] + extent[2]) / 2, (extent[1] + extent[3]) / 2, frame, denom);
    }
}
