package org.halyard.io;

import java.awt.image.BufferedImage;
import java.awt.image.DataBuffer;
import java.awt.image.DataBufferFloat;
import java.awt.image.PixelInterleavedSampleModel;
import java.awt.image.Raster;
import java.awt.image.SampleModel;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.stream.IntStream;
import javax.imageio.ImageReadParam;
import javax.imageio.ImageReader;
import javax.imageio.ImageIO;
import javax.imageio.stream.ImageInputStream;
import it.geosolutions.imageio.plugins.tiff.TIFFDirectory;
import it.geosolutions.imageio.plugins.tiff.TIFFField;
import org.geotools.api.referencing.datum.PixelInCell;
import org.geotools.gce.geotiff.GeoTiffReader;
import org.geotools.util.factory.Hints;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.GridRows;

/**
 * Band 1 of a GeoTIFF opened for one read of its values into an array laid out by the caller. The header
 * (CRS, geotransform, nodata) is read and checked when the file is opened; the values are read on
 * {@link #copyRows}, straight into the caller's rows when image 0 is float32 (band 1 of any number; the
 * TIFF reader decodes into the caller's array through a raster at the caller's row stride), else
 * through a coverage and a copy.
 *
 * <p><b>Thread safety:</b> one read, from one thread.
 */
final class GeoTiffRows implements GridRows {

    private final Path file;
    private final GridGeometry geometry;
    private final Double nodata;
    private final boolean floatBand;   // image 0 is float32 of the header's size: read into place
    private boolean read;

    private GeoTiffRows(Path file, GridGeometry geometry, Double nodata, boolean floatBand) {
        this.file = file;
        this.geometry = geometry;
        this.nodata = nodata;
        this.floatBand = floatBand;
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
            boolean floatBand;
            try {
                floatBand = withReader(file, r -> isFloatBand(r, g));
            } catch (IllegalArgumentException e) {
                floatBand = false; // GeoTools reads what the plain TIFF reader cannot: take its coverage
            }
            return new GeoTiffRows(file, g, GeoTiffGrids.noData(reader), floatBand);
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
        try {
            return withReader(file, reader -> plainHeader(file, reader));
        } catch (IllegalArgumentException e) {
            return null; // the full reader reports what is wrong with the file
        }
    }

    private static GeoTiffRows plainHeader(Path file, ImageReader reader) throws IOException {
        // The TIFF directory itself, not GeoTools' key decoder: that one starts JAI's whole operator
        // registry (a tenth of a second) through GeoTools' logging set-up.
        TIFFDirectory dir = TIFFDirectory.createFromMetadata(reader.getImageMetadata(0));
        Map<Integer, Integer> keys = shortGeoKeys(dir.getTIFFField(GEO_KEY_DIRECTORY));
        TIFFField scale = dir.getTIFFField(MODEL_PIXEL_SCALE), tie = dir.getTIFFField(MODEL_TIEPOINT);
        Integer projected = keys.get(PROJECTED_CRS_KEY);
        if (!Integer.valueOf(1).equals(keys.get(MODEL_TYPE_KEY))
                || !(keys.get(RASTER_TYPE_KEY) == null || keys.get(RASTER_TYPE_KEY) == 1)
                || projected == null || projected < 1024 || projected >= 32767
                || !(keys.get(LINEAR_UNITS_KEY) == null || keys.get(LINEAR_UNITS_KEY) == 9001)
                || dir.getTIFFField(MODEL_TRANSFORMATION) != null
                || scale == null || scale.getCount() < 2 || tie == null || tie.getCount() != 6) {
            return null;
        }
        double sx = scale.getAsDouble(0), sy = scale.getAsDouble(1);
        // raster (i, j) -> model (x, y) = (X + (i - I) sx, Y - (j - J) sy), from the cell corner
        var g2w = new java.awt.geom.AffineTransform(sx, 0, 0, -sy,
                tie.getAsDouble(3) - tie.getAsDouble(0) * sx, tie.getAsDouble(4) + tie.getAsDouble(1) * sy);
        String code = "EPSG:" + projected;
        GridGeometry g = GeoTiffGrids.geometryOf(g2w, reader.getWidth(0), reader.getHeight(0), code, file.toString());
        Double nodata = noData(dir.getTIFFField(GDAL_NODATA));
        GeoTiffGrids.declaredProjected(code);
        return new GeoTiffRows(file, g, nodata, isFloatBand(reader, g));
    }

    /** TIFF tags of GeoTIFF (OGC 19-008r4, section 7.1) and GDAL's nodata tag. */
    private static final int MODEL_PIXEL_SCALE = 33550, MODEL_TIEPOINT = 33922, MODEL_TRANSFORMATION = 34264,
            GEO_KEY_DIRECTORY = 34735, GDAL_NODATA = 42113;
    /** GeoTIFF keys: model type, raster type, ProjectedCSTypeGeoKey, ProjLinearUnitsGeoKey (annex B). */
    private static final int MODEL_TYPE_KEY = 1024, RASTER_TYPE_KEY = 1025, PROJECTED_CRS_KEY = 3072, LINEAR_UNITS_KEY = 3076;

