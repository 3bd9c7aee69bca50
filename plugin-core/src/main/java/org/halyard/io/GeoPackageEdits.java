package org.halyard.io;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import mil.nga.geopackage.GeoPackage;
import mil.nga.geopackage.GeoPackageManager;
import mil.nga.geopackage.db.GeoPackageDataType;
import mil.nga.geopackage.features.user.FeatureColumn;
import mil.nga.geopackage.features.user.FeatureDao;
import mil.nga.geopackage.features.user.FeatureRow;

/**
 * Writes edited attribute values of single features back into a GeoPackage layer, for interpretation
 * fields (class, confidence, note) an analyst sets in the workbench.
 *
 * <p>A column that does not exist yet is added (TEXT for strings, REAL for numbers), so a targets layer
 * written by the pipeline gains the interpretation columns on first edit. Geometries are never touched.
 *
 * <p><b>Thread safety:</b> one writer per file at a time (SQLite locking); calls are short transactions.
 */
public final class GeoPackageEdits {

    private GeoPackageEdits() {
    }

    /**
     * Sets {@code values} (column name to String, Double, Long or null) on feature {@code id} of {@code layer}.
     *
     * @throws IllegalArgumentException naming file, layer and id when the file, layer or feature is missing
     */
    public static void update(Path file, String layer, long id, Map<String, Object> values) {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException(file + ": GeoPackage file does not exist");
        }
        GeoPackage gp = GeoPackageManager.open(file.toFile(), true);
        try {
            if (!gp.getFeatureTables().contains(layer)) {
                throw new IllegalArgumentException(file + ": no feature layer '" + layer + "'");
            }
            FeatureDao dao = gp.getFeatureDao(layer);
            for (Map.Entry<String, Object> e : values.entrySet()) {
                if (!dao.getTable().hasColumn(e.getKey())) {
                    GeoPackageDataType t = e.getValue() instanceof Number ? GeoPackageDataType.REAL : GeoPackageDataType.TEXT;
                    dao.addColumn(FeatureColumn.createColumn(e.getKey(), t));
                }
            }
            FeatureRow row = dao.queryForIdRow(id);
            if (row == null) {
                throw new IllegalArgumentException(file + ": layer " + layer + " has no feature " + id);
            }
            values.forEach(row::setValue);
            dao.update(row);
        } finally {
            gp.close();
        }
    }
}
