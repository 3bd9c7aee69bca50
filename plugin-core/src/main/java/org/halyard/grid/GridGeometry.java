package org.halyard.grid;

/**
 * Where a regular grid lies: its size, its upper-left corner, its square cell and its CRS.
 *
 * <p>Conventions, for the whole project: x is easting and y northing in metres of a projected CRS.
 * Row 0 is the <b>north</b> edge and rows run south; column 0 is the west edge. Registration is
 * pixel-is-area: {@code west} and {@code north} are the outer edges of the corner cell, so the centre of
 * cell (col, row) is at {@code (west + (col + 0.5) cell, north - (row + 0.5) cell)}, exactly as a GDAL
 * geotransform {@code (west, cell, 0, north, 0, -cell)} says.
 *
 * @param columns  number of columns (along x), at least 1
 * @param rows     number of rows (along y, north to south), at least 1
 * @param west     x of the west edge of column 0, metres
 * @param north    y of the north edge of row 0, metres
 * @param cellSize side of a square cell, metres, positive
 * @param crsCode  authority code such as {@code "EPSG:32631"}, or {@code null} when unknown
 */
public record GridGeometry(int columns, int rows, double west, double north, double cellSize, String crsCode) {

    public GridGeometry {
        if (columns < 1 || rows < 1) {
            throw new IllegalArgumentException("grid must have at least one row and one column, got "
                    + columns + " x " + rows);
        }
        if (!(cellSize > 0) || Double.isInfinite(cellSize)) {
            throw new IllegalArgumentException("cell size must be a positive number of metres, got " + cellSize);
        }
        if (!Double.isFinite(west) || !Double.isFinite(north)) {
            throw new IllegalArgumentException("grid origin must be finite, got " + west + ", " + north);
        }
        if ((long) columns * rows > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("grid of " + columns + " x " + rows + " cells is too large");
        }
    }

    /** Number of cells, {@code columns * rows}. */
    public int size() {
        return columns * rows;
    }

    /** x of the east edge, metres. */
    public double east() {
        return west + columns * cellSize;
    }

    /** y of the south edge, metres. */
    public double south() {
        return north - rows * cellSize;
    }

    /** Easting of the centre of column {@code col}, metres. */
    public double x(int col) {
        return west + (col + 0.5) * cellSize;
    }

    /** Northing of the centre of row {@code row}, metres (row 0 is north). */
    public double y(int row) {
        return north - (row + 0.5) * cellSize;
    }

    /** Fractional column whose centre is at easting {@code x} (so cell centres give whole numbers). */
    public double column(double x) {
        return (x - west) / cellSize - 0.5;
    }

    /** Fractional row whose centre is at northing {@code y} (so cell centres give whole numbers). */
    public double row(double y) {
        return (north - y) / cellSize - 0.5;
    }

    /** Index into a row-major value array. */
    public int index(int col, int row) {
        return row * columns + col;
    }

    /** The same geometry in another CRS code (no reprojection: for labelling only). */
    public GridGeometry withCrs(String code) {
        return new GridGeometry(columns, rows, west, north, cellSize, code);
    }

    /**
     * A geometry covering the box {@code [xmin, xmax] x [ymin, ymax]} with cells of {@code cellSize}, its
     * corner snapped to a whole multiple of the cell so that grids of one survey line up.
     */
    public static GridGeometry covering(double xmin, double ymin, double xmax, double ymax, double cellSize,
                                        String crsCode) {
        if (!(cellSize > 0)) {
            throw new IllegalArgumentException("cell size must be positive, got " + cellSize);
        }
        double west = Math.floor(xmin / cellSize) * cellSize;
        double north = Math.ceil(ymax / cellSize) * cellSize;
        int cols = (int) Math.max(1, Math.ceil((xmax - west) / cellSize - 1e-9));
        int rows = (int) Math.max(1, Math.ceil((north - ymin) / cellSize - 1e-9));
        if (xmax - west >= cols * cellSize) {
            cols++;
        }
        if (north - ymin >= rows * cellSize) {
            rows++;
        }
        return new GridGeometry(cols, rows, west, north, cellSize, crsCode);
    }
}
