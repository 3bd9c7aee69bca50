package org.halyard.ui.map;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.halyard.io.FeatureLayer;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

/**
 * Vector features on the map: lines and polygons as paths, points as small symbols. Points falling on a
 * screen pixel already drawn are skipped, so a dense track of 10 Hz samples paints in one pass per pixel.
 */
public class VectorLayer extends Layer {

    private final FeatureLayer data;
    private final Path source;
    private final List<Path2D.Double> paths = new ArrayList<>();
    private final Envelope bounds = new Envelope();
    private VectorStyle style;

    /** A layer over {@code data} (already in the map CRS); {@code source} is its file, {@code table} its layer. */
    public VectorLayer(String name, FeatureLayer data, Path source) {
        super(name);
        this.data = data;
        this.source = source;
        this.style = VectorStyle.forName(name);
        for (FeatureLayer.Feature f : data.features()) {
            paths.add(FeatureShapes.path(f.geometry()));
            bounds.expandToInclude(f.geometry().getEnvelopeInternal());
        }
    }

    public FeatureLayer data() {
        return data;
    }

    /** The file it came from, or {@code null}. */
    public Path source() {
        return source;
    }

    public VectorStyle style() {
        return style;
    }

    public void setStyle(VectorStyle s) {
        style = s;
    }

    @Override
    public Envelope bounds() {
        return new Envelope(bounds);
    }

    @Override
    public String summary() {
        return data.features().size() + " " + data.geometryType().toLowerCase(java.util.Locale.ROOT)
                + " features, " + data.crsCode();
    }

    @Override
    public void paint(Graphics2D g, MapViewport view, Runnable request) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        AffineTransform t = view.mapToScreen();
        Envelope vis = view.visible();
        float[] dash = style.dashed() ? new float[] {8f, 5f} : null;
        g.setStroke(new BasicStroke(style.widthPx(), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 4f, dash, 0f));
        BitSet drawn = new BitSet(view.width() * view.height());
        List<FeatureLayer.Feature> fs = data.features();
        for (int i = 0; i < fs.size(); i++) {
            Geometry geom = fs.get(i).geometry();
            if (!vis.intersects(geom.getEnvelopeInternal())) {
                continue;
            }
            Path2D.Double p = paths.get(i);
            if (p.getCurrentPoint() != null) {
                Shape s = t.createTransformedShape(p);
                if (geom.getDimension() == 2 && style.fill().getAlpha() > 0) {
                    g.setColor(style.fill());
                    g.fill(s);
                }
                g.setColor(style.stroke());
                g.draw(s);
            } else {
                for (Coordinate c : geom.getCoordinates()) {
                    int sx = (int) view.screenX(c.x), sy = (int) view.screenY(c.y);
                    if (sx < 0 || sy < 0 || sx >= view.width() || sy >= view.height()) {
                        continue;
                    }
                    int bit = sy * view.width() + sx;
                    if (!drawn.get(bit)) {
                        drawn.set(bit);
                        paintPoint(g, fs.get(i), sx, sy);
                    }
                }
            }
        }
    }

    /** Draws one point feature at screen (sx, sy); subclasses draw class symbols. */
    protected void paintPoint(Graphics2D g, FeatureLayer.Feature f, double sx, double sy) {
        double r = style.symbolPx() / 2;
        Ellipse2D.Double dot = new Ellipse2D.Double(sx - r, sy - r, 2 * r, 2 * r);
        g.setColor(style.stroke());
        g.fill(dot);
    }
}
