package org.halyard.sheet;

/**
 * A rectangle on the page in PDF points, origin at its lower-left corner.
 *
 * @param x      left edge, points from the page's left edge
 * @param y      bottom edge, points from the page's bottom edge
 * @param width  points, not negative
 * @param height points, not negative
 */
public record PageRect(float x, float y, float width, float height) {

    public PageRect {
        if (!(width >= 0) || !(height >= 0)) {
            throw new IllegalArgumentException("page rectangle needs a non-negative size, got " + width + " x "
                    + height);
        }
    }

    public float right() {
        return x + width;
    }

    public float top() {
        return y + height;
    }

    /** This rectangle shrunk by {@code d} points on every side. */
    public PageRect inset(float d) {
        return new PageRect(x + d, y + d, Math.max(0, width - 2 * d), Math.max(0, height - 2 * d));
    }

    /** The strip of height {@code h} at the top of this rectangle. */
    public PageRect topStrip(float h) {
        return new PageRect(x, top() - h, width, h);
    }

    /** What is left below a top strip of height {@code h}. */
    public PageRect belowTop(float h) {
        return new PageRect(x, y, width, Math.max(0, height - h));
    }

    /** Whether the point lies inside or on the edge. */
    public boolean contains(double px, double py) {
        return px >= x && px <= right() && py >= y && py <= top();
    }

    /** Millimetres to points. */
    public static float mm(double millimetres) {
        return (float) (millimetres * Paper.POINTS_PER_MM);
    }
}
