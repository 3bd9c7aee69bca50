package org.halyard.io;

import java.awt.image.BufferedImage;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.DataBufferFloat;
import java.awt.image.PixelInterleavedSampleModel;
import java.awt.image.Raster;
import java.awt.image.SampleModel;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageReadParam;
import javax.imageio.ImageReader;
import javax.imageio.ImageIO;
import javax.imageio.stream.ImageInputStream;
import org.geotools.api.referencing.datum.PixelInCell;
import org.geotools.coverage.grid.io.imageio.geotiff.GeoTiffConstants;
import org.geotools.coverage.grid.io.imageio.geotiff.GeoTiffIIOMetadataDecoder;
import org.geotools.coverage.grid.io.imageio.geotiff.TiePoint;
import org.geotools.referencing.operation.transform.AffineTransform2D;
import org.geotools.gce.geotiff.GeoTiffReader;
import org.geotools.util.factory.Hints;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.GridRows;

/**
 * Band 1 of a GeoTIFF opened for one read of its values into an array laid out by the caller. The header
 * (CRS, geotransform, nodata) is read and checked when the file is opened; the values are read on
 * {@link #copyRows}, straight into the caller's rows when the file holds a single float32 band (the
 * TIFF reader decodes into the caller's array through a raster at the caller's row stride), else
 * through a coverage and a copy.
 *
 * <p><b>Thread safety:</b> one read, from one thread.
 */
final class GeoTiffRows implements GridRows {

    private final Path file;
    private final GridGeometry geometry;
    private final Double nodata;
    private boolean read;

    private GeoTiffRows(Path file, GridGeometry geometry, Double nodata) {
        this.file = file;
        this.geometry = geometry;
        this.nodata = nodata;
    }

    /** Opens {@code file} and checks its header; see {@link GeoTiffGrids#open}. */
    static GeoTiffRows open(Path file) {
        GeoTiffRows plain = openPlain(file);
        if (plain != null) {
            return plain;
        }
        GeoTiffReader reader = GeoTiffGrids.reader(file);
        try {
            var range = reader.getOriginalGridRange();
            GridGeometry g = GeoTiffGrids.geometryOf(reader.getCoordinateReferenceSystem(),
                    reader.getOriginalGridToWorld(PixelInCell.CELL_CORNER), range.getSpan(0), range.getSpan(1), file.toString());
            return new GeoTiffRows(file, g, GeoTiffGrids.noData(reader));
        } finally {
            reader.dispose();
        }
    }

    /**
     * The header read from the GeoTIFF keys alone, for the common case: a projected CRS given by its EPSG
     * code, pixel-is-area, metres, one tie point and a pixel scale (GeoTIFF, OGC 19-008r4, sections 7.4 and
     * 7.5), taken as the keys state it ({@link GeoTiffGrids#declaredProjected}). Anything else returns
     * null and takes the full reader, which builds the CRS from the keys first.
     */
    private static GeoTiffRows openPlain(Path file) {
        if (!Files.isRegularFile(file)) {
            return null;
        }
        ImageReader reader = null;
        try (ImageInputStream in = ImageIO.createImageInputStream(file.toFile())) {
            reader = new it.geosolutions.imageioimpl.plugins.tiff.TIFFImageReaderSpi().createReaderInstance();
            reader.setInput(in);
            GeoTiffIIOMetadataDecoder keys = new GeoTiffIIOMetadataDecoder(reader.getImageMetadata(0));
            String model = keys.getGeoKey(GeoTiffConstants.GTModelTypeGeoKey);
            String raster = keys.getGeoKey(GeoTiffConstants.GTRasterTypeGeoKey);
            String projected = keys.getGeoKey(PROJECTED_CRS_KEY), units = keys.getGeoKey(LINEAR_UNITS_KEY);
            if (!"1".equals(model) || !(raster == null || "1".equals(raster)) || projected == null
                    || !projected.matches("\\d{4,5}") || Integer.parseInt(projected) >= GeoTiffConstants.GTUserDefinedGeoKey
                    || !(units == null || "9001".equals(units)) || keys.hasModelTrasformation()
                    || !keys.hasPixelScales() || !keys.hasTiePoints() || keys.getModelTiePoints().length != 1) {
                return null;
            }
            double sx = keys.getModelPixelScales().getScaleX(), sy = keys.getModelPixelScales().getScaleY();
            TiePoint t = keys.getModelTiePoints()[0];
            // raster (i, j) -> model (x, y) = (X + (i - I) sx, Y - (j - J) sy), from the cell corner
            AffineTransform2D g2w = new AffineTransform2D(sx, 0, 0, -sy,
                    t.getValueAt(3) - t.getValueAt(0) * sx, t.getValueAt(4) + t.getValueAt(1) * sy);
            String code = "EPSG:" + Integer.parseInt(projected);
            GridGeometry g = GeoTiffGrids.geometryOf(g2w, reader.getWidth(0), reader.getHeight(0), code, file.toString());
            GeoTiffGrids.declaredProjected(code);
            return new GeoTiffRows(file, g, keys.hasNoData() ? keys.getNoData() : null);
        } catch (IOException | RuntimeException e) {
            return null; // the full reader reports what is wrong with the file
        } finally {
            if (reader != null) {
                reader.dispose();
            }
        }
    }

