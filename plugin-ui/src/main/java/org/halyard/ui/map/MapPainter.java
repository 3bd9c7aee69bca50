package org.halyard.ui.map;

import java.awt.AlphaComposite;
import java.awt.Color;
import java.awt.Composite;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.List;

/**
 * Paints a stack of layers, bottom to top, with each layer's opacity, over the map background. One painter
 * for the canvas (asynchronous tiles) and the PNG export (everything rendered before returning).
 */
public final class MapPainter {

    /** Map background: a pale sea-chart paper, our own choice. */
    public static final Color PAPER = new Color(0xEC, 0xEE, 0xE8);

    private MapPainter() {
    }

    /**
     * Paints {@code layers} (top first) into {@code g}.
     *
     * @param request repaint request for tiles that arrive later, or {@code null} to render synchronously
     */
    public static void paint(Graphics2D g, MapViewport view, List<Layer> layers, Runnable request) {
        g.setColor(PAPER);
        g.fillRect(0, 0, view.width(), view.height());
        CoordinateTicks.paintLines(g, view);
        Composite before = g.getComposite();
        for (int i = layers.size() - 1; i >= 0; i--) {
            Layer l = layers.get(i);
            if (!l.isVisible() || l.opacity() <= 0 || !l.bounds().intersects(view.visible())) {
                continue;
            }
            g.setComposite(AlphaComposite.getInstance(AlphaComposite.SRC_OVER, l.opacity()));
            l.paint(g, view, request);
        }
        g.setComposite(before);
        CoordinateTicks.paintLabels(g, view);
    }

    /** The view as an opaque image, every tile rendered (for PNG export and tests). */
    public static BufferedImage image(MapViewport view, List<Layer> layers) {
        BufferedImage img = new BufferedImage(view.width(), view.height(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            paint(g, view, layers, null);
            ScaleBar.paint(g, view);
        } finally {
            g.dispose();
        }
        return img;
    }
}
