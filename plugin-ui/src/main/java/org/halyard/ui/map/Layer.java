package org.halyard.ui.map;

import java.awt.Graphics2D;
import java.util.Objects;
import org.locationtech.jts.geom.Envelope;

/**
 * One layer of the map: a name, visibility, opacity and a way to paint itself in map coordinates.
 *
 * <p><b>Thread safety:</b> state changes on the event thread; {@link #paint} may run on an export thread
 * with a copied viewport.
 */
public abstract class Layer {

    private String name;
    private boolean visible = true;
    private float opacity = 1f;

    protected Layer(String name) {
        this.name = Objects.requireNonNull(name, "name");
    }

    public String name() {
        return name;
    }

    public void setName(String n) {
        name = Objects.requireNonNull(n, "name");
    }

    public boolean isVisible() {
        return visible;
    }

    public void setVisible(boolean v) {
        visible = v;
    }

    /** Opacity, 0 (invisible) to 1 (opaque). */
    public float opacity() {
        return opacity;
    }

    /** Sets the opacity, clamped to [0, 1]. */
    public void setOpacity(float o) {
        opacity = Math.max(0f, Math.min(1f, o));
    }

    /** Extent in map coordinates, metres. */
    public abstract Envelope bounds();

    /** A short description for the layer list: kind, size, unit. */
    public abstract String summary();

    /**
     * Paints the layer.
     *
     * @param g       graphics in screen pixels (opacity already set by the caller)
     * @param view    the viewport
     * @param request how to ask for a repaint when work finished in the background arrives; {@code null}
     *                means paint everything now, synchronously (export, tests)
     */
    public abstract void paint(Graphics2D g, MapViewport view, Runnable request);

    @Override
    public String toString() {
        return name;
    }
}
