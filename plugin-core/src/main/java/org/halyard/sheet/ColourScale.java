package org.halyard.sheet;

/**
 * How a raster layer's values become colours, as a sheet needs it: the colour of a value and the value at
 * each point along the colour bar. Implementations adapt {@code org.halyard.render} ramps and stretches
 * (see {@link RenderColours}); sheets never define ramps of their own.
 */
public interface ColourScale {

    /**
     * Colour of a value in the layer's unit (nT, nT/m, degrees).
     *
     * @return {@code 0xRRGGBB}; never called with {@code NaN} (blanks stay transparent)
     */
    int rgb(double value);

    /**
     * The value shown at a fraction of the colour bar's length, in the layer's unit; 0 is the low end, 1 the
     * high end. Monotonic in {@code fraction}; a non-linear stretch shows here as unevenly spaced values.
     */
    double valueAt(double fraction);
}
