package org.halyard.sheet;

import java.util.List;

/** Draws one page's worth of a table: the header row and banded body rows, as vectors. */
final class TableDrawing {

    private static final int STRIPE_RGB = 0xE8EEF0;

    private TableDrawing() {
    }

    /**
     * Draws the header and {@code rows} from the top of {@code body}; returns the page y under the last row.
     *
     * @param widths column widths, points
     * @param rowH   row height, points
     * @param pt     font size, points
     */
    static float draw(SheetCanvas c, TableModel t, List<List<String>> rows, PageRect body, float[] widths,
                      float rowH, float pt) {
        boolean[] right = new boolean[widths.length];
        for (int i = 0; i < right.length; i++) {
            right[i] = t.numeric(i);
        }
        c.begin("Table");
        float y = body.top();
        c.fill(PanelFlow.BAND_RGB);
        c.fillRect(new PageRect(body.x(), y - rowH, body.width(), rowH));
        c.fill(0xFFFFFF);
        row(c, t.columns(), body.x(), y - rowH, widths, right, rowH, pt, true);
        y -= rowH;
        for (int r = 0; r < rows.size(); r++) {
            if (r % 2 == 1) {
                c.fill(STRIPE_RGB);
                c.fillRect(new PageRect(body.x(), y - rowH, body.width(), rowH));
            }
            c.fill(0x111111);
            row(c, rows.get(r), body.x(), y - rowH, widths, right, rowH, pt, false);
            y -= rowH;
        }
        c.stroke(PanelFlow.RULE_RGB, 0.6f);
        c.line(body.x(), y, body.right(), y);
        c.end();
        return y;
    }

    private static void row(SheetCanvas c, List<String> cells, float x, float y, float[] widths, boolean[] right,
                            float rowH, float pt, boolean bold) {
        float base = y + (rowH - pt) / 2 + pt * 0.2f;
        for (int i = 0; i < cells.size(); i++) {
            if (right[i]) {
                c.text(cells.get(i), x + widths[i] - ReportPages.CELL_PAD, base, pt, bold, 1, 0);
            } else {
                c.text(cells.get(i), x + ReportPages.CELL_PAD, base, pt, bold);
            }
            x += widths[i];
        }
    }
}
