package org.halyard.ui;

import java.awt.Color;
import java.awt.Font;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.border.Border;

/**
 * Halyard's own look: a deep harbour-teal header, warm light panels and one accent colour for actions.
 * Colours and fonts live here so that every panel agrees.
 */
public final class Theme {

    public static final Color HEADER = new Color(0x15, 0x3B, 0x44);
    public static final Color HEADER_TEXT = new Color(0xF1, 0xEC, 0xDF);
    public static final Color PANEL = new Color(0xF6, 0xF3, 0xEC);
    public static final Color RULE = new Color(0xD5, 0xCF, 0xC2);
    public static final Color ACCENT = new Color(0xC8, 0x5A, 0x19);
    public static final Color INK = new Color(0x22, 0x2B, 0x30);
    public static final Color MUTED = new Color(0x6A, 0x72, 0x76);

    public static final Font BODY = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    public static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    public static final Font HEADING = new Font(Font.SANS_SERIF, Font.BOLD, 12);
    public static final Font MONO = new Font(Font.MONOSPACED, Font.PLAIN, 11);

    private Theme() {
    }

    /** A small bold caption over a group of controls. */
    public static JLabel caption(String text) {
        JLabel l = new JLabel(text.toUpperCase(java.util.Locale.ROOT));
        l.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 10));
        l.setForeground(MUTED);
        l.setBorder(BorderFactory.createEmptyBorder(8, 2, 3, 2));
        return l;
    }

    /** A thin rule under a section and some padding. */
    public static Border section() {
        return BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, 0, 1, 0, RULE),
                BorderFactory.createEmptyBorder(4, 8, 6, 8));
    }

    /** A form cell at (x, y) spanning {@code width} columns, left-aligned, filling across, small insets. */
    public static java.awt.GridBagConstraints cell(int x, int y, int width) {
        java.awt.GridBagConstraints c = new java.awt.GridBagConstraints();
        c.gridx = x;
        c.gridy = y;
        c.gridwidth = width;
        c.anchor = java.awt.GridBagConstraints.WEST;
        c.fill = java.awt.GridBagConstraints.HORIZONTAL;
        c.insets = new java.awt.Insets(3, 4, 3, 4);
        return c;
    }

    /** Paints a component with the panel colour. */
    public static <T extends JComponent> T panel(T c) {
        c.setBackground(PANEL);
        c.setOpaque(true);
        return c;
    }
}
