package org.halyard.io;

import org.geotools.api.referencing.FactoryException;
import org.geotools.api.referencing.crs.ProjectedCRS;
import org.geotools.api.referencing.operation.MathTransform;
import org.geotools.api.referencing.operation.TransformException;
import org.geotools.referencing.CRS;

/**
 * Coordinate transforms between CRSs given by authority code, without GeoTools types in the public
 * signatures: one point at a time ({@link #between}), or in place on plain arrays of millions of points
 * ({@link #transformInPlace}). The one place the package finds a transform; {@link GeometryReprojector}
 * and {@link ProjectedCrs} build on it or on {@link GeoTiffGrids#decode}.
 *
 * <p>Axis order is always easting (or longitude) first: codes are decoded longitude-first
 * ({@link GeoTiffGrids#decode}). Datum shifts are the lenient GeoTools ones (Bursa-Wolf where the EPSG
 * database has them; none otherwise, which is centimetre-to-metre level between WGS 84 realisations).
 *
 * <p><b>Accuracy:</b> that of GeoTools' EPSG projection code, well below a millimetre for UTM
 * (Snyder 1987 formulas).
 *
 * <p><b>Thread safety:</b> stateless; a {@link PointTransform} may be shared, GeoTools math transforms
 * are immutable.
 */
public final class CrsTransforms {

    /** Code of geographic WGS 84, longitude and latitude in degrees. */
    public static final String WGS84 = "EPSG:4326";

    /** Points transformed per call into GeoTools by {@link #transformInPlace}. */
    private static final int CHUNK = 8192;

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

    /**
     * Checks that {@code code} names a projected CRS (metres), as survey processing needs.
     *
     * @throws IllegalArgumentException when it is unknown or geographic
     */
    public static void requireProjected(String code) {
        if (!(GeoTiffGrids.decode(code) instanceof ProjectedCRS)) {
            throw new IllegalArgumentException("CRS '" + code + "' is not a projected CRS; survey processing "
                    + "needs easting/northing in metres (e.g. a UTM zone, EPSG:326nn)");
        }
    }

    /** The transform from {@code fromCode} to {@code toCode}; the identity when they are equal. */
    public static PointTransform between(String fromCode, String toCode) {
        if (fromCode.equalsIgnoreCase(toCode)) {
            return (x, y) -> new double[] {x, y};
        }
        MathTransform t = mathTransform(fromCode, toCode);
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

    /**
     * Replaces the points ({@code x[i]}, {@code y[i]}) in {@code fromCode} by the same points in
     * {@code toCode}, in place: longitudes and latitudes in degrees east and north, eastings and northings
     * in metres.
     *
     * @throws IllegalArgumentException for an unknown code, no transform between the two, or a point the
     *                                  target projection cannot take (naming its index)
     */
    public static void transformInPlace(String fromCode, String toCode, double[] x, double[] y) {
        if (fromCode.equalsIgnoreCase(toCode)) {
            return;
        }
        MathTransform mt = mathTransform(fromCode, toCode);
        double[] buf = new double[2 * CHUNK];
        for (int off = 0; off < x.length; off += CHUNK) {
            int n = Math.min(CHUNK, x.length - off);
            for (int i = 0; i < n; i++) {
                buf[2 * i] = x[off + i];
                buf[2 * i + 1] = y[off + i];
            }
            try {
                mt.transform(buf, 0, buf, 0, n);
            } catch (TransformException e) {
                throw new IllegalArgumentException("cannot transform the points near index " + off + " from "
                        + fromCode + " to " + toCode + ": " + e.getMessage(), e);
            }
            for (int i = 0; i < n; i++) {
                x[off + i] = buf[2 * i];
                y[off + i] = buf[2 * i + 1];
            }
        }
    }

    /** GeoTools' lenient transform between two codes decoded longitude-first. */
    static MathTransform mathTransform(String fromCode, String toCode) {
        try {
            return CRS.findMathTransform(GeoTiffGrids.decode(fromCode), GeoTiffGrids.decode(toCode), true);
        } catch (FactoryException e) {
            throw new IllegalArgumentException("no transform from " + fromCode + " to " + toCode + ": "
                    + e.getMessage(), e);
        }
    }
}
