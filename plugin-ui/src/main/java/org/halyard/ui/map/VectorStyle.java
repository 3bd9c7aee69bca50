package org.halyard.ui.map;

import java.awt.Color;

/**
 * How plain vector features are drawn.
 *
 * @param stroke     line and symbol outline colour
 * @param fill       polygon and symbol fill, alpha 0 for none
 * @param widthPx    line width, screen pixels
 * @param symbolPx   point symbol size, screen pixels
 * @param dashed     whether lines are dashed (charted or proposed features)
 */
public record VectorStyle(Color stroke, Color fill, float widthPx, float symbolPx, boolean dashed) {

    /** A style for a layer named {@code name}: infrastructure bold and dashed (checked first), tracks thin, contours faint. */
    public static VectorStyle forName(String name) {
        String n = name.toLowerCase(java.util.Locale.ROOT);
        if (n.contains("contour") || n.contains("bathy")) {
            return new VectorStyle(new Color(0x4F, 0x7C, 0x8A, 150), new Color(0, 0, 0, 0), 0.7f, 3f, false);
        }
        if (n.contains("cable") || n.contains("pipe") || n.contains("asset") || n.contains("infra")) {
            return new VectorStyle(new Color(0xB0, 0x2E, 0x8A), new Color(0xB0, 0x2E, 0x8A, 40), 2.2f, 6f, true);
        }
        if (n.contains("track") || n.contains("line") && !n.contains("pipeline")) {
            return new VectorStyle(new Color(0x3C, 0x4B, 0x55, 170), new Color(0, 0, 0, 0), 0.8f, 2.5f, false);
        }
        return new VectorStyle(new Color(0x2F, 0x3A, 0x40), new Color(0x8C, 0x7A, 0x5B, 60), 1.2f, 5f, false);
    }

    /** The same style in another stroke colour. */
    public VectorStyle withStroke(Color c) {
        return new VectorStyle(c, new Color(c.getRed(), c.getGreen(), c.getBlue(), fill.getAlpha()), widthPx, symbolPx, dashed);
    }
}
