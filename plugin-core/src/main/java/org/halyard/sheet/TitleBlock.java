package org.halyard.sheet;

import java.util.List;

/**
 * The title block: project, area and a table of sheet facts (layers, CRS and datum, units, scale, date,
 * revision), headed by the sheet number.
 *
 * @param title     job title
 * @param sheetText e.g. {@code SHEET 3 OF 12} or {@code INDEX TO SHEETS 1-12}
 * @param rows      label and value pairs, in print order
 */
record TitleBlock(SheetTitle title, String sheetText, List<String[]> rows) implements PanelBlock {

    private static final float PROJECT_PT = 11f;
    private static final float AREA_PT = 8f;
    private static final float ROW_PT = 6.5f;
    private static final float LABEL_COL = 36f;

    @Override
    public String heading() {
        return sheetText;
    }

    @Override
    public float bodyHeight(float width) {
        float h = TextWrap.height(title.project(), width, PROJECT_PT, true)
                + TextWrap.height(title.area(), width, AREA_PT, false) + 4;
        for (String[] r : rows) {
            h += TextWrap.height(r[1], width - LABEL_COL, ROW_PT, false) + 1.5f;
        }
        return h;
    }

    @Override
    public void drawBody(SheetCanvas c, PageRect body) {
        float used = TextWrap.draw(c, title.project(), body, PROJECT_PT, true);
        used += TextWrap.draw(c, title.area(), body.belowTop(used), AREA_PT, false) + 2;
        c.stroke(PanelFlow.RULE_RGB, 0.4f);
        c.line(body.x(), body.top() - used, body.right(), body.top() - used);
        used += 2;
        for (String[] r : rows) {
            PageRect rest = body.belowTop(used);
            c.fill(0x555555);
            c.text(r[0], rest.x(), rest.top() - ROW_PT, ROW_PT, true);
            c.fill(0x111111);
            used += TextWrap.draw(c, r[1], new PageRect(rest.x() + LABEL_COL, rest.y(), rest.width() - LABEL_COL,
                    rest.height()), ROW_PT, false) + 1.5f;
        }
    }
}
