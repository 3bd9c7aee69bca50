package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;

/**
 * Where things go on a sheet: a border 10 mm inside the paper edge; the information panel as columns
 * down the right side (landscape) or a band of three columns along the bottom (portrait); the map frame
 * in the rest, with a band around it for the coordinate labels.
 *
 * @param border  the sheet border, points
 * @param frame   the map frame (neatline), points
 * @param columns the panel columns, points
 */
public record SheetLayout(PageRect border, PageRect frame, List<PageRect> columns) {

    static final float MARGIN = PageRect.mm(10);
    static final float LABEL_BAND = PageRect.mm(8);
    static final float GAP = PageRect.mm(3);
    /** Room kept free in each column while planning, for a block that grows by a line on a later sheet. */
    static final float SLACK = 10f;

    /**
     * Plans a layout whose panel holds {@code blocks}.
     *
     * @throws IllegalArgumentException when the panel cannot hold them on this paper
     */
    public static SheetLayout plan(PageFormat format, List<PanelBlock> blocks) {
        PageRect border = format.page().inset(MARGIN);
        float colW = PageRect.mm(format.paper().compareTo(Paper.A2) <= 0 ? 78 : 62);
        if (format.orientation() == Orientation.LANDSCAPE) {
            for (int k = 1; k <= 3; k++) {
                float panelW = k * colW + (k - 1) * GAP;
                float left = border.right() - GAP - panelW;
                List<PageRect> cols = new ArrayList<>();
                for (int i = 0; i < k; i++) {
                    cols.add(new PageRect(left + i * (colW + GAP), border.y() + GAP, colW, border.height() - 2 * GAP));
                }
                if (fits(blocks, cols)) {
                    PageRect frame = new PageRect(border.x() + LABEL_BAND, border.y() + LABEL_BAND,
                            left - GAP - LABEL_BAND - border.x() - LABEL_BAND, border.height() - 2 * LABEL_BAND);
                    return new SheetLayout(border, frame, cols);
                }
            }
        } else {
            float w = (border.width() - 4 * GAP) / 3;
            for (float h = PageRect.mm(45); h <= border.height() * 0.6f; h += PageRect.mm(3)) {
                List<PageRect> cols = new ArrayList<>();
                for (int i = 0; i < 3; i++) {
                    cols.add(new PageRect(border.x() + GAP + i * (w + GAP), border.y() + GAP, w, h));
                }
                if (fits(blocks, cols)) {
                    float bottom = border.y() + GAP + h + LABEL_BAND;
                    PageRect frame = new PageRect(border.x() + LABEL_BAND, bottom, border.width() - 2 * LABEL_BAND,
                            border.top() - LABEL_BAND - bottom);
                    return new SheetLayout(border, frame, cols);
                }
            }
        }
        throw new IllegalArgumentException("the sheet panel does not fit on " + format.label()
                + ": use larger paper, landscape, or fewer layers");
    }

    private static boolean fits(List<PanelBlock> blocks, List<PageRect> cols) {
        List<PageRect> tight = cols.stream()
                .map(c -> new PageRect(c.x(), c.y() + SLACK, c.width(), Math.max(0, c.height() - SLACK))).toList();
        return PanelFlow.place(blocks, tight).isPresent();
    }

    /** The panel's outer rectangle: the union of its columns. */
    PageRect panel() {
        PageRect a = columns.get(0), b = columns.get(columns.size() - 1);
        return new PageRect(a.x(), a.y(), b.right() - a.x(), a.height());
    }
}
