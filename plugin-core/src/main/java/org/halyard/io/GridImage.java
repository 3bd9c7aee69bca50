package org.halyard.io;

import java.awt.Image;
import java.awt.Rectangle;
import java.awt.image.ColorModel;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.PixelInterleavedSampleModel;
import java.awt.image.Raster;
import java.awt.image.RenderedImage;
import java.awt.image.SampleModel;
import java.awt.image.WritableRaster;
import java.util.Vector;
import org.halyard.grid.Grid;

/**
 * A float32 image view of a {@link Grid} whose pixels are made on request, with {@code nodata} in place of
 * {@code NaN}. A writer that asks for the image strip by strip ({@code getData(Rectangle)}, as the TIFF
 * writer does) never has more than a strip copied, so writing a grid needs no second grid-sized array.
 * One tile covers the image; asking for it copies the whole grid, so this view suits streaming sinks,
 * not tile-hungry consumers.
 */
final class GridImage implements RenderedImage {

    private final Grid grid;
    private final float nodata;
    private final SampleModel sampleModel;
    private final ColorModel colorModel;

    GridImage(Grid grid, float nodata) {
        this.grid = grid;
        this.nodata = nodata;
        int w = grid.columns(), h = grid.rows();
        this.sampleModel = new PixelInterleavedSampleModel(DataBuffer.TYPE_FLOAT, w, h, 1, w, new int[] {0});
        this.colorModel = floatGray();
    }

    /** The colour model of a one-band float image, as GeoTools' coverages expect. */
    static ColorModel floatGray() {
        return new ComponentColorModel(java.awt.color.ColorSpace.getInstance(java.awt.color.ColorSpace.CS_GRAY),
                false, false, java.awt.Transparency.OPAQUE, DataBuffer.TYPE_FLOAT);
    }

    @Override
    public Raster getData(Rectangle rect) {
        Rectangle r = rect.intersection(new Rectangle(0, 0, getWidth(), getHeight()));
        WritableRaster out = Raster.createWritableRaster(
                sampleModel.createCompatibleSampleModel(Math.max(1, r.width), Math.max(1, r.height)), r.getLocation());
        copyData(out);
        return out;
    }

    @Override
    public WritableRaster copyData(WritableRaster raster) {
        WritableRaster out = raster != null ? raster : Raster.createWritableRaster(sampleModel, null);
        Rectangle r = out.getBounds().intersection(new Rectangle(0, 0, getWidth(), getHeight()));
        float[] row = new float[r.width];
        for (int y = r.y; y < r.y + r.height; y++) {
            for (int x = 0; x < r.width; x++) {
                float v = grid.get(r.x + x, y);
                row[x] = Float.isNaN(v) ? nodata : v;
            }
            out.setSamples(r.x, y, r.width, 1, 0, row);
        }
        return out;
    }

    @Override
    public Raster getData() {
        return getData(new Rectangle(0, 0, getWidth(), getHeight()));
    }

    @Override
    public Raster getTile(int tileX, int tileY) {
        if (tileX != 0 || tileY != 0) {
            throw new IllegalArgumentException("no tile " + tileX + ", " + tileY + ": the image is one tile");
        }
        return getData();
    }

    @Override
    public Vector<RenderedImage> getSources() {
        return null;
    }

    @Override
    public Object getProperty(String name) {
        return Image.UndefinedProperty;
    }

    @Override
    public String[] getPropertyNames() {
        return null;
    }

    @Override
    public ColorModel getColorModel() {
        return colorModel;
    }

    @Override
    public SampleModel getSampleModel() {
        return sampleModel;
    }

    @Override
    public int getWidth() {
        return grid.columns();
    }

    @Override
    public int getHeight() {
        return grid.rows();
    }

    @Override
    public int getMinX() {
        return 0;
    }

    @Override
    public int getMinY() {
        return 0;
    }

    @Override
    public int getNumXTiles() {
        return 1;
    }

    @Override
    public int getNumYTiles() {
        return 1;
    }

    @Override
    public int getMinTileX() {
        return 0;
    }

    @Override
    public int getMinTileY() {
        return 0;
    }

    @Override
    public int getTileWidth() {
        return getWidth();
    }

    @Override
    public int getTileHeight() {
        return getHeight();
    }

    @Override
    public int getTileGridXOffset() {
        return 0;
    }

    @Override
    public int getTileGridYOffset() {
        return 0;
    }
}
