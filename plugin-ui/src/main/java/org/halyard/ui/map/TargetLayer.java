package org.halyard.ui.map;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.Set;
import org.halyard.io.FeatureLayer;

/**
 * Target picks drawn by class ({@link TargetSymbols}): the analyst's class where one is set, else the
 * machine class. Selected targets get a halo.
 */
public final class TargetLayer extends VectorLayer {

    /** Column of the machine class (CONTRACT: {@code discrete} or {@code linear}). */
    public static final String CLASS = "class";
    /** Interpretation columns the workbench writes back to the GeoPackage. */
    public static final String ANALYST_CLASS = "analyst_class";
    public static final String ANALYST_CONFIDENCE = "analyst_confidence";
    public static final String ANALYST_NOTE = "analyst_note";

    private static final double SYMBOL_PX = 13;
    private static final Color SELECTED = new Color(0x00, 0x9C, 0xC8);

    private final Set<Long> selected = new LinkedHashSet<>();
    private final java.util.Map<Long, java.util.Map<String, Object>> edits = new java.util.HashMap<>();

    public TargetLayer(String name, FeatureLayer data, Path source) {
        super(name, data, source);
    }

    /** Whether a layer looks like a target list: point features with a {@code class} column. */
    public static boolean looksLikeTargets(FeatureLayer l) {
        return "Point".equals(l.geometryType()) && l.columns().stream().anyMatch(c -> c.name().equalsIgnoreCase(CLASS));
    }

    /** The class a feature is drawn with: analyst's if set, else the machine's. */
    public static String effectiveClass(java.util.Map<String, Object> attributes) {
        Object a = attributes.get(ANALYST_CLASS);
        if (a != null && !a.toString().isBlank()) {
            return a.toString();
        }
        Object c = attributes.get(CLASS);
        return c == null ? "" : c.toString();
    }

    /** The attributes of {@code f} with the edits made in this session applied. */
    public java.util.Map<String, Object> attributes(FeatureLayer.Feature f) {
        java.util.Map<String, Object> e = edits.get(f.id());
        if (e == null) {
            return f.attributes();
        }
        java.util.Map<String, Object> m = new java.util.LinkedHashMap<>(f.attributes());
        m.putAll(e);
        return m;
    }

    /** Records an edited value of feature {@code id} (saving to the file is the caller's job). */
    public void setAttribute(long id, String column, Object value) {
        edits.computeIfAbsent(id, k -> new java.util.LinkedHashMap<>()).put(column, value);
    }

    public Set<Long> selection() {
        return Collections.unmodifiableSet(selected);
    }

    public void setSelection(Set<Long> ids) {
        selected.clear();
        selected.addAll(ids);
    }

    @Override
    protected void paintPoint(Graphics2D g, FeatureLayer.Feature f, double sx, double sy) {
        if (selected.contains(f.id())) {
            g.setColor(SELECTED);
            g.setStroke(new BasicStroke(3f));
            g.draw(new Ellipse2D.Double(sx - SYMBOL_PX, sy - SYMBOL_PX, 2 * SYMBOL_PX, 2 * SYMBOL_PX));
        }
        TargetSymbols.draw(g, TargetSymbols.of(effectiveClass(attributes(f))), sx, sy, SYMBOL_PX);
    }
}
