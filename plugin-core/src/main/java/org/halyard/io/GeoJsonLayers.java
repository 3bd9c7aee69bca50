package org.halyard.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Geometry;

/**
 * Reads a GeoJSON FeatureCollection (RFC 7946) into a {@link FeatureLayer}.
 *
 * <p>The CRS is WGS 84 longitude/latitude as RFC 7946 says, unless the file carries the older
 * {@code "crs": {"type": "name", "properties": {"name": "EPSG:32631"}}} member (also in the
 * {@code urn:ogc:def:crs:EPSG::32631} form), which is honoured. Property columns are REAL where every
 * non-null value is a number, else TEXT. Feature ids are the 1-based position in the file.
 *
 * <p><b>Limitations:</b> reads the whole file into memory; nested property objects become their JSON text.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class GeoJsonLayers {

    private GeoJsonLayers() {
    }

    /**
     * Reads {@code file}; the layer is named after the file.
     *
     * @throws IllegalArgumentException naming the file for a missing file, a document that is not a
     *     FeatureCollection, or a feature without a readable geometry (with its position)
     */
    public static FeatureLayer read(Path file) {
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(Files.readString(file));
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot read GeoJSON: " + e.getMessage(), e);
        }
        if (root == null || !"FeatureCollection".equals(root.path("type").asText())) {
            throw new IllegalArgumentException(file + ": not a GeoJSON FeatureCollection");
        }
        List<Geometry> geoms = new ArrayList<>();
        List<Map<String, Object>> props = new ArrayList<>();
        int n = 0;
        for (JsonNode f : root.path("features")) {
            n++;
            try {
                geoms.add(GeoJsonGeometries.read(f.path("geometry")));
            } catch (RuntimeException e) {
                throw new IllegalArgumentException(file + ": feature " + n + " has no readable geometry: " + e.getMessage());
            }
            Map<String, Object> p = new LinkedHashMap<>();
            f.path("properties").fields().forEachRemaining(en -> p.put(en.getKey(), value(en.getValue())));
            props.add(p);
        }
        return FeatureTables.build(LayerNames.of(file), crsOf(root), geoms, props);
    }

    private static Object value(JsonNode v) {
        if (v.isNull()) {
            return null;
        }
        return v.isNumber() ? (Object) v.asDouble() : v.isTextual() ? v.asText() : v.toString();
    }

    static String crsOf(JsonNode root) {
        String name = root.path("crs").path("properties").path("name").asText("");
        if (name.isEmpty()) {
            return CrsTransforms.WGS84;
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("EPSG:+(\\d+)$").matcher(name.toUpperCase(java.util.Locale.ROOT));
        if (m.find()) {
            String code = "EPSG:" + m.group(1);
            // CRS84 (lon/lat) is what the legacy "crs" member usually names
            return code.equals("EPSG:4326") || name.toUpperCase(java.util.Locale.ROOT).contains("CRS84") ? CrsTransforms.WGS84 : code;
        }
        return name.toUpperCase(java.util.Locale.ROOT).contains("CRS84") ? CrsTransforms.WGS84 : name;
    }
}
