package org.halyard.io;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.locationtech.jts.geom.Geometry;

/**
 * A named vector layer: JTS geometries in one projected CRS, each with an id and typed attributes. What
 * {@link GeoPackageWriter} writes and {@link GeoPackageReader} reads back.
 *
 * <p>Coordinates are x easting, y northing in metres of {@code crsCode}; geometries are 2-D.
 *
 * @param name         layer (table) name: a letter, then letters, digits or underscores
 * @param geometryType JTS geometry type of every feature: {@code Point}, {@code LineString}, {@code Polygon},
 *                     or {@code Geometry} for a mixture
 * @param crsCode      authority code such as {@code "EPSG:32631"}
 * @param columns      attribute columns, in order; names distinct and not {@code fid} or {@code geom}
 * @param features     the features, in the order they are written
 */
public record FeatureLayer(String name, String geometryType, String crsCode, List<Column> columns,
                           List<Feature> features) {

    /** Attribute types a layer can hold. */
    public enum ColumnType { TEXT, REAL, INTEGER }

    /**
     * One attribute column.
     *
     * @param name column name
     * @param type its type: values are {@link String}, {@link Double} or {@link Long} respectively
     */
    public record Column(String name, ColumnType type) {
        public Column {
            Objects.requireNonNull(type, "column type");
            if (name == null || !name.matches("[A-Za-z][A-Za-z0-9_]*")) {
                throw new IllegalArgumentException("column name must be a letter followed by letters, digits or _, got '"
                        + name + "'");
            }
        }
    }

    /**
     * One feature.
     *
     * @param id         feature id, unique in the layer, positive
     * @param geometry   its JTS geometry (x easting, y northing, metres)
     * @param attributes values by column name; a missing key or null value is written as NULL
     */
    public record Feature(long id, Geometry geometry, Map<String, Object> attributes) {
        public Feature {
            Objects.requireNonNull(geometry, "geometry");
            attributes = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(attributes));
        }
    }

    private static final Set<String> TYPES = Set.of("Point", "LineString", "Polygon", "Geometry");

    public FeatureLayer {
        if (name == null || !name.matches("[A-Za-z][A-Za-z0-9_]*")) {
            throw new IllegalArgumentException("layer name must be a letter followed by letters, digits or _, got '"
                    + name + "'");
        }
        if (!TYPES.contains(geometryType)) {
            throw new IllegalArgumentException("layer " + name + ": geometry type must be one of " + TYPES + ", got "
                    + geometryType);
        }
        Objects.requireNonNull(crsCode, "crsCode");
        columns = List.copyOf(columns);
        features = List.copyOf(features);
        Set<String> seen = new HashSet<>(Set.of("fid", "geom"));
        for (Column c : columns) {
            if (!seen.add(c.name().toLowerCase(java.util.Locale.ROOT))) {
                throw new IllegalArgumentException("layer " + name + ": column name '" + c.name()
                        + "' is repeated or reserved (fid, geom)");
            }
        }
        Set<Long> ids = new HashSet<>();
        for (Feature f : features) {
            if (f.id() < 1 || !ids.add(f.id())) {
                throw new IllegalArgumentException("layer " + name + ": feature id " + f.id() + " is not positive or repeated");
            }
            if (!geometryType.equals("Geometry") && !geometryType.equals(f.geometry().getGeometryType())) {
                throw new IllegalArgumentException("layer " + name + ": feature " + f.id() + " is a "
                        + f.geometry().getGeometryType() + ", the layer holds " + geometryType);
            }
            for (Column c : columns) {
                Object v = f.attributes().get(c.name());
                if (v != null && !expectedClass(c.type()).isInstance(v)) {
                    throw new IllegalArgumentException("layer " + name + ": feature " + f.id() + " column " + c.name()
                            + " needs a " + expectedClass(c.type()).getSimpleName() + ", got " + v.getClass().getSimpleName());
                }
            }
        }
    }

    static Class<?> expectedClass(ColumnType t) {
        return switch (t) {
            case TEXT -> String.class;
            case REAL -> Double.class;
            case INTEGER -> Long.class;
        };
    }

    /** The attribute column called {@code columnName}. */
    public Column column(String columnName) {
        for (Column c : columns) {
            if (c.name().equals(columnName)) {
                return c;
            }
        }
        throw new IllegalArgumentException("layer " + name + " has no column '" + columnName + "'; it has "
                + new ArrayList<>(columns.stream().map(Column::name).toList()));
    }
}
