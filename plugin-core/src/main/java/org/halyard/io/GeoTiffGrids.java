package org.halyard.io;

import it.geosolutions.jaiext.range.NoDataContainer;
import java.awt.image.DataBuffer;
import java.awt.image.Raster;
import java.awt.image.RenderedImage;
import java.awt.image.WritableRaster;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.geotools.api.referencing.FactoryException;
import org.geotools.api.referencing.crs.CoordinateReferenceSystem;
import org.geotools.api.referencing.crs.GeographicCRS;
import org.geotools.api.referencing.crs.ProjectedCRS;
import org.geotools.api.referencing.operation.MathTransform;
import org.geotools.coverage.GridSampleDimension;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.coverage.grid.GridCoverageFactory;
import org.geotools.coverage.util.CoverageUtilities;
import org.geotools.gce.geotiff.GeoTiffReader;
import org.geotools.geometry.jts.ReferencedEnvelope;
import org.geotools.referencing.CRS;
import org.geotools.referencing.operation.transform.AffineTransform2D;
import org.geotools.util.factory.Hints;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.GridRows;

/**
 * Reads and writes {@link Grid}s as single-band float32 GeoTIFFs, and converts between {@code Grid} and
 * {@link GridCoverage2D}. Reading goes through GeoTools' gt-geotiff ({@link #read}), or for the filter
 * path straight into the caller's array ({@link #open}); writing is our own strip writer
 * ({@link FloatGeoTiffWriter}).
 *
 * <p>Written files carry the CRS as its EPSG code in the GeoTIFF keys, the exact pixel-is-area
 * geotransform of the grid and a nodata value ({@link #NODATA}, in GDAL's nodata tag) where the grid holds
 * {@code NaN}. Read files must have a projected CRS in metres and square cells; nodata cells become
 * {@code NaN}.
 *
 * <p><b>Thread safety:</b> calls may run concurrently on different files; the record of codes declared
 * projected by files read ({@link #declaredProjected}) is a concurrent set.
 */
public final class GeoTiffGrids {

    /** The nodata value written for blank cells: exact in float32 and outside any magnetic value. */
    public static final float NODATA = -99999f;

    /** Relative tolerance for deciding that cells are square and the grid is not rotated. */
    private static final double SHAPE_TOLERANCE = 1e-6;

    private GeoTiffGrids() {
    }

    /**
     * Reads band 1 of a GeoTIFF.
     *
     * @throws IllegalArgumentException naming the file for a missing or unreadable file, a missing or
     *     geographic CRS, non-square or rotated cells, or a grid with no valid cell
     */
    public static Grid read(Path file) {
        GeoTiffReader reader = reader(file);
        try {
            GridCoverage2D coverage;
            try {
                coverage = reader.read(null);
            } catch (Exception e) {
                throw new IllegalArgumentException(file + ": not a readable GeoTIFF (" + firstLine(e) + ")");
            }
            if (coverage == null) {
                throw new IllegalArgumentException(file + ": not a readable GeoTIFF");
            }
            Grid grid = fromCoverage(coverage, noData(reader), file.toString());
            coverage.dispose(true);
            return grid;
        } finally {
            reader.dispose();
        }
    }

    /**
     * Opens band 1 of a GeoTIFF for a single read of its values into an array the reader lays out, such as
     * a transform's padded rows: the header is read and checked now, the values when
     * {@link GridRows#copyRows} is called. Band 1 of a float32 image is read straight into place. In the common
     * case of an EPSG-coded projected CRS the header is taken from the GeoTIFF keys without the EPSG
     * database, which a filtered grid written in the same CRS then does not need either.
     *
     * @throws IllegalArgumentException as {@link #read}
     */
    public static GridRows open(Path file) {
        return GeoTiffRows.open(file);
    }

