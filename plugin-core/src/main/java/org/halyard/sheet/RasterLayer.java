package org.halyard.sheet;

import org.halyard.grid.Grid;

/**
 * A gridded layer drawn as an image under the vectors.
 *
 * @param name    layer name printed in the title block and over the colour bar, e.g. {@code Total field}
 * @param grid    the values; blanks ({@code NaN}) are left transparent
 * @param unit    unit of the values, e.g. {@code nT}, {@code nT/m}, {@code degrees}
 * @param colours value to colour
 */
public record RasterLayer(String name, Grid grid, String unit, ColourScale colours) {

    public RasterLayer {
        if (name == null || name.isBlank() || grid == null || colours == null) {
            throw new IllegalArgumentException("a raster layer needs a name, a grid and a colour scale");
        }
        if (unit == null || unit.isBlank()) {
            throw new IllegalArgumentException("raster layer '" + name + "' needs a unit (nT, nT/m, degrees)");
        }
    }
}
