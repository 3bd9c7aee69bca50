package org.halyard.sheet;

/**
 * A line on the ground through points {@code (x[i], y[i])}, easting and northing in metres.
 *
 * @param x eastings, metres
 * @param y northings, metres, as many as eastings and at least two
 */
public record Polyline(double[] x, double[] y) {

    public Polyline {
        if (x == null || y == null || x.length != y.length || x.length < 2) {
            throw new IllegalArgumentException("a polyline needs at least two points with as many x as y");
        }
        x = x.clone();
        y = y.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    /** Number of vertices. */
    public int size() {
        return x.length;
    }

    /** Length along the line, metres (Cartesian in the CRS). */
    public double length() {
        double s = 0;
        for (int i = 1; i < x.length; i++) {
            s += Math.hypot(x[i] - x[i - 1], y[i] - y[i - 1]);
        }
        return s;
    }
}
