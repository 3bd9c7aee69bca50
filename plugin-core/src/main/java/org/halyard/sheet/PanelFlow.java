package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Stacks panel blocks top-down into columns, moving to the next column when a block does not fit, and
 * draws each block's heading band and outline.
 */
final class PanelFlow {

    /** Height of a heading band, points. */
    static final float BAND = 11f;
    /** Space between blocks and inside a block's outline, points. */
    static final float GAP = PageRect.mm(2.2);
    static final float PAD = 3.5f;
    static final int BAND_RGB = 0x23414F;
    static final int RULE_RGB = 0x23414F;

    private PanelFlow() {
    }

    /** Where each block goes (outer rectangles, in block order), or empty when they do not all fit. */
    static Optional<List<PageRect>> place(List<PanelBlock> blocks, List<PageRect> columns) {
        List<PageRect> out = new ArrayList<>();
        int col = 0;
        float y = columns.isEmpty() ? 0 : columns.get(0).top();
        for (PanelBlock b : blocks) {
            while (true) {
                if (col >= columns.size()) {
                    return Optional.empty();
                }
                PageRect c = columns.get(col);
                float h = outerHeight(b, c.width());
                if (y - h >= c.y() - 0.01f) {
                    out.add(new PageRect(c.x(), y - h, c.width(), h));
                    y -= h + GAP;
                    break;
                }
                col++;
                y = col < columns.size() ? columns.get(col).top() : 0;
            }
        }
        return Optional.of(out);
    }

    static float outerHeight(PanelBlock b, float width) {
        return BAND + b.bodyHeight(width - 2 * PAD) + 2 * PAD;
    }

    /** Draws a block's band, outline and body in {@code r}. */
    static void draw(SheetCanvas c, PanelBlock b, PageRect r) {
        c.begin("Panel");
        c.fill(BAND_RGB);
        c.fillRect(r.topStrip(BAND));
        c.fill(0xFFFFFF);
        c.text(b.heading(), r.x() + PAD, r.top() - BAND + 3.4f, 6.8f, true);
        c.stroke(RULE_RGB, 0.6f);
        c.strokeRect(r);
        c.fill(0x111111);
        b.drawBody(c, r.belowTop(BAND).inset(PAD));
        c.end();
    }
}
