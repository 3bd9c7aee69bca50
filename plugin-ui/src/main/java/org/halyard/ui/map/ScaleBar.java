package org.halyard.ui.map;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.util.Locale;

/**
 * A two-segment scale bar in the lower-left corner: a round length of at most {@value #MAX_PX} pixels.
 * Lengths are Cartesian distances in the projected map CRS (STACK.md: say so; the label does).
 */
public final class ScaleBar {

    static final double MAX_PX = 160;

    private ScaleBar() {
    }

    /** The bar's ground length in metres for a viewport. */
    public static double lengthMetres(MapViewport v) {
        return NiceSteps.atMost(MAX_PX * v.metresPerPixel());
    }

    /** "250 m" or "1.5 km" style text for a length in metres. */
    public static String format(double metres) {
        if (metres >= 1000) {
            return String.format(Locale.ROOT, "%s km", trim(metres / 1000));
        }
        return metres >= 1 ? trim(metres) + " m" : trim(metres * 100) + " cm";
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.3f", v);
        return s.replaceAll("\\.?0+$", "");
    }

    public static void paint(Graphics2D g, MapViewport v) {
        double m = lengthMetres(v);
        int px = (int) Math.round(m / v.metresPerPixel());
        int x = 14, y = v.height() - 16;
        g.setColor(new Color(0xEC, 0xEE, 0xE8, 220));
        g.fillRoundRect(x - 8, y - 22, px + 90, 32, 8, 8);
        g.setColor(new Color(0x1F, 0x2A, 0x30));
        g.fillRect(x, y - 4, px / 2, 6);
        g.setStroke(new BasicStroke(1.2f));
        g.drawRect(x, y - 4, px, 6);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 11));
        g.drawString(format(m), x + px + 8, y + 3);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 9));
        g.drawString("grid distance", x, y - 9);
    }
}
