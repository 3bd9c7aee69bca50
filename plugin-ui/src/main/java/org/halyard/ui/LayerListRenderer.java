package org.halyard.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.ListCellRenderer;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.Layer;
import org.halyard.ui.map.TargetLayer;
import org.halyard.ui.map.TargetSymbols;
import org.halyard.ui.map.VectorLayer;

/**
 * One row of the layer list: an eye toggle (a filled dot when shown, a hollow one when hidden), a swatch of
 * the layer's colours, its name and a one-line summary.
 */
final class LayerListRenderer implements ListCellRenderer<Layer> {

    /** Width of the visibility toggle at the left of each row, pixels. */
    static final int TOGGLE_WIDTH = 26;

    private final JPanel row = new JPanel(new BorderLayout(6, 0));
    private final Toggle toggle = new Toggle();
    private final Swatch swatch = new Swatch();
    private final JLabel name = new JLabel();
    private final JLabel summary = new JLabel();

    LayerListRenderer() {
        JPanel text = new JPanel(new BorderLayout());
        text.setOpaque(false);
        name.setFont(Theme.BODY);
        summary.setFont(Theme.SMALL);
        summary.setForeground(Theme.MUTED);
        text.add(name, BorderLayout.CENTER);
        text.add(summary, BorderLayout.SOUTH);
        JPanel left = new JPanel(new BorderLayout(2, 0));
        left.setOpaque(false);
        left.add(toggle, BorderLayout.WEST);
        left.add(swatch, BorderLayout.EAST);
        row.add(left, BorderLayout.WEST);
        row.add(text, BorderLayout.CENTER);
        row.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, 0, 1, 0, Theme.RULE),
                BorderFactory.createEmptyBorder(4, 2, 4, 6)));
    }

    @Override
    public Component getListCellRendererComponent(JList<? extends Layer> list, Layer l, int index, boolean selected,
                                                  boolean focus) {
        row.setBackground(selected ? new Color(0xE3, 0xD9, 0xC4) : Theme.PANEL);
        toggle.on = l.isVisible();
        swatch.layer = l;
        name.setText(l.name() + (l.opacity() < 1 ? String.format(java.util.Locale.ROOT, "  (%d%%)", Math.round(l.opacity() * 100)) : ""));
        name.setForeground(l.isVisible() ? Theme.INK : Theme.MUTED);
        summary.setText(l.summary());
        return row;
    }

    private static final class Toggle extends JComponent {
        boolean on;

        Toggle() {
            setPreferredSize(new Dimension(TOGGLE_WIDTH - 6, 20));
            setToolTipText("Show or hide");
        }

        @Override
        protected void paintComponent(Graphics g0) {
            Graphics2D g = (Graphics2D) g0;
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setColor(on ? Theme.HEADER : Theme.MUTED);
            int d = 12, x = (getWidth() - d) / 2, y = (getHeight() - d) / 2;
            if (on) {
                g.fillOval(x, y, d, d);
            } else {
                g.drawOval(x, y, d, d);
            }
        }
    }

    private static final class Swatch extends JComponent {
        Layer layer;

        Swatch() {
            setPreferredSize(new Dimension(30, 20));
        }

        @Override
        protected void paintComponent(Graphics g0) {
            Graphics2D g = (Graphics2D) g0;
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            int w = getWidth() - 4, h = 12, y = (getHeight() - h) / 2;
            if (layer instanceof GridLayer gl) {
                for (int i = 0; i < w; i++) {
                    g.setColor(new Color(gl.style().ramp().argb(i / (double) (w - 1)), true));
                    g.drawLine(2 + i, y, 2 + i, y + h);
                }
            } else if (layer instanceof TargetLayer) {
                TargetSymbols.draw(g, TargetSymbols.CLASSES.get(0), 9, getHeight() / 2.0, 10);
                TargetSymbols.draw(g, TargetSymbols.CLASSES.get(1), 22, getHeight() / 2.0, 10);
            } else if (layer instanceof VectorLayer vl) {
                g.setColor(vl.style().stroke());
                g.setStroke(new java.awt.BasicStroke(Math.max(1.5f, vl.style().widthPx())));
                g.drawLine(3, y + h, w / 2, y + 2);
                g.drawLine(w / 2, y + 2, w, y + h / 2);
            }
        }
    }
}
