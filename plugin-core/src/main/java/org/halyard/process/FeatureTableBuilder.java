package org.halyard.process;

import java.util.ArrayList;
import java.util.List;
import org.geotools.api.feature.simple.SimpleFeature;
import org.geotools.api.feature.simple.SimpleFeatureType;
import org.geotools.api.referencing.crs.CoordinateReferenceSystem;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.collection.ListFeatureCollection;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.feature.simple.SimpleFeatureBuilder;
import org.geotools.feature.simple.SimpleFeatureTypeBuilder;
import org.halyard.grid.Grid;
import org.halyard.io.GeoTiffGrids;
import org.locationtech.jts.geom.Geometry;

/**
 * Builds the feature collections the target processes return: one geometry column ({@code geom}) in the
 * input grid's CRS and named attribute columns, filled row by row. One builder serves every process that
 * returns points or lines.
 */
final class FeatureTableBuilder {

    private final SimpleFeatureType type;
    private final List<SimpleFeature> rows = new ArrayList<>();

    /**
     * @param attributes alternating names and classes: {@code "depth_m", Double.class, ...}
     */
    FeatureTableBuilder(String name, Class<? extends Geometry> geometry, CoordinateReferenceSystem crs,
                        Object... attributes) {
        SimpleFeatureTypeBuilder b = new SimpleFeatureTypeBuilder();
        b.setName(name);
        b.setCRS(crs);
        b.add("geom", geometry);
        for (int i = 0; i < attributes.length; i += 2) {
            b.add((String) attributes[i], (Class<?>) attributes[i + 1]);
        }
        type = b.buildFeatureType();
    }

    /** Adds a row: the geometry then the attribute values in the declared order. */
    void add(Geometry g, Object... values) {
        SimpleFeatureBuilder fb = new SimpleFeatureBuilder(type);
        fb.add(g);
        for (Object v : values) {
            fb.add(v);
        }
        rows.add(fb.buildFeature(type.getTypeName() + "." + (rows.size() + 1)));
    }

    SimpleFeatureCollection build() {
        return new ListFeatureCollection(type, rows);
    }

    /** The coverage as a grid, its nodata value read as blank; refuses a missing input by name. */
    static Grid grid(GridCoverage2D coverage, String parameter) {
        if (coverage == null) {
            throw new IllegalArgumentException("the input grid '" + parameter + "' is required");
        }
        var nd = org.geotools.coverage.util.CoverageUtilities.getNoDataProperty(coverage);
        return GeoTiffGrids.fromCoverage(coverage, nd == null ? null : nd.getAsSingleValue(), parameter);
    }

    /** {@code v}, or {@code fallback} when null. */
    static double or(Double v, double fallback) {
        return v == null ? fallback : v;
    }
}
