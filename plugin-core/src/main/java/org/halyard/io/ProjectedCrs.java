package org.halyard.io;

import org.geotools.api.referencing.FactoryException;
import org.geotools.api.referencing.crs.CoordinateReferenceSystem;
import org.geotools.api.referencing.crs.ProjectedCRS;
import org.geotools.api.referencing.operation.MathTransform;
import org.geotools.api.referencing.operation.TransformException;

/**
 * Facts about a projected CRS that map sheets print and draw, with GeoTools kept inside: names, datum,
 * axis unit, the conversion to and from geographic coordinates on the CRS's own datum, and the grid
 * convergence.
 *
 * <p><b>Algorithm:</b> the projection's own conversion from its base geographic CRS (GeoTools
 * referencing, EPSG database; decoded by {@link GeoTiffGrids#decode}, the package's one decoder). Grid
 * convergence is found numerically: the point is moved 1e-4 degree north and south along its meridian and
 * the direction of that chord in grid coordinates gives the angle between true north and grid north.
 *
 * <p><b>Accuracy:</b> convergence to about 1e-6 degree (the finite step; checked against PROJ's
 * {@code proj -V} in the test). Coordinates as exact as the GeoTools projection.
 *
 * <p><b>Limitations:</b> projected CRSs only; no datum shift: latitudes and longitudes are on the CRS's
 * own datum, which the sheets state.
 *
 * <p><b>Thread safety:</b> immutable after construction; GeoTools math transforms are thread safe.
 */
public final class ProjectedCrs {

    /** Step along the meridian for the convergence, degrees of latitude. */
    private static final double MERIDIAN_STEP_DEG = 1e-4;

    private final String code;
    private final ProjectedCRS crs;
    private final MathTransform toProjected;
    private final MathTransform toGeographic;

    private ProjectedCrs(String code, ProjectedCRS crs) throws FactoryException {
        this.code = code;
        this.crs = crs;
        this.toProjected = crs.getConversionFromBase().getMathTransform();
        try {
            this.toGeographic = toProjected.inverse();
        } catch (org.geotools.api.referencing.operation.NoninvertibleTransformException e) {
            throw new IllegalArgumentException("projection of " + code + " cannot be inverted", e);
        }
    }

    /**
     * Decodes an authority code such as {@code "EPSG:32631"}; longitude is taken as the first geographic axis.
     *
     * @throws IllegalArgumentException when the code is unknown or not a projected CRS
     */
    public static ProjectedCrs decode(String code) {
        if (code == null || code.isBlank()) {
            throw new IllegalArgumentException("no CRS given: pass an EPSG code such as EPSG:32631");
        }
        CoordinateReferenceSystem c = GeoTiffGrids.decode(code);
        if (!(c instanceof ProjectedCRS p)) {
            throw new IllegalArgumentException(code + " is not a projected CRS: sheets need easting and"
                    + " northing in metres (for example a UTM zone)");
        }
        try {
            return new ProjectedCrs(code.trim(), p);
        } catch (FactoryException e) {
            throw new IllegalArgumentException("projection of " + code + " is not usable: " + e.getMessage(), e);
        }
    }

    /** The code this was decoded from, e.g. {@code EPSG:32631}. */
    public String code() {
        return code;
    }

    /** The CRS name, e.g. {@code WGS 84 / UTM zone 31N}. */
    public String name() {
        return crs.getName().getCode();
    }

    /** The geodetic datum name, e.g. {@code World Geodetic System 1984}. */
    public String datum() {
        return crs.getDatum().getName().getCode();
    }

    /** The ellipsoid name, e.g. {@code WGS 84}. */
    public String ellipsoid() {
        return crs.getDatum().getEllipsoid().getName().getCode();
    }

    /** The unit of the easting axis, e.g. {@code m}. */
    public String axisUnit() {
        return String.valueOf(crs.getCoordinateSystem().getAxis(0).getUnit());
    }

    /**
     * Geographic coordinates of a grid point on the CRS's own datum.
     *
     * @param x easting, metres
     * @param y northing, metres
     * @return {@code {longitude, latitude}} in degrees, east and north positive
     */
    public double[] toLonLat(double x, double y) {
        return apply(toGeographic, x, y);
    }

    /**
     * Grid coordinates of a geographic point on the CRS's own datum.
     *
     * @param lon longitude, degrees east
     * @param lat latitude, degrees north
     * @return {@code {easting, northing}} in metres
     */
    public double[] fromLonLat(double lon, double lat) {
        return apply(toProjected, lon, lat);
    }

    /**
     * Grid convergence at a grid point: the angle from true north to grid north, degrees, positive when grid
     * north lies east (clockwise) of true north, as in the northern hemisphere east of a transverse Mercator
     * central meridian.
     *
     * @param x easting, metres
     * @param y northing, metres
     */
    public double convergenceDeg(double x, double y) {
        double[] ll = toLonLat(x, y);
        double[] up = fromLonLat(ll[0], ll[1] + MERIDIAN_STEP_DEG);
        double[] down = fromLonLat(ll[0], ll[1] - MERIDIAN_STEP_DEG);
        // A central difference, so the meridian's curvature in the grid cancels to first order.
        double dx = up[0] - down[0];
        double dy = up[1] - down[1];
        // True north points dx, dy in the grid; grid north is clockwise from it by the returned angle.
        return Math.toDegrees(Math.atan2(-dx, dy));
    }

    private double[] apply(MathTransform t, double a, double b) {
        double[] out = new double[2];
        try {
            t.transform(new double[] {a, b}, 0, out, 0, 1);
        } catch (TransformException e) {
            throw new IllegalArgumentException("point (" + a + ", " + b + ") cannot be transformed in " + code
                    + ": " + e.getMessage(), e);
        }
        return out;
    }
}
