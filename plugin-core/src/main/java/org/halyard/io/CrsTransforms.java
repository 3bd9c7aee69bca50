package org.halyard.io;

import org.geotools.api.referencing.FactoryException;
import org.geotools.api.referencing.operation.MathTransform;
import org.geotools.api.referencing.operation.TransformException;
import org.geotools.referencing.CRS;

/**
 * Point transforms between two CRSs given by authority code, without GeoTools types in the signature.
 *
 * <p>Axis order is always easting (or longitude) first: codes are decoded longitude-first
 * ({@link GeoTiffGrids#decode}). Datum shifts are the lenient GeoTools ones (Bursa-Wolf where the EPSG
 * database has them).
 *
 * <p><b>Accuracy:</b> that of GeoTools' EPSG projection code, well below a millimetre for UTM
 * (Snyder 1987 formulas).
 *
 * <p><b>Thread safety:</b> a {@link PointTransform} may be shared; GeoTools math transforms are immutable.
 */
public final class CrsTransforms {

    /** Code of geographic WGS 84, longitude and latitude in degrees. */
    public static final String WGS84 = "EPSG:4326";

    private CrsTransforms() {
    }

    /** Maps one point (x, y) to another CRS. */
    @FunctionalInterface
    public interface PointTransform {
        /**
         * The transformed point {@code {x, y}} (easting, northing in metres or longitude, latitude in
         * degrees); {@code {NaN, NaN}} where the point is outside the projection's domain.
         */
        double[] apply(double x, double y);
    }

    /** The transform from {@code fromCode} to {@code toCode}; the identity when they are equal. */
    public static PointTransform between(String fromCode, String toCode) {
        if (fromCode.equalsIgnoreCase(toCode)) {
            return (x, y) -> new double[] {x, y};
        }
        MathTransform mt;
        try {
            mt = CRS.findMathTransform(GeoTiffGrids.decode(fromCode), GeoTiffGrids.decode(toCode), true);
        } catch (FactoryException e) {
            throw new IllegalArgumentException("no transform from " + fromCode + " to " + toCode + ": " + e.getMessage());
        }
        MathTransform t = mt;
        return (x, y) -> {
            double[] p = {x, y};
            try {
                t.transform(p, 0, p, 0, 1);
                return p;
            } catch (TransformException e) {
                return new double[] {Double.NaN, Double.NaN};
            }
        };
    }

    /** The transform from {@code fromCode} to WGS 84 longitude, latitude in degrees. */
    public static PointTransform toLonLat(String fromCode) {
        return between(fromCode, WGS84);
    }
}
