package org.halyard.render;

/**
 * Where the light comes from for a hillshade.
 *
 * @param azimuthDeg   direction <b>towards the sun</b> in degrees clockwise from grid north (0 north,
 *                     90 east, 270 west); any finite value, taken modulo 360
 * @param elevationDeg angle of the sun above the horizon in degrees, 0 to 90
 */
public record SunPosition(double azimuthDeg, double elevationDeg) {

    /** Light from the north-west, 45 degrees up: the usual choice for relief maps (common practice). */
    public static final SunPosition NORTH_WEST = new SunPosition(315, 45);

    public SunPosition {
        if (!Double.isFinite(azimuthDeg)) {
            throw new IllegalArgumentException("sun azimuth must be a finite number of degrees, got " + azimuthDeg);
        }
        if (!(elevationDeg >= 0 && elevationDeg <= 90)) {
            throw new IllegalArgumentException("sun elevation must be 0 to 90 degrees, got " + elevationDeg);
        }
    }

    /** Unit vector towards the sun as {@code {east, north, up}}. */
    public double[] towardsSun() {
        double a = Math.toRadians(azimuthDeg), e = Math.toRadians(elevationDeg);
        return new double[] {Math.sin(a) * Math.cos(e), Math.cos(a) * Math.cos(e), Math.sin(e)};
    }
}
