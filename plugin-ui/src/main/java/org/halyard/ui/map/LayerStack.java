package org.halyard.ui.map;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.locationtech.jts.geom.Envelope;

/**
 * The ordered layers of the map, top first, with change listeners. The map CRS is that of the first
 * layer added that has one.
 *
 * <p><b>Thread safety:</b> event thread only; painting threads take {@link #snapshot()}s.
 */
public final class LayerStack {

    private final List<Layer> layers = new ArrayList<>();
    private final List<Runnable> listeners = new CopyOnWriteArrayList<>();
    private String crsCode;

    /** The map CRS code, or {@code null} before any layer with a CRS is added. */
    public String crsCode() {
        return crsCode;
    }

    /** Sets the map CRS if none is set yet. */
    public void adoptCrs(String code) {
        if (crsCode == null && code != null) {
            crsCode = code;
        }
    }

    public void addListener(Runnable r) {
        listeners.add(r);
    }

    /** Tells the listeners that a layer changed (style, visibility, opacity, content). */
    public void changed() {
        listeners.forEach(Runnable::run);
    }

    /** Adds {@code l} on top. */
    public void addTop(Layer l) {
        layers.add(0, l);
        changed();
    }

    /** Adds {@code l} at the bottom. */
    public void addBottom(Layer l) {
        layers.add(l);
        changed();
    }

    public void remove(Layer l) {
        layers.remove(l);
        changed();
    }

    /** Moves {@code l} by {@code delta} places (negative is up, towards the top). */
    public void move(Layer l, int delta) {
        int i = layers.indexOf(l);
        int j = Math.max(0, Math.min(layers.size() - 1, i + delta));
        if (i >= 0 && j != i) {
            layers.remove(i);
            layers.add(j, l);
            changed();
        }
    }

    /** The layers, top first, as a copy. */
    public List<Layer> snapshot() {
        return List.copyOf(layers);
    }

    public int size() {
        return layers.size();
    }

    public Layer get(int i) {
        return layers.get(i);
    }

    public int indexOf(Layer l) {
        return layers.indexOf(l);
    }

    /** The uppermost visible grid layer, or {@code null} when there is none. */
    public GridLayer topGrid() {
        for (Layer l : layers) {
            if (l instanceof GridLayer g && l.isVisible()) {
                return g;
            }
        }
        return null;
    }

    /** The layers of one kind, top first. */
    public <T extends Layer> List<T> ofType(Class<T> type) {
        return layers.stream().filter(type::isInstance).map(type::cast).toList();
    }

    /** Union of the layer extents (an empty envelope when there are no layers). */
    public Envelope bounds() {
        Envelope e = new Envelope();
        layers.forEach(l -> e.expandToInclude(l.bounds()));
        return e;
    }
}
