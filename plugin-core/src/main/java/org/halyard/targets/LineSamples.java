package org.halyard.targets;

import java.util.Arrays;

/**
 * Total-field samples along the survey lines, every sensor of the array pooled: one entry per sensor
 * reading.
 *
 * <p>Plain parallel arrays, as the survey stages produce them; the arrays are copied on construction.
 *
 * @param x        easting of the sensor, m
 * @param y        northing of the sensor, m
 * @param z        depth of the sensor below the sea surface, m, positive down
 * @param anomaly  total-field anomaly (after diurnal and levelling), nT
 * @param altitude sensor height above the seabed, m; {@code NaN} where unknown
 */
public record LineSamples(double[] x, double[] y, double[] z, double[] anomaly, double[] altitude) {

    /** No samples: a grid-only analysis. */
    public static final LineSamples NONE = new LineSamples(new double[0], new double[0], new double[0],
            new double[0], new double[0]);

    public LineSamples {
        int n = x.length;
        if (y.length != n || z.length != n || anomaly.length != n || altitude.length != n) {
            throw new IllegalArgumentException("line sample arrays differ in length: x " + n + ", y " + y.length
                    + ", z " + z.length + ", anomaly " + anomaly.length + ", altitude " + altitude.length);
        }
        x = x.clone();
        y = y.clone();
        z = z.clone();
        anomaly = anomaly.clone();
        altitude = altitude.clone();
    }

    /** Samples without altitude (every altitude {@code NaN}). */
    public static LineSamples withoutAltitude(double[] x, double[] y, double[] z, double[] anomaly) {
        double[] alt = new double[x.length];
        Arrays.fill(alt, Double.NaN);
        return new LineSamples(x, y, z, anomaly, alt);
    }

    /** Number of samples. */
    public int size() {
        return x.length;
    }

    /**
     * Indices of the samples within {@code radius} metres (horizontally) of (px, py): a linear scan, for
     * a few queries; {@link SampleIndex} for many.
     */
    public int[] near(double px, double py, double radius) {
        double r2 = radius * radius;
        return java.util.stream.IntStream.range(0, x.length)
                .filter(i -> (x[i] - px) * (x[i] - px) + (y[i] - py) * (y[i] - py) <= r2)
                .toArray();
    }

    /** The median of {@code values} at {@code idx}, ignoring {@code NaN}; {@code NaN} when none is known. */
    static double medianAt(double[] values, int[] idx) {
        double[] v = Arrays.stream(idx).mapToDouble(i -> values[i]).filter(d -> !Double.isNaN(d)).toArray();
        return v.length == 0 ? Double.NaN : NoiseEstimate.median(v);
    }
}
