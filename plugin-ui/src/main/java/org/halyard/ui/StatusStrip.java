package org.halyard.ui;

import java.awt.FlowLayout;
import java.awt.geom.Point2D;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.halyard.ui.map.CursorReadout;
import org.halyard.ui.map.LayerStack;
import org.halyard.ui.map.MapViewport;

/** The strip along the bottom: scale, cursor position in the map CRS and in WGS 84, value under the cursor. */
final class StatusStrip extends JPanel {

    private final JLabel scale = label(170);
    private final JLabel map = label(330);
    private final JLabel latLon = label(290);
    private final JLabel value = label(260);
    private final CursorReadout readout = new CursorReadout();
    private final LayerStack stack;

    StatusStrip(LayerStack stack) {
        super(new FlowLayout(FlowLayout.LEFT, 0, 0));
        this.stack = stack;
        setBackground(new java.awt.Color(0xE6, 0xE1, 0xD5));
        setBorder(BorderFactory.createMatteBorder(1, 0, 0, 0, Theme.RULE));
        add(scale);
        add(map);
        add(latLon);
        add(value);
        map.setText("move the mouse over the map");
    }

    private static JLabel label(int width) {
        JLabel l = new JLabel(" ");
        l.setFont(Theme.MONO);
        l.setForeground(Theme.INK);
        l.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, 0, 0, 1, Theme.RULE),
                BorderFactory.createEmptyBorder(3, 8, 3, 8)));
        l.setPreferredSize(new java.awt.Dimension(width, 22));
        return l;
    }

    void viewChanged(MapViewport v) {
        scale.setText(CursorReadout.scaleText(v).replaceAll("\\s+at 96 dpi.*", ""));
        scale.setToolTipText(CursorReadout.scaleText(v));
    }

    void cursor(Point2D p) {
        map.setText(readout.mapText(p.getX(), p.getY(), stack.crsCode()));
        latLon.setText(readout.latLonText(p.getX(), p.getY(), stack.crsCode()));
        value.setText(CursorReadout.valueText(stack.topGrid(), p.getX(), p.getY()));
    }
}
