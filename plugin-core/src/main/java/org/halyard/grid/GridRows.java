package org.halyard.grid;

/**
 * A grid's values delivered row by row into an array laid out by the receiver, so that a kernel with its
 * own layout (a transform with padded rows, say) can take the values without an intermediate copy. A
 * {@link Grid} is one; a file reader is another, which reads the values straight into place.
 */
public interface GridRows {

    /** Where the values lie. */
    GridGeometry geometry();

    /**
     * Copies row {@code r} of the grid to {@code dst[r * stride]} onwards, for every row; blank cells are
     * {@code NaN}. The unit is the grid's own (nT for a total-field grid).
     *
     * @param stride floats from one row's start to the next, at least the column count
     * @throws IllegalArgumentException when the values cannot be delivered (an unreadable file, say), or when
     *     {@code dst} is shorter than {@code rows * stride} less the unused tail of the last row
     * @throws IllegalStateException for a one-shot source asked a second time
     */
    void copyRows(float[] dst, int stride);

    /**
     * Checks that {@code dst} holds the grid of {@code g} at row stride {@code stride}.
     *
     * @throws IllegalArgumentException when it does not
     */
    static void requireFits(GridGeometry g, float[] dst, int stride) {
        int w = g.columns(), h = g.rows();
        if (stride < w || (long) (h - 1) * stride + w > dst.length) {
            throw new IllegalArgumentException("a " + w + " x " + h + " grid does not fit " + dst.length
                    + " floats at row stride " + stride);
        }
    }
}