    static GeoTiffReader reader(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException(file + ": no such file");
        }
        try {
            return new GeoTiffReader(file.toFile(), new Hints(Hints.FORCE_LONGITUDE_FIRST_AXIS_ORDER, Boolean.TRUE));
        } catch (Exception e) {
            throw new IllegalArgumentException(file + ": not a readable GeoTIFF (" + firstLine(e) + ")");
        }
    }

    static Double noData(GeoTiffReader reader) {
        return reader.getMetadata() != null && reader.getMetadata().hasNoData() ? reader.getMetadata().getNoData() : null;
    }

    /**
     * Converts a coverage to a grid.
     *
     * @param nodata a value to read as blank, or null
     * @param label  what to name in error messages (a file name or layer name)
     */
    public static Grid fromCoverage(GridCoverage2D coverage, Double nodata, String label) {
        RenderedImage img = coverage.getRenderedImage();
        GridGeometry geometry = geometryOf(coverage.getCoordinateReferenceSystem2D(), coverage.getGridGeometry().getGridToCRS2D(
                org.geotools.api.metadata.spatial.PixelOrientation.UPPER_LEFT), img.getWidth(), img.getHeight(), label);
        float[] values = band0(img);
        if (blankNoData(values, 0, values.length, nodata) == 0) {
            throw allBlank(label);
        }
        return Grid.wrap(geometry, values);
    }

    /**
     * Turns {@code nodata} and infinite values in {@code v[from, to)} into {@code NaN}.
     *
     * @return the number of valid cells in the range
     */
    static int blankNoData(float[] v, int from, int to, Double nodata) {
        int valid = 0;
        for (int i = from; i < to; i++) {
            float x = v[i];
            if (Float.isInfinite(x) || (nodata != null && (x == nodata.floatValue() || (nodata.isNaN() && Float.isNaN(x))))) {
                v[i] = Float.NaN;
            } else if (!Float.isNaN(x)) {
                valid++;
            }
        }
        return valid;
    }

    static IllegalArgumentException allBlank(String label) {
        return new IllegalArgumentException(label + ": every cell of the grid is blank");
    }

    /**
     * The grid geometry of a {@code cols x rows} raster with the given CRS and grid-to-world transform (cell
     * corner), after the checks every Halyard grid must pass.
     *
     * @throws IllegalArgumentException naming {@code label} for a missing, geographic or unsupported CRS,
     *     or for rotated, flipped or non-square cells
     */
    static GridGeometry geometryOf(CoordinateReferenceSystem crs, MathTransform g2w, int cols, int rows, String label) {
        if (crs == null || crs instanceof org.geotools.api.referencing.crs.EngineeringCRS
                || crs.getCoordinateSystem() == null || crs.getName() == null
                || "Unknown".equalsIgnoreCase(crs.getName().getCode())) {
            throw new IllegalArgumentException(label + ": the grid has no coordinate reference system");
        }
        if (crs instanceof GeographicCRS) {
            throw new IllegalArgumentException(label + ": the grid is in a geographic CRS (degrees); "
                    + "Halyard needs a projected CRS in metres: reproject it first, e.g. to the UTM zone");
        }
        if (!(crs instanceof ProjectedCRS)) {
            throw new IllegalArgumentException(label + ": the grid's CRS is not a projected CRS in metres");
        }
        if (!(g2w instanceof AffineTransform2D a)) {
            throw new IllegalArgumentException(label + ": the grid's geotransform is not affine");
        }
        return geometryOf(a, cols, rows, codeOf(crs), label);
    }

    /**
     * The grid geometry of a {@code cols x rows} raster with grid-to-world transform {@code a} (cell corner)
     * in the CRS {@code code}, after the shape checks.
     *
     * @throws IllegalArgumentException naming {@code label} for rotated, flipped or non-square cells
     */
    static GridGeometry geometryOf(java.awt.geom.AffineTransform a, int cols, int rows, String code, String label) {
        double sx = a.getScaleX(), sy = a.getScaleY();
        if (Math.abs(a.getShearX()) > SHAPE_TOLERANCE * Math.abs(sx) || Math.abs(a.getShearY()) > SHAPE_TOLERANCE * Math.abs(sx)) {
            throw new IllegalArgumentException(label + ": the grid is rotated; resample it north-up first");
        }
        if (!(sy < 0)) {
            throw new IllegalArgumentException(label + ": the grid's rows run north to south in no usual way (y scale "
                    + sy + "); flip it north-up first");
        }
        if (Math.abs(sx + sy) > SHAPE_TOLERANCE * sx) {
            throw new IllegalArgumentException(label + ": cells are not square (" + sx + " x " + (-sy)
                    + " m); resample to square cells first");
        }
        return new GridGeometry(cols, rows, a.getTranslateX(), a.getTranslateY(), sx, code);
    }

    /**
     * Writes a grid as a float32 GeoTIFF ({@link FloatGeoTiffWriter}: strip by strip, no copy of the grid).
     * The file is written beside the target under a temporary name and moved into place, so a failed write
     * leaves no partial file.
     *
     * @throws IllegalArgumentException when the grid has no CRS code, or the code is unknown or not an EPSG
     *     projected CRS
     */
    public static void write(Grid grid, Path file) {
        int epsg = projectedEpsg(grid.geometry().crsCode());
        Path tmp = file.resolveSibling("." + file.getFileName() + ".part");
        try {
            if (file.getParent() != null) {
                Files.createDirectories(file.getParent());
            }
            FloatGeoTiffWriter.write(grid, epsg, NODATA, tmp);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException ignored) {
                // the original failure is the one to report
            }
            throw new UncheckedIOException(file + ": cannot write GeoTIFF: " + e.getMessage(), e);
        }
    }

    /**
     * The EPSG number of {@code code}, which must name a projected CRS.
     *
     * @throws IllegalArgumentException for a missing or unknown code, or one that is not an EPSG projected CRS
     */
    static int projectedEpsg(String code) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("EPSG:(\\d{1,5})").matcher(code == null ? "" : code.trim());
        if (m.matches() && DECLARED_PROJECTED.contains(code)) {
            return Integer.parseInt(m.group(1));
        }
        CoordinateReferenceSystem crs = decode(code);
        if (!(crs instanceof ProjectedCRS) || !m.matches() || Integer.parseInt(m.group(1)) >= 32767) {
            throw new IllegalArgumentException("the grid's CRS " + code + " is not an EPSG-coded projected CRS; "
                    + "Halyard grids are in projected CRSs in metres");
        }
        return Integer.parseInt(m.group(1));
    }

    /** Converts a grid to a coverage with {@link #NODATA} in place of blanks and the nodata property set. */
    public static GridCoverage2D toCoverage(Grid grid, String name) {
        GridGeometry g = grid.geometry();
        CoordinateReferenceSystem crs = decode(g.crsCode());
        float[] v = grid.toArray();
        for (int i = 0; i < v.length; i++) {
            if (Float.isNaN(v[i])) {
                v[i] = NODATA;
            }
        }
        // A plain pixel-interleaved raster over our own array, as most consumers expect.
        WritableRaster raster = Raster.createWritableRaster(new java.awt.image.PixelInterleavedSampleModel(
                DataBuffer.TYPE_FLOAT, g.columns(), g.rows(), 1, g.columns(), new int[] {0}),
                new java.awt.image.DataBufferFloat(v, v.length), null);
        java.awt.image.BufferedImage image = new SharedRasterImage(floatGray(), raster);
        ReferencedEnvelope env = new ReferencedEnvelope(g.west(), g.east(), g.south(), g.north(), crs);
        Map<String, Object> props = new HashMap<>();
        CoverageUtilities.setNoDataProperty(props, new NoDataContainer(NODATA));
        GridCoverageFactory factory = new GridCoverageFactory();
        return factory.create(name, image, env, (GridSampleDimension[]) null, null, props);
    }

    /** The colour model of a one-band float image, as GeoTools' coverages and ImageIO expect. */
    static java.awt.image.ColorModel floatGray() {
        return new java.awt.image.ComponentColorModel(java.awt.color.ColorSpace.getInstance(java.awt.color.ColorSpace.CS_GRAY),
                false, false, java.awt.Transparency.OPAQUE, DataBuffer.TYPE_FLOAT);
    }

    /**
     * An image whose {@code getData} hands out views of its raster instead of copies. Consumers such as the
     * TIFF writer ask for every tile through {@code getData(Rectangle)}, and {@code BufferedImage} copies it
     * pixel by pixel through the generic sample-model path (a fifth of a 4096 x 4096 filter's time, JFR
     * profile); they only read the tile, so a view is enough. {@code getData} returns a read-only {@code Raster}
     * type; coverages are immutable values to their readers.
     */
    private static final class SharedRasterImage extends java.awt.image.BufferedImage {

        SharedRasterImage(java.awt.image.ColorModel cm, WritableRaster raster) {
            super(cm, raster, false, null);
        }

        @Override
        public Raster getData() {
            return getRaster();
        }

        @Override
        public Raster getData(java.awt.Rectangle rect) {
            java.awt.Rectangle r = rect.intersection(getRaster().getBounds());
            return getRaster().createChild(r.x, r.y, r.width, r.height, r.x, r.y, null);
        }
    }

    /**
     * The CRS for an authority code such as {@code EPSG:32631}, easting first.
     *
     * @throws IllegalArgumentException for a missing or unknown code
     */
    public static CoordinateReferenceSystem decode(String code) {
        if (code == null || code.isBlank()) {
            throw new IllegalArgumentException("the grid has no CRS code; give one, e.g. --crs EPSG:32631");
        }
        try {
            return CRS.decode(code.trim(), true);
        } catch (FactoryException e) {
            throw new IllegalArgumentException("unknown CRS code '" + code + "' (expected e.g. EPSG:32631)");
        }
    }

    /**
     * Records that a GeoTIFF's own keys declare {@code code} a projected CRS (GTModelTypeGeoKey projected,
     * ProjectedCSTypeGeoKey the EPSG code: GeoTIFF, OGC 19-008r4, section 7.5), so that writing a grid in it
     * needs no look-up in the EPSG database, which costs about half a second of CPU to open. The code
     * written is the code read, so the output claims no more than its input did.
     */
    static void declaredProjected(String code) {
        DECLARED_PROJECTED.add(code);
    }

    private static final java.util.Set<String> DECLARED_PROJECTED = ConcurrentHashMap.newKeySet();

    /** The authority code of a CRS, {@code EPSG:n} where one is found, else its WKT name. */
    public static String codeOf(CoordinateReferenceSystem crs) {
        try {
            // Identifiers first: the full scan of the EPSG database costs seconds.
            Integer epsg = CRS.lookupEpsgCode(crs, false);
            if (epsg == null) {
                epsg = CRS.lookupEpsgCode(crs, true);
            }
            if (epsg != null) {
                return "EPSG:" + epsg;
            }
        } catch (FactoryException ignored) {
            // fall back on the error below
        }
        throw new IllegalArgumentException("the grid's CRS '" + crs.getName().getCode()
                + "' has no EPSG code; Halyard needs an EPSG-coded projected CRS");
    }

    /** Band 0 of an image as floats, row-major, copied tile by tile (directly where the layout allows). */
    static float[] band0(RenderedImage img) {
        int w = img.getWidth(), h = img.getHeight(), x0 = img.getMinX(), y0 = img.getMinY();
        float[] out = new float[w * h];
        for (int ty = img.getMinTileY(); ty < img.getMinTileY() + img.getNumYTiles(); ty++) {
            for (int tx = img.getMinTileX(); tx < img.getMinTileX() + img.getNumXTiles(); tx++) {
                Raster t = img.getTile(tx, ty);
                java.awt.Rectangle r = t.getBounds().intersection(new java.awt.Rectangle(x0, y0, w, h));
                if (r.isEmpty()) {
                    continue;
                }
                if (t.getSampleModel() instanceof java.awt.image.ComponentSampleModel sm
                        && t.getDataBuffer() instanceof java.awt.image.DataBufferFloat db) {
                    float[] data = db.getData(sm.getBankIndices()[0]);
                    int ps = sm.getPixelStride(), ss = sm.getScanlineStride();
                    int base = db.getOffsets()[sm.getBankIndices()[0]] + sm.getBandOffsets()[0];
                    int tminX = t.getMinX() - t.getSampleModelTranslateX(), tminY = t.getMinY() - t.getSampleModelTranslateY();
                    for (int y = r.y; y < r.y + r.height; y++) {
                        int src = base + (y - t.getMinY() + tminY) * ss + (r.x - t.getMinX() + tminX) * ps;
                        int dst = (y - y0) * w + (r.x - x0);
                        if (ps == 1) {
                            System.arraycopy(data, src, out, dst, r.width);
                        } else {
                            for (int x = 0; x < r.width; x++) {
                                out[dst + x] = data[src + x * ps];
                            }
                        }
                    }
                } else {
                    float[] row = new float[r.width * r.height];
                    t.getSamples(r.x, r.y, r.width, r.height, 0, row);
                    for (int y = 0; y < r.height; y++) {
                        System.arraycopy(row, y * r.width, out, (r.y - y0 + y) * w + (r.x - x0), r.width);
                    }
                }
            }
        }
        return out;
    }

    static String firstLine(Exception e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl);
    }

}
