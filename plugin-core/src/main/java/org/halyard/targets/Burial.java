package org.halyard.targets;

import org.halyard.grid.Grid;

/**
 * Burial of a source below the seabed, from a bathymetry grid or from the sensor altitude.
 *
 * <p><b>Algorithm:</b> with a bathymetry grid (seabed depth below the sea surface, positive down) and
 * the sensor depth, burial = sensor depth + depth below sensor - seabed depth at the source; otherwise,
 * with the sensor altitude above the seabed, burial = depth below sensor - altitude. Negative values (a
 * source above the seabed, e.g. on a wreck) are kept.
 *
 * @param metres burial below the seabed, m, positive down; {@code NaN} where unknown
 * @param basis  how it was found: {@code bathymetry}, {@code altitude}, or why it is unknown
 */
public record Burial(double metres, String basis) {

    /**
     * The burial of a source at (x, y), {@code depthBelowSensor} m under sensors at {@code sensorDepth} m
     * below the sea surface and {@code altitude} m above the seabed ({@code NaN} where unknown).
     *
     * @param bathymetry seabed depth below the sea surface, m, positive down, or {@code null} when none
     */
    public static Burial of(Grid bathymetry, double x, double y, double depthBelowSensor, double sensorDepth,
                            double altitude) {
        if (Double.isNaN(depthBelowSensor)) {
            return new Burial(Double.NaN, "no depth estimate");
        }
        if (bathymetry != null && !Double.isNaN(sensorDepth)) {
            double seabed = bathymetry.valueAt(x, y);
            if (!Double.isNaN(seabed)) {
                return new Burial(sensorDepth + depthBelowSensor - seabed, "bathymetry");
            }
        }
        if (!Double.isNaN(altitude)) {
            return new Burial(depthBelowSensor - altitude, "altitude");
        }
        return new Burial(Double.NaN, bathymetry == null ? "no bathymetry grid and no sensor altitude"
                : "outside the bathymetry grid and no sensor altitude");
    }
}
