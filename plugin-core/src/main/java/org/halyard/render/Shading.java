package org.halyard.render;

/**
 * How much hillshade to blend into a coloured grid.
 *
 * @param sun      light direction (azimuth clockwise from grid north, degrees)
 * @param zFactor  metres of relief per unit of value (see {@link Hillshade})
 * @param strength 0 (no shading) to 1 (colour multiplied by the full shade)
 */
public record Shading(SunPosition sun, double zFactor, double strength) {

    /** No shading. */
    public static final Shading NONE = new Shading(SunPosition.NORTH_WEST, 1, 0);

    public Shading {
        if (!(strength >= 0 && strength <= 1)) {
            throw new IllegalArgumentException("shading strength must be 0 to 1, got " + strength);
        }
        if (!(zFactor > 0) || Double.isInfinite(zFactor)) {
            throw new IllegalArgumentException("shading z factor must be positive, got " + zFactor);
        }
    }

    /** Whether any shading is applied. */
    public boolean isOn() {
        return strength > 0;
    }
}
