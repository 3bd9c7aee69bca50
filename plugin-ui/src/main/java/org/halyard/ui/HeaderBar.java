package org.halyard.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Cursor;
import java.awt.FlowLayout;
import java.awt.Font;
import java.util.EnumMap;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JToggleButton;
import javax.swing.AbstractButton;
import org.halyard.ui.map.MapCanvas;
import org.halyard.ui.map.MapTool;

/**
 * The strip across the top: the name, what is open, the map tools (one active at a time, its hint shown
 * beside them) and the file actions.
 */
final class HeaderBar extends JPanel {

    private final JLabel workspace = new JLabel();
    private final JLabel hint = new JLabel();
    private final Map<MapTool, JToggleButton> tools = new EnumMap<>(MapTool.class);

    HeaderBar(MapCanvas canvas, Runnable open, Runnable export, Runnable fitAll) {
        super(new BorderLayout(12, 0));
        setBackground(Theme.HEADER);
        setBorder(BorderFactory.createEmptyBorder(6, 12, 6, 10));
        JLabel mark = new JLabel("HALYARD");
        mark.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
        mark.setForeground(Theme.HEADER_TEXT);
        JPanel left = stacked(mark, workspace);

        JPanel middle = transparent(new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0)));
        ButtonGroup group = new ButtonGroup();
        for (MapTool t : MapTool.values()) {
            JToggleButton b = style(new JToggleButton(t.label()));
            b.setToolTipText(t.hint());
            b.addActionListener(e -> {
                canvas.setTool(t);
                refresh(t);
            });
            group.add(b);
            tools.put(t, b);
            middle.add(b);
        }
        middle.add(style(action("Fit all", "Zoom out to every layer", fitAll)));
        JPanel centre = stacked(middle, hint);

        JPanel right = transparent(new JPanel(new FlowLayout(FlowLayout.RIGHT, 4, 0)));
        right.add(style(action("Open files...", "Add grids (.tif), GeoPackages, GeoJSON, CSV points or a recipe", open)));
        right.add(style(action("Save view as PNG...", "Write the map as it is on screen to a PNG file", export)));
        add(left, BorderLayout.WEST);
        add(centre, BorderLayout.CENTER);
        add(right, BorderLayout.EAST);
        tools.get(MapTool.PAN).setSelected(true);
        refresh(MapTool.PAN);
    }

    /** {@code top} over a small pale caption {@code below}. */
    private static JPanel stacked(javax.swing.JComponent top, JLabel below) {
        below.setFont(Theme.SMALL);
        below.setForeground(new Color(0xB9, 0xC9, 0xC6));
        JPanel p = transparent(new JPanel(new BorderLayout()));
        p.add(top, BorderLayout.NORTH);
        p.add(below, BorderLayout.SOUTH);
        return p;
    }

    void setWorkspace(String text) {
        workspace.setText(text);
    }

    private void refresh(MapTool active) {
        hint.setText(active.hint());
        tools.forEach((t, b) -> {
            b.setBackground(t == active ? Theme.ACCENT : new Color(0x25, 0x52, 0x5C));
            b.setForeground(Theme.HEADER_TEXT);
        });
    }

    private static JButton action(String text, String tip, Runnable r) {
        JButton b = new JButton(text);
        b.setToolTipText(tip);
        b.addActionListener(e -> r.run());
        return b;
    }

    private static <T extends AbstractButton> T style(T b) {
        b.setFont(Theme.BODY);
        b.setFocusPainted(false);
        b.setContentAreaFilled(false);
        b.setOpaque(true);
        b.setBackground(new Color(0x25, 0x52, 0x5C));
        b.setForeground(Theme.HEADER_TEXT);
        b.setBorder(BorderFactory.createEmptyBorder(4, 10, 4, 10));
        b.setCursor(Cursor.getPredefinedCursor(Cursor.HAND_CURSOR));
        return b;
    }

    private static <T extends JPanel> T transparent(T p) {
        p.setOpaque(false);
        return p;
    }
}
