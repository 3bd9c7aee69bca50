package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;

/**
 * Coordinate ticks of the sheet CRS around a map frame, their labels outside the neatline and small grid
 * crosses inside.
 *
 * <p>The interval is the smallest round value (1, 2, 2.5, 5 x 10^k metres) that puts ticks at least
 * {@link #MIN_SPACING_MM} apart on paper. Labels give the full coordinate with the trade's {@code mE} and
 * {@code mN} suffixes.
 */
public final class FrameTicks {

    /** Least distance between ticks on paper, millimetres. */
    static final double MIN_SPACING_MM = 28;
    /** Tick length outside the neatline, points. */
    static final float TICK_PT = PageRect.mm(2);
    /** Half the arm of a grid cross, points. */
    static final float CROSS_PT = PageRect.mm(1.5);
    static final float LABEL_PT = 6.5f;
    private static final int INK = 0x222222;

    private FrameTicks() {
    }

    /** Tick interval for {@code w}, metres. */
    public static double interval(MapWindow w) {
        return NiceSteps.atLeast(MIN_SPACING_MM / 1000.0 * w.scaleDenominator());
    }

    /** Tick values inside {@code [lo, hi]}: the whole multiples of {@code step}, metres. */
    public static List<Double> values(double lo, double hi, double step) {
        List<Double> v = new ArrayList<>();
        for (long k = (long) Math.ceil(lo / step); k * step <= hi; k++) {
            v.add(k * step);
        }
        return v;
    }

    /** The label of an easting, e.g. {@code 512350mE}. */
    public static String eastingLabel(double x) {
        return NiceSteps.metres(x) + "mE";
    }

    /** The label of a northing, e.g. {@code 5772500mN}. */
    public static String northingLabel(double y) {
        return NiceSteps.metres(y) + "mN";
    }

    /** Draws grid crosses inside the frame (call under a clip to the frame). */
    static void drawCrosses(SheetCanvas c, MapWindow w) {
        double step = interval(w);
        // A white casing under the dark cross keeps it legible over dark and light rasters alike.
        for (int pass = 0; pass < 2; pass++) {
            c.stroke(pass == 0 ? 0xFFFFFF : INK, pass == 0 ? 1.3f : 0.4f);
            for (double x : values(w.west(), w.east(), step)) {
                for (double y : values(w.south(), w.north(), step)) {
                    float px = w.pageX(x), py = w.pageY(y);
                    c.line(px - CROSS_PT, py, px + CROSS_PT, py);
                    c.line(px, py - CROSS_PT, px, py + CROSS_PT);
                }
            }
        }
    }

    /** Draws ticks and labels on all four sides, outside the neatline. */
    static void drawTicks(SheetCanvas c, MapWindow w) {
        double step = interval(w);
        PageRect f = w.frame();
        c.begin("CoordinateTicks");
        c.stroke(INK, 0.5f);
        c.fill(INK);
        float gap = TICK_PT + 1.5f;
        for (double x : values(w.west(), w.east(), step)) {
            float px = w.pageX(x);
            c.line(px, f.y(), px, f.y() - TICK_PT);
            c.line(px, f.top(), px, f.top() + TICK_PT);
            c.text(eastingLabel(x), px, f.y() - gap - LABEL_PT, LABEL_PT, false, 0.5, 0);
            c.text(eastingLabel(x), px, f.top() + gap, LABEL_PT, false, 0.5, 0);
        }
        for (double y : values(w.south(), w.north(), step)) {
            float py = w.pageY(y);
            c.line(f.x(), py, f.x() - TICK_PT, py);
            c.line(f.right(), py, f.right() + TICK_PT, py);
            c.text(northingLabel(y), f.x() - gap, py, LABEL_PT, false, 0.5, 90);
            c.text(northingLabel(y), f.right() + gap + LABEL_PT * 0.8, py, LABEL_PT, false, 0.5, 90);
        }
        c.end();
    }
}
