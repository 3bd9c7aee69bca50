package org.halyard.io;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;
import mil.nga.geopackage.BoundingBox;
import mil.nga.geopackage.GeoPackage;
import mil.nga.geopackage.GeoPackageManager;
import mil.nga.geopackage.contents.Contents;
import mil.nga.geopackage.db.GeoPackageDataType;
import mil.nga.geopackage.db.TableColumnKey;
import mil.nga.geopackage.features.columns.GeometryColumns;
import mil.nga.geopackage.features.user.FeatureColumn;
import mil.nga.geopackage.features.user.FeatureDao;
import mil.nga.geopackage.features.user.FeatureRow;
import mil.nga.geopackage.features.user.FeatureTableMetadata;
import mil.nga.geopackage.geom.GeoPackageGeometryData;
import mil.nga.geopackage.srs.SpatialReferenceSystem;
import mil.nga.sf.GeometryType;
import org.geotools.api.referencing.crs.CoordinateReferenceSystem;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.io.WKBWriter;

/**
 * Writes {@link FeatureLayer}s into a new GeoPackage file that GDAL and desktop GIS read.
 *
 * <p><b>Choices:</b> the file declares GeoPackage 1.2 ({@code PRAGMA user_version = 10200}), which GDAL
 * 2.2 and later read without a warning (the library's default, 1.4, makes GDAL 3.6 warn); the EPSG row of
 * {@code gpkg_spatial_ref_sys} is written by us with GeoTools' WKT, because the library refuses to create
 * rows for projected CRSs (STACK.md). Each layer has an integer primary key {@code fid} and a geometry
 * column {@code geom}. No spatial index is written (layers here are small). {@code gpkg_contents.last_change}
 * is set to the caller's instant, so the same layers give the same bytes.
 *
 * <p><b>Thread safety:</b> stateless; concurrent writes to the same file are not supported.
 */
public final class GeoPackageWriter {

    /** GeoPackage 1.2.0 as {@code PRAGMA user_version} encodes it (OGC 12-128r15, section 1.1.1.1.1). */
    public static final int USER_VERSION = 10200;

    private GeoPackageWriter() {
    }

    /**
     * Writes {@code layers} into a new GeoPackage at {@code file}, replacing any existing file.
     *
     * @param file       the {@code .gpkg} file to create
     * @param layers     layers with distinct names; each layer's CRS must be an EPSG code GeoTools knows
     * @param lastChange the time recorded as every layer's last change (pass a fixed instant for
     *                   byte-identical reruns)
     * @throws IllegalArgumentException on a repeated layer name or an unknown CRS code
     * @throws UncheckedIOException when the file cannot be written
     */
    public static void write(Path file, List<FeatureLayer> layers, Instant lastChange) {
        List<String> names = new ArrayList<>();
        for (FeatureLayer l : layers) {
            if (names.contains(l.name())) {
                throw new IllegalArgumentException(file + ": layer name " + l.name() + " is repeated");
            }
            names.add(l.name());
        }
        try {
            Files.deleteIfExists(file);
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            File f = file.toFile();
            GeoPackageManager.create(f);
            GeoPackage gp = GeoPackageManager.open(f);
            try {
                for (FeatureLayer l : layers) {
                    writeLayer(gp, l, file, lastChange);
                }
                gp.execSQL("PRAGMA user_version = " + USER_VERSION);
            } finally {
                gp.close();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), e);
        } catch (java.sql.SQLException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), new IOException(e));
        }
    }

    private static void writeLayer(GeoPackage gp, FeatureLayer layer, Path file, Instant lastChange)
            throws IOException, java.sql.SQLException {
        long srsId = spatialReference(gp, layer.crsCode(), file);
        GeometryColumns gc = new GeometryColumns();
        gc.setId(new TableColumnKey(layer.name(), "geom"));
        gc.setGeometryType(GeometryType.fromName(layer.geometryType().toUpperCase(java.util.Locale.ROOT)));
        gc.setZ((byte) 0);
        gc.setM((byte) 0);
        gc.setSrsId(srsId);
        List<FeatureColumn> cols = new ArrayList<>();
        for (FeatureLayer.Column c : layer.columns()) {
            cols.add(FeatureColumn.createColumn(c.name(), switch (c.type()) {
                case TEXT -> GeoPackageDataType.TEXT;
                case REAL -> GeoPackageDataType.DOUBLE;
                case INTEGER -> GeoPackageDataType.INTEGER;
            }));
        }
        gp.createFeatureTable(FeatureTableMetadata.create(gc, "fid", cols, bounds(layer)));
        FeatureDao dao = gp.getFeatureDao(layer.name());
        dao.setPkModifiable(true); // our ids are the features' ids, not SQLite's row counter
        WKBWriter wkb = new WKBWriter(2);
        gp.beginTransaction();
        try {
            for (FeatureLayer.Feature feature : layer.features()) {
                FeatureRow row = dao.newRow();
                row.setId(feature.id());
                GeoPackageGeometryData g = GeoPackageGeometryData.createFromWkbAndBuildEnvelope(srsId,
                        wkb.write(feature.geometry()));
                row.setGeometry(g);
                for (FeatureLayer.Column c : layer.columns()) {
                    row.setValue(c.name(), feature.attributes().get(c.name()));
                }
                dao.insert(row);
            }
            gp.endTransaction(true);
        } catch (RuntimeException e) {
            gp.endTransaction(false);
            throw e;
        }
        Contents contents = gp.getContentsDao().queryForId(layer.name());
        contents.setLastChange(Date.from(lastChange));
        contents.setIdentifier(layer.name());
        gp.getContentsDao().update(contents);
    }

    private static BoundingBox bounds(FeatureLayer layer) {
        Envelope e = new Envelope();
        for (FeatureLayer.Feature f : layer.features()) {
            e.expandToInclude(f.geometry().getEnvelopeInternal());
        }
        return e.isNull() ? new BoundingBox(0, 0, 0, 0) : new BoundingBox(e.getMinX(), e.getMinY(), e.getMaxX(), e.getMaxY());
    }

    /** The srs_id for an EPSG code, creating its row (definition = GeoTools WKT) when absent. */
    private static long spatialReference(GeoPackage gp, String crsCode, Path file) throws java.sql.SQLException {
        String[] parts = crsCode.split(":");
        if (parts.length != 2 || !parts[0].equalsIgnoreCase("EPSG") || !parts[1].matches("\\d+")) {
            throw new IllegalArgumentException(file + ": CRS must be an EPSG code such as EPSG:32631, got '" + crsCode + "'");
        }
        long code = Long.parseLong(parts[1]);
        var dao = gp.getSpatialReferenceSystemDao();
        if (dao.queryForId(code) != null) {
            return code;
        }
        CoordinateReferenceSystem crs;
        try {
            crs = GeoTiffGrids.decode("EPSG:" + code);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(file + ": " + e.getMessage(), e);
        }
        SpatialReferenceSystem srs = new SpatialReferenceSystem();
        srs.setSrsId(code);
        srs.setSrsName(crs.getName().getCode());
        srs.setOrganization("EPSG");
        srs.setOrganizationCoordsysId(code);
        srs.setDefinition(crs.toWKT());
        dao.create(srs);
        return code;
    }
}
