package org.halyard.process;

import org.geotools.api.feature.simple.SimpleFeature;
import org.geotools.api.referencing.crs.CoordinateReferenceSystem;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.data.simple.SimpleFeatureIterator;
import org.halyard.gridding.GriddingOptions;
import org.halyard.io.GeoTiffGrids;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;

/**
 * What the gridding processes share: point features to plain arrays, and options from nullable
 * parameters.
 */
final class GriddingProcessSupport {

    private GriddingProcessSupport() {
    }

    /** Coordinates (metres of the layer's projected CRS) and named numeric attributes of point features. */
    record Points(double[] x, double[] y, double[][] values, String crsCode) {
    }

    /**
     * Reads point features; a missing, empty or non-numeric attribute becomes NaN (skipped and counted by the
     * gridder).
     *
     * @throws IllegalArgumentException for a missing layer or attribute, or a geometry that is not a point
     */
    static Points points(SimpleFeatureCollection features, String... attributes) {
        if (features == null) {
            throw new IllegalArgumentException("the input point layer 'features' is required");
        }
        for (String a : attributes) {
            if (a == null || features.getSchema().getDescriptor(a) == null) {
                throw new IllegalArgumentException("the point layer has no attribute '" + a + "'");
            }
        }
        CoordinateReferenceSystem crs = features.getSchema().getCoordinateReferenceSystem();
        if (crs == null) {
            throw new IllegalArgumentException("the point layer has no coordinate reference system");
        }
        int n = features.size();
        double[] x = new double[n], y = new double[n];
        double[][] v = new double[attributes.length][n];
        int i = 0;
        try (SimpleFeatureIterator it = features.features()) {
            while (it.hasNext() && i < n) {
                SimpleFeature f = it.next();
                Object g = f.getDefaultGeometry();
                if (!(g instanceof Point p)) {
                    throw new IllegalArgumentException("feature " + f.getID() + ": expected a point, got "
                            + (g == null ? "no geometry" : ((Geometry) g).getGeometryType()));
                }
                x[i] = p.getX();
                y[i] = p.getY();
                for (int a = 0; a < attributes.length; a++) {
                    v[a][i] = f.getAttribute(attributes[a]) instanceof Number num ? num.doubleValue() : Double.NaN;
                }
                i++;
            }
        }
        return new Points(x, y, v, GeoTiffGrids.codeOf(crs));
    }

    /** Options from nullable process parameters: tension (0..1), blanking distance in metres (null: automatic). */
    static GriddingOptions options(Double tension, Double blankDistance) {
        GriddingOptions o = GriddingOptions.defaults();
        if (tension != null) {
            o = o.withTension(tension);
        }
        if (blankDistance != null) {
            o = o.withBlankDistance(blankDistance);
        }
        return o;
    }
}
