package org.halyard.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Geometry;

/**
 * Builds a {@link FeatureLayer} from geometries and loosely typed attribute maps, as text formats give
 * them: a column is REAL when every non-null value is a number (or a text that parses as one), else TEXT.
 * Shared by {@link GeoJsonLayers} and {@link CsvPointLayers}.
 */
final class FeatureTables {

    private FeatureTables() {
    }

    static FeatureLayer build(String name, String crs, List<Geometry> geoms, List<Map<String, Object>> props) {
        Set<String> keys = new LinkedHashSet<>();
        props.forEach(p -> keys.addAll(p.keySet()));
        List<FeatureLayer.Column> columns = new ArrayList<>();
        Map<String, String> safe = new LinkedHashMap<>();
        for (String k : keys) {
            String s = k.replaceAll("[^A-Za-z0-9_]", "_");
            if (s.isEmpty() || !Character.isLetter(s.charAt(0))) {
                s = "f_" + s;
            }
            if (s.equalsIgnoreCase("fid") || s.equalsIgnoreCase("geom") || safe.containsValue(s)) {
                s = s + "_" + (safe.size() + 1);
            }
            safe.put(k, s);
            columns.add(new FeatureLayer.Column(s, allNumeric(props, k) ? FeatureLayer.ColumnType.REAL
                    : FeatureLayer.ColumnType.TEXT));
        }
        String type = null;
        List<FeatureLayer.Feature> features = new ArrayList<>();
        for (int i = 0; i < geoms.size(); i++) {
            Geometry g = geoms.get(i);
            type = type == null || type.equals(g.getGeometryType()) ? g.getGeometryType() : "Geometry";
            Map<String, Object> attrs = new LinkedHashMap<>();
            for (FeatureLayer.Column c : columns) {
                String key = keyFor(safe, c.name());
                Object v = props.get(i).get(key);
                attrs.put(c.name(), v == null ? null : c.type() == FeatureLayer.ColumnType.REAL
                        ? (Object) toDouble(v) : v.toString());
            }
            features.add(new FeatureLayer.Feature(i + 1, g, attrs));
        }
        String layerType = type == null || !Set.of("Point", "LineString", "Polygon").contains(type) ? "Geometry" : type;
        return new FeatureLayer(name, layerType, crs, columns, features);
    }

    private static String keyFor(Map<String, String> safe, String column) {
        for (Map.Entry<String, String> e : safe.entrySet()) {
            if (e.getValue().equals(column)) {
                return e.getKey();
            }
        }
        throw new IllegalStateException("column " + column + " has no source key");
    }

    private static boolean allNumeric(List<Map<String, Object>> props, String key) {
        boolean any = false;
        for (Map<String, Object> p : props) {
            Object v = p.get(key);
            if (v == null || (v instanceof String s && s.isBlank())) {
                continue;
            }
            if (Double.isNaN(toDouble(v)) && !"NaN".equals(v.toString())) {
                return false;
            }
            any = true;
        }
        return any;
    }

    private static double toDouble(Object v) {
        if (v instanceof Number n) {
            return n.doubleValue();
        }
        try {
            return Double.parseDouble(v.toString().trim());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
