package org.halyard.sheet;

/**
 * How a vector layer's lines are stroked.
 *
 * @param rgb   colour {@code 0xRRGGBB}
 * @param width line width, points
 * @param dash  dash pattern in points (on, off, ...); empty for a solid line
 */
public record LineStyle(int rgb, float width, float[] dash) {

    public LineStyle {
        if (!(width > 0)) {
            throw new IllegalArgumentException("line width must be positive points, got " + width);
        }
        dash = dash == null ? new float[0] : dash.clone();
    }

    @Override
    public float[] dash() {
        return dash.clone();
    }

    /** A solid line. */
    public static LineStyle solid(int rgb, float width) {
        return new LineStyle(rgb, width, new float[0]);
    }

    /** A dashed line, {@code on} points drawn and {@code off} points blank. */
    public static LineStyle dashed(int rgb, float width, float on, float off) {
        return new LineStyle(rgb, width, new float[] {on, off});
    }
}
