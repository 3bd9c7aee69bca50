package org.halyard.ui.map;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.util.Locale;

/**
 * Faint map-coordinate lines at a round spacing (at least {@value #MIN_SPACING_PX} pixels apart) and
 * their easting and northing labels along the top and left edges, in metres of the map CRS.
 */
final class CoordinateTicks {

    static final double MIN_SPACING_PX = 110;
    private static final Color LINE = new Color(0x9A, 0xA5, 0xA8, 70);
    private static final Color LABEL = new Color(0x33, 0x40, 0x47);
    private static final Color LABEL_BACK = new Color(0xEC, 0xEE, 0xE8, 200);

    private CoordinateTicks() {
    }

    static double spacing(MapViewport v) {
        return NiceSteps.atLeast(MIN_SPACING_PX * v.metresPerPixel());
    }

    static void paintLines(Graphics2D g, MapViewport v) {
        double s = spacing(v);
        var e = v.visible();
        g.setColor(LINE);
        g.setStroke(new BasicStroke(1f));
        for (double x = Math.ceil(e.getMinX() / s) * s; x <= e.getMaxX(); x += s) {
            int sx = (int) Math.round(v.screenX(x));
            g.drawLine(sx, 0, sx, v.height());
        }
        for (double y = Math.ceil(e.getMinY() / s) * s; y <= e.getMaxY(); y += s) {
            int sy = (int) Math.round(v.screenY(y));
            g.drawLine(0, sy, v.width(), sy);
        }
    }

    static void paintLabels(Graphics2D g, MapViewport v) {
        double s = spacing(v);
        var e = v.visible();
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        FontMetrics fm = g.getFontMetrics();
        for (double x = Math.ceil(e.getMinX() / s) * s; x <= e.getMaxX(); x += s) {
            label(g, fm, format(x, s) + " E", (int) v.screenX(x) + 3, fm.getAscent() + 2);
        }
        for (double y = Math.ceil(e.getMinY() / s) * s; y <= e.getMaxY(); y += s) {
            label(g, fm, format(y, s) + " N", 3, (int) v.screenY(y) - 3);
        }
    }

    private static void label(Graphics2D g, FontMetrics fm, String text, int x, int y) {
        g.setColor(LABEL_BACK);
        g.fillRect(x - 1, y - fm.getAscent(), fm.stringWidth(text) + 2, fm.getHeight());
        g.setColor(LABEL);
        g.drawString(text, x, y);
    }

    /** Metres with thin grouping and as many decimals as the spacing needs. */
    static String format(double value, double spacing) {
        int decimals = spacing >= 1 ? 0 : (int) Math.ceil(-Math.log10(spacing));
        return String.format(Locale.ROOT, "%,." + decimals + "f", value).replace(',', ' ');
    }
}
