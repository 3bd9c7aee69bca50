package org.halyard.io;

import com.fasterxml.jackson.databind.JsonNode;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

/**
 * GeoJSON geometry objects (RFC 7946 section 3.1) to JTS: Point, MultiPoint, LineString,
 * MultiLineString, Polygon, MultiPolygon and GeometryCollection; 2-D (a third ordinate is dropped).
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class GeoJsonGeometries {

    private static final GeometryFactory GF = new GeometryFactory();

    private GeoJsonGeometries() {
    }

    /** @throws IllegalArgumentException for an unknown type or malformed coordinates */
    static Geometry read(JsonNode g) {
        String type = g.path("type").asText("");
        JsonNode c = g.path("coordinates");
        return switch (type) {
            case "Point" -> point(c);
            case "MultiPoint" -> GF.createMultiPoint(map(c, Point[]::new, GeoJsonGeometries::point));
            case "LineString" -> line(c);
            case "MultiLineString" -> GF.createMultiLineString(map(c, LineString[]::new, GeoJsonGeometries::line));
            case "Polygon" -> polygon(c);
            case "MultiPolygon" -> GF.createMultiPolygon(map(c, Polygon[]::new, GeoJsonGeometries::polygon));
            case "GeometryCollection" -> GF.createGeometryCollection(
                    map(g.path("geometries"), Geometry[]::new, GeoJsonGeometries::read));
            default -> throw new IllegalArgumentException("unknown geometry type '" + type + "'");
        };
    }

    private static <T> T[] map(JsonNode arr, java.util.function.IntFunction<T[]> make,
                               java.util.function.Function<JsonNode, T> f) {
        T[] out = make.apply(arr.size());
        for (int i = 0; i < out.length; i++) {
            out[i] = f.apply(arr.get(i));
        }
        return out;
    }

    private static Coordinate coord(JsonNode p) {
        if (p.size() < 2 || !p.get(0).isNumber() || !p.get(1).isNumber()) {
            throw new IllegalArgumentException("position " + p + " is not [x, y]");
        }
        return new Coordinate(p.get(0).asDouble(), p.get(1).asDouble());
    }

    private static Point point(JsonNode c) {
        return GF.createPoint(coord(c));
    }

    private static LineString line(JsonNode c) {
        return GF.createLineString(map(c, Coordinate[]::new, GeoJsonGeometries::coord));
    }

    private static Polygon polygon(JsonNode c) {
        LinearRing[] rings = map(c, LinearRing[]::new, r -> GF.createLinearRing(map(r, Coordinate[]::new,
                GeoJsonGeometries::coord)));
        if (rings.length == 0) {
            return GF.createPolygon();
        }
        return GF.createPolygon(rings[0], java.util.Arrays.copyOfRange(rings, 1, rings.length));
    }
}
