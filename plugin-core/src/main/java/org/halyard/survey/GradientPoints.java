package org.halyard.survey;

/**
 * Horizontal gradients measured by one sensor pair, at the pair's midpoints: the plain arrays the
 * gradient-enhanced gridder takes.
 *
 * @param pair  the pair's name, {@code port/starboard} sensor columns
 * @param x     midpoint easting per row, m
 * @param y     midpoint northing per row, m
 * @param value mean of the two corrected readings, nT
 * @param gx    d/d(easting) of the total field, nT/m
 * @param gy    d/d(northing) of the total field, nT/m
 */
public record GradientPoints(String pair, double[] x, double[] y, double[] value, double[] gx, double[] gy) {

    /**
     * The gradient across the track toward starboard at point {@code i}, nT/m, for heading {@code h}
     * (degrees clockwise from north): the map gradient projected on starboard = (cos h, -sin h).
     */
    public double transverse(int i, double headingDeg) {
        double h = Math.toRadians(headingDeg);
        return gx[i] * Math.cos(h) - gy[i] * Math.sin(h);
    }

    /** The gradient along the track (forward) at point {@code i}, nT/m: projected on (sin h, cos h). */
    public double along(int i, double headingDeg) {
        double h = Math.toRadians(headingDeg);
        return gx[i] * Math.sin(h) + gy[i] * Math.cos(h);
    }

    /** Number of points (one per survey row; NaN where a reading was missing). */
    public int size() {
        return x.length;
    }
}
