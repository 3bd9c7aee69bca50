package org.halyard.render;

import java.awt.image.BufferedImage;
import org.halyard.grid.Grid;

/**
 * Draws a grid, or a window of it, into an ARGB image: one pixel per sampled cell, row 0 (north) at the
 * top, blanks transparent.
 *
 * <p><b>Algorithm:</b> colour = ramp(stretch(value)); with shading, each channel is multiplied by
 * {@code 1 - strength (1 - shade)} where shade is {@link Hillshade#shadeAt}. Windows sample every
 * {@code step}-th cell (nearest neighbour) so overviews of large grids cost one pixel per output pixel.
 *
 * <p><b>Thread safety:</b> stateless; safe to call from several tile threads on one grid.
 */
public final class GridRenderer {

    private GridRenderer() {
    }

    /**
     * A window of a grid: columns {@code [col0, col0 + cols)} and rows {@code [row0, row0 + rows)},
     * sampled every {@code step} cells; clipped to the grid when drawn.
     */
    public record Window(int col0, int row0, int cols, int rows, int step) {
        public Window {
            if (cols < 1 || rows < 1 || step < 1) {
                throw new IllegalArgumentException("window must have positive size and step, got "
                        + cols + " x " + rows + " step " + step);
            }
        }

        /** The whole of {@code grid} at full resolution. */
        public static Window whole(Grid grid) {
            return new Window(0, 0, grid.columns(), grid.rows(), 1);
        }

        /** Width of the image drawn for this window, pixels. */
        public int width() {
            return (cols + step - 1) / step;
        }

        /** Height of the image drawn for this window, pixels. */
        public int height() {
            return (rows + step - 1) / step;
        }
    }

    /** The whole grid, one pixel per cell. */
    public static BufferedImage render(Grid grid, RasterStyle style) {
        return render(grid, style, Window.whole(grid));
    }

    /** A window of the grid; pixels outside the grid are transparent. */
    public static BufferedImage render(Grid grid, RasterStyle style, Window w) {
        int width = w.width(), height = w.height();
        int[] argb = new int[width * height];
        double[] sun = style.shading().sun().towardsSun();
        boolean shaded = style.shading().isOn();
        double strength = style.shading().strength(), zf = style.shading().zFactor();
        for (int j = 0; j < height; j++) {
            int row = w.row0() + j * w.step();
            if (row < 0 || row >= grid.rows()) {
                continue;
            }
            for (int i = 0; i < width; i++) {
                int col = w.col0() + i * w.step();
                if (col < 0 || col >= grid.columns()) {
                    continue;
                }
                int colour = style.ramp().argb(style.stretch().position(grid.get(col, row)));
                if (shaded && colour != 0) {
                    double s = Hillshade.shadeAt(grid, col, row, w.step(), sun, zf);
                    colour = darken(colour, 1 - strength * (1 - s));
                }
                argb[j * width + i] = colour;
            }
        }
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        img.setRGB(0, 0, width, height, argb, 0, width);
        return img;
    }

    /** An opaque colour with each channel multiplied by {@code factor} in [0, 1]. */
    static int darken(int argb, double factor) {
        int r = (int) Math.round(((argb >> 16) & 0xFF) * factor);
        int g = (int) Math.round(((argb >> 8) & 0xFF) * factor);
        int b = (int) Math.round((argb & 0xFF) * factor);
        return (argb & 0xFF000000) | (r << 16) | (g << 8) | b;
    }
}
