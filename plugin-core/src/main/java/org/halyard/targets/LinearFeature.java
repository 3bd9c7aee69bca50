package org.halyard.targets;

import java.util.Optional;
import org.locationtech.jts.geom.LineString;

/**
 * A cable, pipeline or chain seen as a ridge of the analytic signal.
 *
 * @param id        1-based number in the order found
 * @param line      the polyline, x easting and y northing in the grid's CRS, m
 * @param amplitude median analytic signal on the ridge cells, nT/m
 * @param depth     median Euler depth (structural index 2) below the observation level, m, positive down;
 *                  {@code NaN} when no window gave an accepted solution
 * @param asset     the matched infrastructure id, empty when uncharted
 */
public record LinearFeature(int id, LineString line, double amplitude, double depth, Optional<String> asset) {

    /** Length of the polyline, m. */
    public double lengthM() {
        return line.getLength();
    }

    /** Azimuth from the first to the last vertex, degrees clockwise from north, 0 to 180. */
    public double azimuthDeg() {
        var a = line.getCoordinateN(0);
        var b = line.getCoordinateN(line.getNumPoints() - 1);
        double az = Math.toDegrees(Math.atan2(b.x - a.x, b.y - a.y));
        return ((az % 180) + 180) % 180;
    }

    /** The same feature with depth {@code d} below the observation level, m, positive down ({@code NaN} unknown). */
    public LinearFeature withDepth(double d) {
        return new LinearFeature(id, line, amplitude, d, asset);
    }

    /** The same feature with the matched infrastructure id (empty when uncharted). */
    public LinearFeature withAsset(Optional<String> a) {
        return new LinearFeature(id, line, amplitude, depth, a);
    }
}
