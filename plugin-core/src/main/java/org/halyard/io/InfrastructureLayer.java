package org.halyard.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.halyard.targets.Asset;

/**
 * Reads charted infrastructure (cables, pipelines, wellheads, charted wrecks) from a GeoPackage layer as
 * {@link Asset}s in the survey's CRS, reprojecting when the layer is in another CRS
 * ({@link GeometryReprojector}).
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class InfrastructureLayer {

    /**
     * What reading gave: the assets in the survey CRS and the layer's own CRS.
     *
     * @param assets      the features as assets, x easting and y northing in metres of the survey CRS
     * @param sourceCrs   the layer's CRS code, e.g. {@code EPSG:4326}
     * @param reprojected whether the geometries were reprojected
     */
    public record Result(List<Asset> assets, String sourceCrs, boolean reprojected) {
    }

    private InfrastructureLayer() {
    }

    /**
     * Reads layer {@code layer} of {@code file}, the asset id from column {@code idColumn} (any type; null
     * to use the feature id), reprojected to {@code surveyCrs} (e.g. {@code EPSG:32631}) when needed.
     *
     * @throws IllegalArgumentException on a missing file, layer or column, naming them
     */
    public static Result read(Path file, String layer, String idColumn, String surveyCrs) {
        return of(GeoPackageReader.read(file, layer), file + ": layer " + layer, idColumn, surveyCrs);
    }

    /**
     * As {@link #read} for a layer already read; {@code label} names it in error messages.
     */
    public static Result of(FeatureLayer fl, String label, String idColumn, String surveyCrs) {
        if (idColumn != null) {
            fl.column(idColumn);
        }
        GeometryReprojector rp = new GeometryReprojector(fl.crsCode(), surveyCrs);
        boolean move = !rp.isIdentity();
        List<Asset> assets = new ArrayList<>();
        for (FeatureLayer.Feature f : fl.features()) {
            Object id = idColumn == null ? f.id() : f.attributes().get(idColumn);
            if (id == null || id.toString().isBlank()) {
                throw new IllegalArgumentException(label + ", feature " + f.id()
                        + ": empty asset id in column '" + idColumn + "'");
            }
            assets.add(new Asset(id.toString(), move ? rp.apply(f.geometry()) : f.geometry()));
        }
        return new Result(assets, fl.crsCode(), move);
    }
}
