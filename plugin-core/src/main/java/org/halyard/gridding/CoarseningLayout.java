package org.halyard.gridding;

/**
 * The internal node lattice of a coarse-to-fine solve: a little larger than the requested grid so that it
 * halves cleanly down to a few nodes, then cropped back.
 *
 * <p><b>Algorithm:</b> for the largest number of halvings {@code L} whose padded lattice
 * {@code (a 2^L + 1) x (b 2^L + 1)} covers the grid with at most {@value #MAX_EXTRA_AREA} extra area,
 * or 16 extra nodes per grid side node for small grids (and at least 3 nodes a side at the coarsest level), pad evenly on both sides. A lattice whose sides share
 * few factors cannot coarsen and the relaxation then needs many more sweeps (STACK.md, Gridding).
 *
 * @param columns    internal columns at the finest level, at least the grid's
 * @param rows       internal rows at the finest level, at least the grid's
 * @param padWest    internal columns west of grid column 0
 * @param padNorth   internal rows north of grid row 0
 * @param halvings   number of halvings from the finest to the coarsest level
 */
public record CoarseningLayout(int columns, int rows, int padWest, int padNorth, int halvings) {

    /** Largest fraction of extra nodes accepted to gain one more coarse level. */
    static final double MAX_EXTRA_AREA = 0.06;

    /** The layout for a grid of {@code columns x rows} cells, each at least 3. */
    public static CoarseningLayout of(int columns, int rows) {
        if (columns < 3 || rows < 3) {
            throw new IllegalArgumentException("a spline grid needs at least 3 x 3 cells, got " + columns + " x " + rows);
        }
        double area = (double) columns * rows;
        for (int l = 30; l > 0; l--) {
            long step = 1L << l;
            long a = ceilDiv(columns - 1, step), b = ceilDiv(rows - 1, step);
            if (a < 2 || b < 2) {
                continue;
            }
            long nc = a * step + 1, nr = b * step + 1;
            // Small grids may pad more: a few extra rows cost less than hundreds of extra sweeps.
            double allowed = Math.max(area * MAX_EXTRA_AREA, 16.0 * (columns + rows));
            if (nc * (double) nr <= area + allowed) {
                return new CoarseningLayout((int) nc, (int) nr, (int) (nc - columns) / 2, (int) (nr - rows) / 2, l);
            }
        }
        return new CoarseningLayout(columns, rows, 0, 0, 0);
    }

    private static long ceilDiv(long a, long b) {
        return (a + b - 1) / b;
    }

    /** Node spacing of level {@code level} (0 finest) in finest-level cells. */
    public int stride(int level) {
        return 1 << level;
    }

    /** Columns of level {@code level}. */
    public int columnsAt(int level) {
        return (columns - 1) / stride(level) + 1;
    }

    /** Rows of level {@code level}. */
    public int rowsAt(int level) {
        return (rows - 1) / stride(level) + 1;
    }
}
