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
        double[] values = new double[LABELS];
        double step = Double.MAX_VALUE;
        for (int i = 0; i < LABELS; i++) {
            values[i] = s.valueAt((double) i / (LABELS - 1));
            if (i > 0 && values[i] > values[i - 1]) {
                step = Math.min(step, values[i] - values[i - 1]);
            }
        }
        for (int i = 0; i < LABELS; i++) {
            float x = x0 + (float) i / (LABELS - 1) * w;
            c.line(x, yBar, x, yBar - 2);
            c.text(format(values[i], step) + (i == LABELS - 1 ? " " + layer.unit() : ""), x,
                    yBar - 2 - LABEL_PT, LABEL_PT, false, i == LABELS - 1 ? 0.35 : 0.5, 0);
        }
        c.end();
    }

    /**
     * A value with as many decimals as the closest pair of labels needs to differ (a histogram stretch
     * crowds labels near the mode), at most three, and fewer for values of 10 and above.
     */
    static String format(double v, double closestStep) {
        int decimals = (int) Math.max(0, Math.min(3, Math.ceil(-Math.log10(closestStep)) + 1));
        // Large values read better whole, however crowded their neighbours are.
        decimals = Math.abs(v) >= 100 ? 0 : Math.abs(v) >= 10 ? Math.min(decimals, 1) : decimals;
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }
}
