package org.halyard.simulate;

/**
 * The simulator's seabed: a smooth analytic surface of depth below the sea surface.
 *
 * <p><b>Algorithm:</b> d(x, y) = d0 + sE x + sN y + c exp(-(n / w)^2) + a sin(2 pi t / L), with (x, y) metres
 * east and north of the scenario origin, n the signed distance to the right of the channel axis minus its
 * offset and t the distance along the axis (so the sand-wave crests cross the channel at right angles).
 * Depth is positive down, metres.
 *
 * <p><b>Thread safety:</b> immutable.
 */
final class AnalyticSeabed {

    private final Scenario.Seabed s;
    private final double ox, oy, ax, ay;

    AnalyticSeabed(Scenario.Seabed seabed, double originEast, double originNorth) {
        this.s = seabed;
        this.ox = originEast;
        this.oy = originNorth;
        this.ax = Math.sin(Math.toRadians(seabed.channelAzimuthDeg()));
        this.ay = Math.cos(Math.toRadians(seabed.channelAzimuthDeg()));
    }

    /**
     * Seabed depth below the sea surface, m, positive down.
     *
     * @param e easting, m (projected CRS)
     * @param n northing, m
     */
    double depth(double e, double n) {
        double x = e - ox, y = n - oy;
        double along = x * ax + y * ay;
        double right = x * ay - y * ax - s.channelOffsetM();
        double d = s.depthM() + s.slopeEast() * x + s.slopeNorth() * y;
        if (s.channelWidthM() > 0) {
            double q = right / s.channelWidthM();
            d += s.channelDepthM() * Math.exp(-q * q);
        }
        if (s.sandWaveLengthM() > 0) {
            d += s.sandWaveAmplitudeM() * Math.sin(2 * Math.PI * along / s.sandWaveLengthM());
        }
        return d;
    }
}
