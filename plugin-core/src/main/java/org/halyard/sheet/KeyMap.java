package org.halyard.sheet;

import java.util.List;

/**
 * The key-map inset: every sheet of the series and the survey coverage, this sheet filled.
 *
 * @param sheets    all footprints of the series
 * @param current   number of this sheet (0 on the index sheet)
 * @param coverage  the surveyed area or corridor outline, drawn thin
 */
record KeyMap(List<SheetFootprint> sheets, int current, List<Polyline> coverage) implements PanelBlock {

    @Override
    public String heading() {
        return "KEY MAP";
    }

    private double[] extent() {
        double[] e = Footprints.extent(sheets);
        double pad = 0.04 * Math.max(e[2] - e[0], e[3] - e[1]);
        return new double[] {e[0] - pad, e[1] - pad, e[2] + pad, e[3] + pad};
    }

    @Override
    public float bodyHeight(float width) {
        // Fixed, so that the layout can be planned before the series is tiled.
        return width * 0.62f;
    }

    @Override
    public void drawBody(SheetCanvas c, PageRect body) {
        MapWindow w = Footprints.fitting(extent(), body);
        c.save();
        c.clip(body);
        c.stroke(0x7A8A90, 0.5f, 1.5f, 1f);
        for (Polyline p : coverage) {
            MapBody.strokeGround(c, w, p, false);
        }
        Footprints.draw(c, w, sheets, current, sheets.size() > 40 ? 0 : 5.5f);
        c.restore();
    }
}
