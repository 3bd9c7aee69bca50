package org.halyard.render;

/**
 * How a grid is drawn: ramp, stretch and optional hillshade.
 *
 * @param ramp    colour ramp
 * @param stretch value-to-ramp mapping, in the grid's unit
 * @param shading hillshade blend, {@link Shading#NONE} for flat colour
 */
public record RasterStyle(ColourRamp ramp, Stretch stretch, Shading shading) {

    public RasterStyle {
        if (ramp == null || stretch == null || shading == null) {
            throw new IllegalArgumentException("a raster style needs a ramp, a stretch and a shading");
        }
    }

    /** The same style with another ramp. */
    public RasterStyle withRamp(ColourRamp r) {
        return new RasterStyle(r, stretch, shading);
    }

    /** The same style with another stretch. */
    public RasterStyle withStretch(Stretch s) {
        return new RasterStyle(ramp, s, shading);
    }

    /** The same style with another shading. */
    public RasterStyle withShading(Shading s) {
        return new RasterStyle(ramp, stretch, s);
    }
}