    /** GeoTIFF keys: ProjectedCSTypeGeoKey and ProjLinearUnitsGeoKey (OGC 19-008r4, annex B). */
    private static final int PROJECTED_CRS_KEY = 3072, LINEAR_UNITS_KEY = 3076;

    @Override
    public GridGeometry geometry() {
        return geometry;
    }

    /**
     * Reads the values into {@code dst} at row stride {@code stride}; nodata and infinite cells become
     * {@code NaN}.
     *
     * @throws IllegalArgumentException for an unreadable file or a grid with no valid cell
     * @throws IllegalStateException when called a second time
     */
    @Override
    public void copyRows(float[] dst, int stride) {
        if (read) {
            throw new IllegalStateException(file + ": the values were read already");
        }
        read = true;
        int w = geometry.columns(), h = geometry.rows();
        if (stride < w || (long) (h - 1) * stride + w > dst.length) {
            throw new IllegalArgumentException("a " + w + " x " + h + " grid does not fit " + dst.length
                    + " floats at row stride " + stride);
        }
        if (!readFloatBand(dst, stride)) {
            GeoTiffGrids.read(file).copyRows(dst, stride);
        }
        int valid = 0;
        for (int r = 0; r < h; r++) {
            valid += GeoTiffGrids.blankNoData(dst, r * stride, r * stride + w, nodata);
        }
        if (valid == 0) {
            throw GeoTiffGrids.allBlank(file.toString());
        }
    }

    /** The direct path: false, having read nothing, unless image 0 is one float32 band of the header's size. */
    private boolean readFloatBand(float[] dst, int stride) {
        int w = geometry.columns(), h = geometry.rows();
        ImageReader reader = null;
        try (ImageInputStream in = ImageIO.createImageInputStream(file.toFile())) {
            reader = new it.geosolutions.imageioimpl.plugins.tiff.TIFFImageReaderSpi().createReaderInstance();
            reader.setInput(in);
            SampleModel sm = reader.getRawImageType(0).getSampleModel();
            if (sm.getDataType() != DataBuffer.TYPE_FLOAT || sm.getNumBands() != 1
                    || reader.getWidth(0) != w || reader.getHeight(0) != h) {
                return false;
            }
            var raster = Raster.createWritableRaster(new PixelInterleavedSampleModel(DataBuffer.TYPE_FLOAT, w, h, 1,
                    stride, new int[] {0}), new DataBufferFloat(dst, dst.length), null);
            var cm = new ComponentColorModel(java.awt.color.ColorSpace.getInstance(java.awt.color.ColorSpace.CS_GRAY),
                    false, false, java.awt.Transparency.OPAQUE, DataBuffer.TYPE_FLOAT);
            ImageReadParam param = reader.getDefaultReadParam();
            param.setDestination(new BufferedImage(cm, raster, false, null));
            reader.read(0, param);
            return true;
        } catch (IOException | RuntimeException e) {
            throw new IllegalArgumentException(file + ": not a readable GeoTIFF (" + GeoTiffGrids.firstLine(e) + ")");
        } finally {
            if (reader != null) {
                reader.dispose();
            }
        }
    }
}
