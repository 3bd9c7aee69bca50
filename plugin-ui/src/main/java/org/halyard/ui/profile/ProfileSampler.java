package org.halyard.ui.profile;

import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.halyard.io.FeatureLayer;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.VectorLayer;
import org.locationtech.jts.geom.Coordinate;

/**
 * Samples grids along a straight line from A to B and collects the track samples lying near it.
 *
 * <p><b>Algorithm:</b> grids are interpolated bilinearly ({@link org.halyard.grid.Grid#valueAt}) at
 * {@code n} evenly spaced stations including both ends. A track sample belongs to the profile when its
 * perpendicular distance to segment AB is within the buffer and its foot lies on the segment; its
 * abscissa is the distance of the foot from A.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class ProfileSampler {

    private ProfileSampler() {
    }

    /** A sampled series: name, unit, abscissa (metres from A) and values ({@code NaN} off the grid). */
    public record Series(String name, String unit, double[] distance, double[] values) { }

    /** The whole profile: length in metres, grid series and track series. */
    public record Profile(double length, List<Series> grids, List<Series> tracks) { }

    /**
     * Samples {@code grids} along {@code line} (map metres) and picks track samples within
     * {@code bufferMetres} of it from the point layers {@code tracks} (their first numeric field column).
     */
    public static Profile sample(Line2D line, List<GridLayer> grids, List<VectorLayer> tracks, int n,
                                 double bufferMetres) {
        if (n < 2) {
            throw new IllegalArgumentException("a profile needs at least 2 stations, got " + n);
        }
        double dx = line.getX2() - line.getX1(), dy = line.getY2() - line.getY1();
        double len = Math.hypot(dx, dy);
        List<Series> gs = new ArrayList<>();
        for (GridLayer g : grids) {
            double[] d = new double[n], v = new double[n];
            for (int i = 0; i < n; i++) {
                double t = i / (double) (n - 1);
                d[i] = t * len;
                v[i] = g.grid().valueAt(line.getX1() + t * dx, line.getY1() + t * dy);
            }
            gs.add(new Series(g.name(), g.unit(), d, v));
        }
        List<Series> ts = new ArrayList<>();
        for (VectorLayer l : tracks) {
            String col = valueColumn(l.data());
            if (col == null || len == 0) {
                continue;
            }
            List<double[]> hits = new ArrayList<>();
            for (FeatureLayer.Feature f : l.data().features()) {
                Coordinate c = f.geometry().getCoordinate();
                double along = ((c.x - line.getX1()) * dx + (c.y - line.getY1()) * dy) / len;
                double across = Math.abs((c.x - line.getX1()) * dy - (c.y - line.getY1()) * dx) / len;
                Object v = f.attributes().get(col);
                if (along >= 0 && along <= len && across <= bufferMetres && v instanceof Number num) {
                    hits.add(new double[] {along, num.doubleValue()});
                }
            }
            hits.sort((a, b) -> Double.compare(a[0], b[0]));
            ts.add(new Series(l.name() + " " + col, "nT", hits.stream().mapToDouble(h -> h[0]).toArray(),
                    hits.stream().mapToDouble(h -> h[1]).toArray()));
        }
        return new Profile(len, gs, ts);
    }

    /** The field column of a point layer: one named like a magnetic value, else its first numeric column. */
    static String valueColumn(FeatureLayer l) {
        if (!"Point".equals(l.geometryType())) {
            return null;
        }
        String first = null;
        for (FeatureLayer.Column c : l.columns()) {
            if (c.type() != FeatureLayer.ColumnType.REAL) {
                continue;
            }
            String n = c.name().toLowerCase(Locale.ROOT);
            if (n.contains("mag") || n.contains("field") || n.contains("tmi") || n.contains("nt")) {
                return c.name();
            }
            first = first == null ? c.name() : first;
        }
        return first;
    }
}
