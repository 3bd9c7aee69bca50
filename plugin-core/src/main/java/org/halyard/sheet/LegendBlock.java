package org.halyard.sheet;

import java.util.List;

/**
 * The legend: one row per target class present and per line style.
 *
 * @param entries rows in print order
 */
record LegendBlock(List<LegendEntry> entries) implements PanelBlock {

    private static final float ROW = 10f;
    private static final float SWATCH_W = 18f;
    private static final float LABEL_PT = 6.3f;

    @Override
    public String heading() {
        return "LEGEND";
    }

    @Override
    public float bodyHeight(float width) {
        return entries.size() * ROW;
    }

    @Override
    public void drawBody(SheetCanvas c, PageRect body) {
        c.begin("Legend");
        float y = body.top();
        for (LegendEntry e : entries) {
            e.swatch().draw(c, new PageRect(body.x(), y - ROW + 2, SWATCH_W, ROW - 4));
            c.fill(0x111111);
            c.text(e.label(), body.x() + SWATCH_W + 5, y - ROW + 3, LABEL_PT, false);
            y -= ROW;
        }
        c.end();
    }
}
