package org.halyard.sheet;

/**
 * The ground rectangle a map frame shows and the mapping from ground to page, grid north up.
 *
 * <p>{@code pageX = frame.x + (x - west) * ppm}, {@code pageY = frame.y + (y - south) * ppm} with
 * {@code ppm = 72 / 0.0254 / scaleDenominator} points per metre.
 *
 * @param west             easting of the frame's left edge, metres
 * @param south            northing of the frame's bottom edge, metres
 * @param frame            the map frame on the page, points
 * @param scaleDenominator the N of 1:N
 */
public record MapWindow(double west, double south, PageRect frame, int scaleDenominator) {

    /** A window of the given frame and scale centred on ground point (cx, cy), metres. */
    public static MapWindow centred(double cx, double cy, PageRect frame, int scaleDenominator) {
        double ppm = StandardScales.pointsPerMetre(scaleDenominator);
        return new MapWindow(cx - frame.width() / ppm / 2, cy - frame.height() / ppm / 2, frame,
                scaleDenominator);
    }

    /** Points of paper per metre of ground. */
    public double pointsPerMetre() {
        return StandardScales.pointsPerMetre(scaleDenominator);
    }

    /** Easting of the frame's right edge, metres. */
    public double east() {
        return west + frame.width() / pointsPerMetre();
    }

    /** Northing of the frame's top edge, metres. */
    public double north() {
        return south + frame.height() / pointsPerMetre();
    }

    /** Easting of the frame centre, metres. */
    public double centreX() {
        return (west + east()) / 2;
    }

    /** Northing of the frame centre, metres. */
    public double centreY() {
        return (south + north()) / 2;
    }

    /** Page x of easting {@code x} (metres), points. */
    public float pageX(double x) {
        return (float) (frame.x() + (x - west) * pointsPerMetre());
    }

    /** Page y of northing {@code y} (metres), points. */
    public float pageY(double y) {
        return (float) (frame.y() + (y - south) * pointsPerMetre());
    }
}
