package org.halyard.ui;

import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.util.Locale;
import javax.swing.JComponent;
import org.halyard.ui.map.GridLayer;

/** The colour bar of a grid layer: ramp, low, middle and high values with the unit, and the stretch name. */
final class ColourBarView extends JComponent {

    private GridLayer layer;

    ColourBarView() {
        setPreferredSize(new Dimension(220, 46));
    }

    void show(GridLayer l) {
        layer = l;
        repaint();
    }

    @Override
    protected void paintComponent(Graphics g0) {
        if (layer == null) {
            return;
        }
        Graphics2D g = (Graphics2D) g0;
        int w = getWidth() - 16, x0 = 8;
        var style = layer.style();
        for (int i = 0; i < w; i++) {
            g.setColor(new java.awt.Color(style.ramp().argb(i / (double) (w - 1)), true));
            g.drawLine(x0 + i, 4, x0 + i, 18);
        }
        g.setColor(Theme.RULE);
        g.drawRect(x0, 4, w - 1, 14);
        g.setFont(Theme.SMALL);
        g.setColor(Theme.INK);
        var fm = g.getFontMetrics();
        String lo = fmt(style.stretch().value(0)), mid = fmt(style.stretch().value(0.5));
        String hi = fmt(style.stretch().value(1)) + " " + layer.unit();
        g.drawString(lo, x0, 31);
        g.drawString(mid, x0 + w / 2 - fm.stringWidth(mid) / 2, 31);
        g.drawString(hi, x0 + w - fm.stringWidth(hi), 31);
        g.setColor(Theme.MUTED);
        g.drawString(style.ramp() + " ramp, " + style.stretch().label(), x0, 44);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
