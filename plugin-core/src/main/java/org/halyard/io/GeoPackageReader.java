package org.halyard.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import mil.nga.geopackage.GeoPackage;
import mil.nga.geopackage.GeoPackageManager;
import mil.nga.geopackage.features.user.FeatureColumn;
import mil.nga.geopackage.features.user.FeatureDao;
import mil.nga.geopackage.features.user.FeatureResultSet;
import mil.nga.geopackage.features.user.FeatureRow;
import mil.nga.geopackage.geom.GeoPackageGeometryData;
import mil.nga.geopackage.srs.SpatialReferenceSystem;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;

/**
 * Reads vector layers of a GeoPackage (ours, GDAL's, or a GIS's) into {@link FeatureLayer}s.
 *
 * <p>Attribute columns of SQLite type TEXT become {@code TEXT}; REAL, DOUBLE and FLOAT become {@code REAL}
 * ({@link Double}); INTEGER, INT, MEDIUMINT, SMALLINT, TINYINT and BOOLEAN become {@code INTEGER}
 * ({@link Long}). Other column types (BLOB, DATE, DATETIME) are left out. Geometries with Z or M are read
 * as given; point, line and polygon layers keep their type, every other declared type reads as
 * {@code Geometry}.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class GeoPackageReader {

    private GeoPackageReader() {
    }

    /** Names of the feature layers in {@code file}, in the file's order. */
    public static List<String> layerNames(Path file) {
        GeoPackage gp = open(file);
        try {
            return List.copyOf(gp.getFeatureTables());
        } finally {
            gp.close();
        }
    }

    /**
     * Reads the feature layer {@code layer} of {@code file}: features ordered by id, CRS as
     * {@code ORGANIZATION:code} (for example {@code EPSG:32631}).
     *
     * @throws IllegalArgumentException when the file is missing or has no such feature layer
     * @throws UncheckedIOException     on a geometry that cannot be decoded
     */
    public static FeatureLayer read(Path file, String layer) {
        GeoPackage gp = open(file);
        try {
            if (!gp.getFeatureTables().contains(layer)) {
                throw new IllegalArgumentException(file + ": no feature layer '" + layer + "'; it has "
                        + gp.getFeatureTables());
            }
            FeatureDao dao = gp.getFeatureDao(layer);
            SpatialReferenceSystem srs = dao.getSrs();
            String crs = srs.getOrganization().toUpperCase(Locale.ROOT) + ":" + srs.getOrganizationCoordsysId();
            String geomCol = dao.getGeometryColumnName();
            List<FeatureLayer.Column> columns = new ArrayList<>();
            for (FeatureColumn c : dao.getTable().getColumns()) {
                if (c.isPrimaryKey() || c.getName().equals(geomCol)) {
                    continue;
                }
                FeatureLayer.ColumnType t = typeOf(c);
                if (t != null) {
                    columns.add(new FeatureLayer.Column(c.getName(), t));
                }
            }
            List<FeatureLayer.Feature> features = new ArrayList<>();
            WKBReader wkb = new WKBReader();
            FeatureResultSet rs = dao.queryForAll();
            try {
                while (rs.moveToNext()) {
                    FeatureRow row = rs.getRow();
                    GeoPackageGeometryData g = row.getGeometry();
                    if (g == null || g.isEmpty()) {
                        throw new IllegalArgumentException(file + ": layer " + layer + " feature " + row.getId()
                                + " has no geometry");
                    }
                    Geometry geometry = wkb.read(g.getWkb());
                    Map<String, Object> attrs = new LinkedHashMap<>();
                    for (FeatureLayer.Column c : columns) {
                        attrs.put(c.name(), normalise(row.getValue(c.name()), c.type()));
                    }
                    features.add(new FeatureLayer.Feature(row.getId(), geometry, attrs));
                }
            } finally {
                rs.close();
            }
            features.sort(java.util.Comparator.comparingLong(FeatureLayer.Feature::id));
            return new FeatureLayer(layer, geometryType(dao.getGeometryType().getName()), crs, columns, features);
        } catch (IOException | ParseException e) {
            throw new UncheckedIOException(file + ": layer " + layer + ": " + e.getMessage(),
                    e instanceof IOException io ? io : new IOException(e));
        } finally {
            gp.close();
        }
    }

    private static GeoPackage open(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException(file + ": GeoPackage file does not exist");
        }
        return GeoPackageManager.open(file.toFile(), false);
    }

    private static FeatureLayer.ColumnType typeOf(FeatureColumn c) {
        return switch (c.getDataType()) {
            case TEXT -> FeatureLayer.ColumnType.TEXT;
            case REAL, DOUBLE, FLOAT -> FeatureLayer.ColumnType.REAL;
            case INTEGER, INT, MEDIUMINT, SMALLINT, TINYINT, BOOLEAN -> FeatureLayer.ColumnType.INTEGER;
            default -> null;
        };
    }

    private static Object normalise(Object v, FeatureLayer.ColumnType t) {
        if (v == null) {
            return null;
        }
        return switch (t) {
            case TEXT -> v.toString();
            case REAL -> ((Number) v).doubleValue();
            case INTEGER -> v instanceof Boolean b ? (b ? 1L : 0L) : ((Number) v).longValue();
        };
    }

    private static String geometryType(String gpkgName) {
        return switch (gpkgName.toUpperCase(Locale.ROOT)) {
            case "POINT" -> "Point";
            case "LINESTRING" -> "LineString";
            case "POLYGON" -> "Polygon";
            default -> "Geometry";
        };
    }
}
