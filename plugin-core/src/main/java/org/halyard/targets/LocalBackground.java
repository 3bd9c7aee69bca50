package org.halyard.targets;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;

/**
 * The slowly varying level of a grid: the median of square tiles, interpolated between tile centres.
 *
 * <p><b>Why:</b> the analytic signal of geology, of a cable's flank or of a poorly levelled block raises
 * the level over tens of metres; a pick or ridge must stand out of its surroundings, not out of the median
 * of the whole survey.
 *
 * <p><b>Algorithm:</b> tiles of {@code tileM} (rounded to whole cells, at least 3) from the north-west
 * corner; each tile's level is the median of its non-blank cells (a target covering less than half a tile
 * barely moves it; Hampel 1974, J. Am. Stat. Assoc. 69, 383-393); a tile with no data takes the median of
 * the whole grid. Bilinear interpolation between tile centres, held constant beyond the outer centres.
 *
 * <p><b>Limitations:</b> features wider than half a tile are partly absorbed into the level.
 *
 * <p><b>Thread safety:</b> immutable.
 */
final class LocalBackground {

    private final GridGeometry geo;
    private final int tile, tilesX, tilesY;
    private final double[] level;

    private LocalBackground(GridGeometry geo, int tile, int tilesX, int tilesY, double[] level) {
        this.geo = geo;
        this.tile = tile;
        this.tilesX = tilesX;
        this.tilesY = tilesY;
        this.level = level;
    }

    /**
     * The tile medians of {@code g} (any unit) for tiles of about {@code tileM} metres; {@code global} is
     * the level given to tiles without data.
     */
    static LocalBackground of(Grid g, double tileM, double global) {
        GridGeometry geo = g.geometry();
        int t = Math.max(3, (int) Math.round(tileM / geo.cellSize()));
        int tx = (geo.columns() + t - 1) / t, ty = (geo.rows() + t - 1) / t;
        double[] level = new double[tx * ty];
        double[] buf = new double[t * t];
        for (int j = 0; j < ty; j++) {
            for (int i = 0; i < tx; i++) {
                int n = 0;
                for (int r = j * t; r < Math.min(geo.rows(), (j + 1) * t); r++) {
                    for (int c = i * t; c < Math.min(geo.columns(), (i + 1) * t); c++) {
                        float v = g.get(c, r);
                        if (!Float.isNaN(v)) {
                            buf[n++] = v;
                        }
                    }
                }
                level[j * tx + i] = n == 0 ? global : NoiseEstimate.median(java.util.Arrays.copyOf(buf, n));
            }
        }
        return new LocalBackground(geo, t, tx, ty, level);
    }

    /** The level at cell (col, row), in the grid's unit. */
    double at(int col, int row) {
        // Tile centres sit at (i + 0.5) t - 0.5 in cell units.
        double fx = clamp((col + 0.5) / tile - 0.5, tilesX - 1), fy = clamp((row + 0.5) / tile - 0.5, tilesY - 1);
        int i0 = (int) Math.floor(fx), j0 = (int) Math.floor(fy);
        int i1 = Math.min(i0 + 1, tilesX - 1), j1 = Math.min(j0 + 1, tilesY - 1);
        double u = fx - i0, v = fy - j0;
        return (level[j0 * tilesX + i0] * (1 - u) + level[j0 * tilesX + i1] * u) * (1 - v)
                + (level[j1 * tilesX + i0] * (1 - u) + level[j1 * tilesX + i1] * u) * v;
    }

    private static double clamp(double f, int max) {
        return Math.max(0, Math.min(max, f));
    }

    /** The grid's geometry. */
    GridGeometry geometry() {
        return geo;
    }
}
