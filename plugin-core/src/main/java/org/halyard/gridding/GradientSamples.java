package org.halyard.gridding;

/**
 * Measured horizontal gradients at points, for gradient-enhanced gridding: typically the midpoints of the
 * sensor pairs of a transverse gradiometer, with the cross-line gradient from the pair and the along-line
 * gradient from the record, both turned into the map frame.
 *
 * @param x  eastings, metres
 * @param y  northings, metres
 * @param gx gradient towards east, nT/m (unit of the gridded value per metre)
 * @param gy gradient towards north, nT/m (northing, not grid rows)
 */
public record GradientSamples(double[] x, double[] y, double[] gx, double[] gy) {

    public GradientSamples {
        if (x.length != y.length || x.length != gx.length || x.length != gy.length) {
            throw new IllegalArgumentException("gradient arrays differ in length: x " + x.length + ", y " + y.length
                    + ", gx " + gx.length + ", gy " + gy.length);
        }
    }

    /** Number of gradient samples. */
    public int size() {
        return x.length;
    }
}
