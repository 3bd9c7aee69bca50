package org.halyard.io;

import org.geotools.api.referencing.operation.MathTransform;
import org.geotools.api.referencing.operation.TransformException;
import org.geotools.geometry.jts.JTS;
import org.locationtech.jts.geom.Geometry;

/**
 * Reprojects JTS geometries between two CRSs given by authority code, for layers (infrastructure charts)
 * delivered in another CRS than the survey's.
 *
 * <p><b>Algorithm:</b> GeoTools {@code CRS.findMathTransform} between the two CRSs decoded with x first
 * (longitude, easting) whatever the authority's axis order, applied to every coordinate by
 * {@code JTS.transform}; lenient datum shift, so a missing Bursa-Wolf parameter set gives the
 * null-shift result rather than a failure.
 *
 * <p><b>Accuracy:</b> that of the GeoTools referencing engine and the EPSG database it carries
 * (millimetres for UTM from geographic WGS 84).
 *
 * <p><b>Thread safety:</b> immutable; the transform is found once in the constructor.
 */
public final class GeometryReprojector {

    private final MathTransform transform;
    private final String from;
    private final String to;

    /**
     * @param fromCode source CRS, for example {@code "EPSG:4326"} (coordinates longitude, latitude in degrees)
     * @param toCode   target CRS, for example {@code "EPSG:32631"} (easting, northing in metres)
     */
    public GeometryReprojector(String fromCode, String toCode) {
        this.from = fromCode;
        this.to = toCode;
        this.transform = CrsTransforms.mathTransform(fromCode, toCode);
    }

    /** {@code g} in the target CRS (x first: easting or longitude). */
    public Geometry apply(Geometry g) {
        try {
            return JTS.transform(g, transform);
        } catch (TransformException e) {
            throw new IllegalArgumentException("cannot reproject a geometry from " + from + " to " + to + ": "
                    + e.getMessage(), e);
        }
    }

    /** Whether the two codes name the same CRS, so that nothing needs doing. */
    public boolean isIdentity() {
        return transform.isIdentity();
    }
}