    /**
     * The keys of a GeoKeyDirectoryTag whose value is stored in the directory itself (TIFFTagLocation 0):
     * after a header of four shorts, entries of {KeyID, TIFFTagLocation, Count, Value}.
     */
    private static Map<Integer, Integer> shortGeoKeys(TIFFField directory) {
        Map<Integer, Integer> keys = new HashMap<>();
        if (directory == null || directory.getCount() < 4) {
            return keys;
        }
        int n = Math.min(directory.getAsInt(3), (directory.getCount() - 4) / 4);
        for (int e = 0; e < n; e++) {
            int at = 4 + 4 * e;
            if (directory.getAsInt(at + 1) == 0) {
                keys.put(directory.getAsInt(at), directory.getAsInt(at + 3));
            }
        }
        return keys;
    }

    /** GDAL's nodata tag as a number (it is ASCII), or null without one. */
    private static Double noData(TIFFField field) {
        if (field == null) {
            return null;
        }
        String text = field.getAsString(0).replace("\0", "").trim();
        return text.equalsIgnoreCase("nan") ? Double.NaN : Double.parseDouble(text);
    }

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
        GridRows.requireFits(geometry, dst, stride);
        int w = geometry.columns(), h = geometry.rows();
        long valid;
        if (floatBand) {
            // Two halves on two threads, each with its own stream: decoding is CPU work, not disk work.
            int parts = (long) w * h >= (1 << 20) ? Math.max(1, Math.min(Math.min(2, h), Runtime.getRuntime().availableProcessors())) : 1;
            valid = IntStream.range(0, parts).parallel()
                    .mapToLong(k -> readRows(dst, stride, (int) ((long) h * k / parts), (int) ((long) h * (k + 1) / parts)))
                    .sum();
        } else {
            GeoTiffGrids.read(file).copyRows(dst, stride);
            valid = 0;
            for (int r = 0; r < h; r++) {
                valid += GeoTiffGrids.blankNoData(dst, r * stride, r * stride + w, nodata);
            }
        }
        if (valid == 0) {
            throw GeoTiffGrids.allBlank(file.toString());
        }
    }

    /** Whether image 0 is float32 of the grid's size, whose band 1 {@link #readRows} decodes into place. */
    private static boolean isFloatBand(ImageReader reader, GridGeometry g) throws IOException {
        SampleModel sm = reader.getRawImageType(0).getSampleModel();
        return sm.getDataType() == DataBuffer.TYPE_FLOAT && reader.getWidth(0) == g.columns() && reader.getHeight(0) == g.rows();
    }

    /**
     * Decodes rows {@code r0} to {@code r1 - 1} of the float band straight into {@code dst} at row stride
     * {@code stride} (the reader writes into a raster over the caller's array), then blanks nodata.
     *
     * @return the number of valid cells in those rows
     */
    private long readRows(float[] dst, int stride, int r0, int r1) {
        int w = geometry.columns();
        withReader(reader -> {
            var raster = Raster.createWritableRaster(new PixelInterleavedSampleModel(DataBuffer.TYPE_FLOAT, w,
                    geometry.rows(), 1, stride, new int[] {0}), new DataBufferFloat(dst, dst.length), null);
            ImageReadParam param = reader.getDefaultReadParam();
            param.setSourceRegion(new java.awt.Rectangle(0, r0, w, r1 - r0));
            param.setSourceBands(new int[] {0}); // band 1 of however many
            param.setDestinationBands(new int[] {0});
            param.setDestinationOffset(new java.awt.Point(0, r0));
            param.setDestination(new BufferedImage(GeoTiffGrids.floatGray(), raster, false, null));
            reader.read(0, param);
            return null;
        });
        long valid = 0;
        for (int r = r0; r < r1; r++) {
            valid += GeoTiffGrids.blankNoData(dst, r * stride, r * stride + w, nodata);
        }
        return valid;
    }

    private interface ReaderWork<T> {
        T run(ImageReader reader) throws IOException;
    }

    private <T> T withReader(ReaderWork<T> work) {
        return withReader(file, work);
    }

    /** Runs {@code work} with a TIFF reader of its own on {@code file}; failures name the file. */
    private static <T> T withReader(Path file, ReaderWork<T> work) {
        ImageReader reader = null;
        try (ImageInputStream in = ImageIO.createImageInputStream(file.toFile())) {
            reader = new it.geosolutions.imageioimpl.plugins.tiff.TIFFImageReaderSpi().createReaderInstance();
            reader.setInput(in);
            return work.run(reader);
        } catch (IOException | RuntimeException e) {
            throw new IllegalArgumentException(file + ": not a readable GeoTIFF (" + GeoTiffGrids.firstLine(e) + ")");
        } finally {
            if (reader != null) {
                reader.dispose();
            }
        }
    }
}
