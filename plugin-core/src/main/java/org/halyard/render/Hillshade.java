package org.halyard.render;

import org.halyard.grid.Grid;

/**
 * Shaded relief of a grid lit by a distant sun: the cosine of the angle between the surface normal and
 * the direction to the sun, 0 (facing away or in the sun's shadow side) to 1 (facing the sun).
 *
 * <p><b>Algorithm:</b> gradient by Horn's 3 x 3 weighted differences (Horn 1981, Hill shading and the
 * reflectance map, Proc. IEEE 69(1) 14-47, eq. for p and q), as GDAL's {@code gdaldem hillshade} uses;
 * Lambertian reflectance {@code max(0, n . s)} with {@code n = (-dz/dx, -dz/dy, 1) / |..|} in
 * (east, north, up) and {@code s} from {@link SunPosition#towardsSun()}. The value is treated as height
 * (up positive); for a magnetic field the "height" is nT and {@code zFactor} scales it to metres of relief.
 *
 * <p><b>Accuracy:</b> exact on planes. Edges and cells beside blanks reuse the centre value for missing
 * neighbours (one-sided differences in effect).
 *
 * <p><b>Limitations:</b> no cast shadows; the sun azimuth is relative to grid north, not true north.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class Hillshade {

    private Hillshade() {
    }

    /**
     * The shade of every cell, row-major with row 0 north; {@code NaN} where the cell is blank.
     *
     * @param grid    heights (or field values), any unit
     * @param sun     light direction (azimuth clockwise from grid north, elevation above horizon, degrees)
     * @param zFactor vertical exaggeration: metres of relief per unit of value (1 for a DEM in metres)
     */
    public static float[] shade(Grid grid, SunPosition sun, double zFactor) {
        float[] out = new float[grid.geometry().size()];
        double[] s = sun.towardsSun();
        for (int r = 0; r < grid.rows(); r++) {
            for (int c = 0; c < grid.columns(); c++) {
                out[grid.geometry().index(c, r)] = (float) shadeAt(grid, c, r, 1, s, zFactor);
            }
        }
        return out;
    }

    /**
     * The shade of cell (col, row) with neighbours {@code step} cells away (step &gt; 1 for overviews).
     *
     * @param towardsSun unit vector {@code {east, north, up}} from {@link SunPosition#towardsSun()}
     * @param zFactor    metres of relief per unit of value
     * @return shade in [0, 1], {@code NaN} for a blank cell
     */
    public static double shadeAt(Grid grid, int col, int row, int step, double[] towardsSun, double zFactor) {
        double z5 = grid.get(col, row);
        if (Double.isNaN(z5)) {
            return Double.NaN;
        }
        double a = at(grid, col - step, row - step, z5), b = at(grid, col, row - step, z5);
        double c = at(grid, col + step, row - step, z5), d = at(grid, col - step, row, z5);
        double f = at(grid, col + step, row, z5), g = at(grid, col - step, row + step, z5);
        double h = at(grid, col, row + step, z5), i = at(grid, col + step, row + step, z5);
        double spacing = 8 * step * grid.geometry().cellSize();
        double dzdx = zFactor * ((c + 2 * f + i) - (a + 2 * d + g)) / spacing;
        // row index runs south, so the north neighbours (a, b, c) are the upper ones
        double dzdy = zFactor * ((a + 2 * b + c) - (g + 2 * h + i)) / spacing;
        double dot = -dzdx * towardsSun[0] - dzdy * towardsSun[1] + towardsSun[2];
        return Math.max(0, dot / Math.sqrt(dzdx * dzdx + dzdy * dzdy + 1));
    }

    private static double at(Grid grid, int col, int row, double fallback) {
        if (col < 0 || row < 0 || col >= grid.columns() || row >= grid.rows()) {
            return fallback;
        }
        double v = grid.get(col, row);
        return Double.isNaN(v) ? fallback : v;
    }
}
