package org.halyard.grid;

import java.util.Arrays;
import java.util.function.DoubleBinaryOperator;

/**
 * An immutable single-band grid of float values on a {@link GridGeometry}; {@code NaN} marks a blank.
 *
 * <p>Values are stored row-major with row 0 at the north edge (see {@link GridGeometry} for the
 * registration). The unit of the values is whatever the producing operator states (nT, nT/m, degrees);
 * the grid does not carry it.
 *
 * <p><b>Thread safety:</b> immutable, so safe to share. The backing array never escapes: {@link #toArray()}
 * copies, and the factories copy unless their name says they take ownership.
 */
public final class Grid implements GridRows {

    private final GridGeometry geometry;
    private final float[] values;   // the grid's values in its leading geometry.size() cells
    private final int size;

    private Grid(GridGeometry geometry, float[] values) {
        this(geometry, values, false);
    }

    private Grid(GridGeometry geometry, float[] values, boolean leading) {
        if (leading ? values.length < geometry.size() : values.length != geometry.size()) {
            throw new IllegalArgumentException("expected " + (leading ? "at least " : "") + geometry.size()
                    + " values for a " + geometry.columns() + " x " + geometry.rows() + " grid, got " + values.length);
        }
        this.geometry = geometry;
        this.values = values;
        this.size = geometry.size();
    }

    /** A grid holding a copy of {@code values} (row-major, row 0 north). */
    public static Grid of(GridGeometry geometry, float[] values) {
        return new Grid(geometry, values.clone());
    }

    /**
     * A grid that takes ownership of {@code values} without copying; the caller must not touch the array
     * afterwards. For kernels that have just filled a fresh array.
     */
    public static Grid wrap(GridGeometry geometry, float[] values) {
        return new Grid(geometry, values);
    }

    /**
     * As {@link #wrap}, for an array that may be longer than the grid: the grid is its leading
     * {@code geometry.size()} values and the rest is ignored. For kernels that finish in a larger work
     * array, so that the result needs no copy.
     */
    public static Grid wrapLeading(GridGeometry geometry, float[] values) {
        return new Grid(geometry, values, true);
    }

    /** A grid holding {@code values} rounded to float (row-major, row 0 north). */
    public static Grid of(GridGeometry geometry, double[] values) {
        float[] f = new float[values.length];
        for (int i = 0; i < f.length; i++) {
            f[i] = (float) values[i];
        }
        return new Grid(geometry, f);
    }

    /** A grid with every cell set to {@code value}. */
    public static Grid filled(GridGeometry geometry, float value) {
        float[] f = new float[geometry.size()];
        Arrays.fill(f, value);
        return new Grid(geometry, f);
    }

    /** A grid sampling {@code f(x, y)} at every cell centre (x easting, y northing, metres). */
    public static Grid sample(GridGeometry geometry, DoubleBinaryOperator f) {
        float[] v = new float[geometry.size()];
        for (int r = 0; r < geometry.rows(); r++) {
            double y = geometry.y(r);
            for (int c = 0; c < geometry.columns(); c++) {
                v[geometry.index(c, r)] = (float) f.applyAsDouble(geometry.x(c), y);
            }
        }
        return new Grid(geometry, v);
    }

    @Override
    public GridGeometry geometry() {
        return geometry;
    }

    public int columns() {
        return geometry.columns();
    }

    public int rows() {
        return geometry.rows();
    }

    /** The value of cell (col, row), {@code NaN} where blank. Row 0 is north. */
    public float get(int col, int row) {
        return values[row * geometry.columns() + col];
    }

    /** The value at row-major index {@code i}. */
    public float get(int i) {
        return values[i];
    }

    /** Copies the rows at a row stride of the caller's choosing; see {@link GridRows}. */
    @Override
    public void copyRows(float[] dst, int stride) {
        GridRows.requireFits(geometry, dst, stride);
        int w = geometry.columns(), h = geometry.rows();
        for (int r = 0; r < h; r++) {
            System.arraycopy(values, r * w, dst, r * stride, w);
        }
    }

    /** A copy of the values, row-major, row 0 north. */
    public float[] toArray() {
        return Arrays.copyOf(values, size);
    }

    /** The values as doubles, row-major, row 0 north. */
    public double[] toDoubleArray() {
        double[] d = new double[size];
        for (int i = 0; i < d.length; i++) {
            d[i] = values[i];
        }
        return d;
    }

    /** A grid on the same geometry with other values (copied). */
    public Grid withValues(float[] newValues) {
        return of(geometry, newValues);
    }

    /** Number of cells that are not blank. */
    public int validCount() {
        int n = 0;
        for (int i = 0; i < size; i++) {
            if (!Float.isNaN(values[i])) {
                n++;
            }
        }
        return n;
    }

    /**
     * Bilinear interpolation at (x, y) in metres; {@code NaN} outside the cell centres' hull or where any
     * of the four neighbours is blank.
     */
    public double valueAt(double x, double y) {
        double fc = geometry.column(x);
        double fr = geometry.row(y);
        int c0 = (int) Math.floor(fc);
        int r0 = (int) Math.floor(fr);
        if (c0 < 0 || r0 < 0 || c0 >= columns() || r0 >= rows()) {
            return Double.NaN;
        }
        int c1 = Math.min(c0 + 1, columns() - 1);
        int r1 = Math.min(r0 + 1, rows() - 1);
        double tc = fc - c0;
        double tr = fr - r0;
        double v00 = get(c0, r0), v10 = get(c1, r0), v01 = get(c0, r1), v11 = get(c1, r1);
        return (v00 * (1 - tc) + v10 * tc) * (1 - tr) + (v01 * (1 - tc) + v11 * tc) * tr;
    }

    /** Smallest and largest non-blank value, {@code {NaN, NaN}} when every cell is blank. */
    public double[] range() {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < size; i++) {
            float v = values[i];
            if (!Float.isNaN(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        return lo > hi ? new double[] {Double.NaN, Double.NaN} : new double[] {lo, hi};
    }
}
