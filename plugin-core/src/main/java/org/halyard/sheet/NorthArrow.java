package org.halyard.sheet;

import java.util.Locale;

/**
 * The north diagram: grid north (up the sheet) and true north at the grid convergence, with the value
 * written out.
 *
 * <p>Convergence {@code gamma} is the angle from true north to grid north, positive when grid north is
 * east of true north ({@link org.halyard.io.ProjectedCrs#convergenceDeg}); true north is then drawn
 * {@code gamma} anticlockwise of the sheet's up direction. Angles under {@link #MIN_DRAWN_DEG} are drawn
 * exaggerated and the diagram says so.
 *
 * @param convergenceDeg grid convergence at the sheet centre, degrees
 * @param centreX        easting where it was computed, metres
 * @param centreY        northing where it was computed, metres
 */
record NorthArrow(double convergenceDeg, double centreX, double centreY) implements PanelBlock {

    static final double MIN_DRAWN_DEG = 12;
    private static final float DIAGRAM = 40f;
    private static final float NOTE_PT = 6f;

    @Override
    public String heading() {
        return "NORTH";
    }

    /** The printed statement of the convergence. */
    String note() {
        double g = convergenceDeg;
        String side = g >= 0 ? "west" : "east";
        return String.format(Locale.ROOT, "Grid convergence %+.3f\u00b0 at sheet centre %smE %smN: true north"
                        + " is %.3f\u00b0 %s of grid north. Map drawn grid north up.", g,
                NiceSteps.metres(Math.rint(centreX)), NiceSteps.metres(Math.rint(centreY)), Math.abs(g), side);
    }

    @Override
    public float bodyHeight(float width) {
        return Math.max(DIAGRAM, TextWrap.height(note(), width - DIAGRAM - 6, NOTE_PT, false)
                + (Math.abs(convergenceDeg) < MIN_DRAWN_DEG ? NOTE_PT * 1.3f : 0));
    }

    @Override
    public void drawBody(SheetCanvas c, PageRect body) {
        float cx = body.x() + DIAGRAM / 2;
        float base = body.top() - DIAGRAM + 2;
        float len = DIAGRAM - 12;
        c.begin("NorthArrow");
        // Grid north: a slender arrow split light and dark down its axis.
        c.fill(0x111111);
        c.fillPolygon(new double[] {cx, cx, cx + 4}, new double[] {base + len, base, base});
        c.fill(0xFFFFFF);
        c.fillPolygon(new double[] {cx, cx, cx - 4}, new double[] {base + len, base, base});
        c.stroke(0x111111, 0.5f);
        c.polyline(new double[] {cx, cx + 4, cx - 4}, new double[] {base + len, base, base}, true);
        c.fill(0x111111);
        c.text("GN", cx + 3, base + len - 4, 6f, true, 0, 0);
        double drawn = Math.abs(convergenceDeg) < MIN_DRAWN_DEG
                ? Math.copySign(MIN_DRAWN_DEG, convergenceDeg) : convergenceDeg;
        double a = Math.toRadians(drawn);
        double tx = cx - Math.sin(a) * len, ty = base + Math.cos(a) * len;
        c.stroke(0x0E6E6E, 0.7f);
        c.line(cx, base, tx, ty);
        c.fill(0x0E6E6E);
        c.circle(tx, ty, 1.3, true);
        c.text("TN", tx - 3 * Math.signum(drawn), ty - 4, 6f, true, drawn >= 0 ? 1 : 0, 0);
        c.end();
        c.fill(0x111111);
        PageRect text = new PageRect(body.x() + DIAGRAM + 6, body.y(), body.width() - DIAGRAM - 6, body.height());
        float used = TextWrap.draw(c, note(), text, NOTE_PT, false);
        if (Math.abs(convergenceDeg) < MIN_DRAWN_DEG) {
            c.fill(0x555555);
            c.text("(angle exaggerated in the diagram)", text.x(), text.top() - used - NOTE_PT, NOTE_PT, false);
        }
    }
}
