package org.halyard.sheet;

import java.util.Locale;

/**
 * A scale bar with its ratio and a note that distances are Cartesian grid distances in the sheet CRS
 * (no scale-factor or height correction; STACK.md "Maps and sheets").
 *
 * <p>The bar's length is the largest round ground distance (1, 2, 2.5, 5 x 10^k m) that fits the block,
 * in four or five alternately filled divisions; its paper length is
 * {@code length * 72 / 0.0254 / scaleDenominator} points exactly.
 *
 * @param scaleDenominator the N of 1:N
 * @param crsCode          e.g. {@code EPSG:32631}
 */
record ScaleBar(int scaleDenominator, String crsCode) implements PanelBlock {

    private static final float BAR_PT = 5f;
    private static final float LABEL_PT = 6f;
    private static final float NOTE_PT = 5.8f;

    @Override
    public String heading() {
        return "SCALE 1:" + scaleDenominator;
    }

    /** Ground length of the bar that fits {@code width} points, metres. */
    double lengthMetres(float width) {
        double ppm = StandardScales.pointsPerMetre(scaleDenominator);
        return NiceSteps.atMost((width - 14) / ppm);
    }

    static int divisions(double length) {
        double lead = length / Math.pow(10, Math.floor(Math.log10(length)));
        return Math.abs(lead - 2) < 1e-9 ? 4 : 5;
    }

    private String note() {
        return "Distances are Cartesian (grid) metres in " + crsCode + "; no scale-factor correction.";
    }

    @Override
    public float bodyHeight(float width) {
        return LABEL_PT + 3 + BAR_PT + 4 + TextWrap.height(note(), width, NOTE_PT, false);
    }

    @Override
    public void drawBody(SheetCanvas c, PageRect body) {
        double len = lengthMetres(body.width());
        int n = divisions(len);
        double ppm = StandardScales.pointsPerMetre(scaleDenominator);
        float x0 = body.x() + 3;
        float yTop = body.top() - LABEL_PT - 3;
        float seg = (float) (len * ppm / n);
        c.begin("ScaleBar");
        c.stroke(0x111111, 0.5f);
        for (int i = 0; i < n; i++) {
            PageRect r = new PageRect(x0 + i * seg, yTop - BAR_PT, seg, BAR_PT);
            c.fill(i % 2 == 0 ? 0x111111 : 0xFFFFFF);
            c.fillRect(r);
            c.strokeRect(r);
        }
        c.fill(0x111111);
        for (int i = 0; i <= n; i++) {
            String v = NiceSteps.metres(len * i / n) + (i == n ? " m" : "");
            c.text(v, x0 + i * seg, yTop + 2, LABEL_PT, false, i == n ? 0.3 : 0.5, 0);
        }
        c.end();
        TextWrap.draw(c, note(), body.belowTop(LABEL_PT + 3 + BAR_PT + 4), NOTE_PT, false);
    }

    /** The scale as printed in the title block, e.g. {@code 1:1000 at A3 landscape}. */
    static String label(int denominator, PageFormat page) {
        return String.format(Locale.ROOT, "1:%d at %s", denominator, page.label());
    }
}
