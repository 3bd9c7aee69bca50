package org.halyard.sheet;

import java.util.Locale;

/**
 * A horizontal colour bar for one raster layer, drawn as vector filled cells, with values and the unit.
 *
 * @param layer the raster layer
 */
record ColourBar(RasterLayer layer) implements PanelBlock {

    static final int CELLS = 120;
    private static final float BAR_PT = 8f;
    private static final float LABEL_PT = 6f;
    private static final int LABELS = 5;

    @Override
    public String heading() {
        return layer.name().toUpperCase(Locale.ROOT) + " (" + layer.unit() + ")";
    }

    @Override
    public float bodyHeight(float width) {
        return BAR_PT + 3 + LABEL_PT + 2;
    }

    @Override
    public void drawBody(SheetCanvas c, PageRect body) {
        ColourScale s = layer.colours();
        float x0 = body.x() + 8;
        float w = body.width() - 8 - SheetCanvas.textWidth("0000 " + layer.unit(), LABEL_PT, false) / 2;
        float yBar = body.top() - BAR_PT;
        c.begin("ColourBar");
        float cw = w / CELLS;
        for (int i = 0; i < CELLS; i++) {
            c.fill(s.rgb(s.valueAt((i + 0.5) / CELLS)));
            // Cells overlap by a hair so viewers show no seams between them.
            c.fillRect(new PageRect(x0 + i * cw, yBar, cw + 0.3f, BAR_PT));
        }
        c.stroke(0x111111, 0.4f);
        c.strokeRect(new PageRect(x0, yBar, w, BAR_PT));
        c.fill(0x111111);
        double lo = s.valueAt(0), hi = s.valueAt(1);
        for (int i = 0; i < LABELS; i++) {
            double f = (double) i / (LABELS - 1);
            float x = x0 + (float) f * w;
            c.line(x, yBar, x, yBar - 2);
            c.text(format(s.valueAt(f), hi - lo) + (i == LABELS - 1 ? " " + layer.unit() : ""), x,
                    yBar - 2 - LABEL_PT, LABEL_PT, false, i == LABELS - 1 ? 0.35 : 0.5, 0);
        }
        c.end();
    }

    /** A value with as many decimals as the bar's range needs. */
    static String format(double v, double range) {
        int decimals = range >= 50 ? 0 : range >= 5 ? 1 : range >= 0.5 ? 2 : 3;
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }
}
