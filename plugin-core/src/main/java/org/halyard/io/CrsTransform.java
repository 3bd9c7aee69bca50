package org.halyard.io;

import org.geotools.api.referencing.FactoryException;
import org.geotools.api.referencing.crs.CoordinateReferenceSystem;
import org.geotools.api.referencing.crs.ProjectedCRS;
import org.geotools.api.referencing.operation.MathTransform;
import org.geotools.api.referencing.operation.TransformException;
import org.geotools.referencing.CRS;

/**
 * WGS 84 longitude/latitude to a projected CRS, in place on plain arrays of millions of points, through
 * GeoTools referencing ({@code CRS.findMathTransform}) in chunks; {@link CrsTransforms} is the one-point
 * form for everything else.
 *
 * <p><b>Accuracy:</b> that of the GeoTools projection (millimetres for UTM); no datum shift is applied
 * beyond what GeoTools finds between WGS 84 and the target datum (lenient: none when no Bursa-Wolf
 * parameters are known, which is centimetre-to-metre level for WGS 84 realisations).
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class CrsTransform {

    private static final int CHUNK = 8192;

    private CrsTransform() {
    }

    /**
     * Decodes a CRS code such as {@code EPSG:32631}, axis order easting/northing (longitude first); the one
     * decoder of the package, {@link GeoTiffGrids#decode}.
     *
     * @throws IllegalArgumentException naming the code when it is unknown
     */
    public static CoordinateReferenceSystem decode(String code) {
        return GeoTiffGrids.decode(code);
    }

    /**
     * Checks that {@code code} names a projected CRS (metres), as survey processing needs.
     *
     * @throws IllegalArgumentException when it is unknown or geographic
     */
    public static void requireProjected(String code) {
        if (!(decode(code) instanceof ProjectedCRS)) {
            throw new IllegalArgumentException("CRS '" + code + "' is not a projected CRS; survey processing "
                    + "needs easting/northing in metres (e.g. a UTM zone, EPSG:326nn)");
        }
    }

    /**
     * Replaces longitudes (degrees east) in {@code xLon} by eastings and latitudes (degrees north) in
     * {@code yLat} by northings of the projected CRS {@code code}, metres.
     *
     * @throws IllegalArgumentException for an unknown or non-projected CRS, or a point it cannot project
     */
    public static void geographicToProjected(String code, double[] xLon, double[] yLat) {
        requireProjected(code);
        MathTransform mt;
        try {
            mt = CRS.findMathTransform(decode(CrsTransforms.WGS84), decode(code), true);
        } catch (FactoryException e) {
            throw new IllegalArgumentException("no transformation from WGS 84 to " + code + ": " + e.getMessage(), e);
        }
        double[] buf = new double[2 * CHUNK];
        for (int off = 0; off < xLon.length; off += CHUNK) {
            int n = Math.min(CHUNK, xLon.length - off);
            for (int i = 0; i < n; i++) {
                buf[2 * i] = xLon[off + i];
                buf[2 * i + 1] = yLat[off + i];
            }
            try {
                mt.transform(buf, 0, buf, 0, n);
            } catch (TransformException e) {
                throw new IllegalArgumentException("cannot project longitude/latitude near row " + off + " to "
                        + code + ": " + e.getMessage(), e);
            }
            for (int i = 0; i < n; i++) {
                xLon[off + i] = buf[2 * i];
                yLat[off + i] = buf[2 * i + 1];
            }
        }
    }
}
