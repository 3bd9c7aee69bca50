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
 * @param transverse gradient across the track, toward starboard, nT/m
 * @param along gradient along the track, forward, nT/m
 */
public record GradientPoints(String pair, double[] x, double[] y, double[] value, double[] gx, double[] gy,
                             float[] transverse, float[] along) {

    /** Number of points (one per survey row; NaN where a reading was missing). */
    public int size() {
        return x.length;
    }
}
