package org.halyard.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;

/**
 * Writes a grid in an EPSG-coded projected CRS as a single-band float32 GeoTIFF: little-endian, uncompressed
 * strips of about 64 KiB, pixel-is-area, the CRS as its EPSG code, blanks as a nodata value in GDAL's nodata
 * tag.
 *
 * <p>Layout (TIFF 6.0, Adobe 1992, sections 2, 7 and 19 for SampleFormat; GeoTIFF, OGC 19-008r4, for the
 * model tags and geokeys; tag 42113 as GDAL documents it): header, the pixel strips, then the image file
 * directory with its out-of-line values. One pass, strip by strip, so writing needs a strip of memory, not
 * a copy of the grid, and runs at the speed of the disk.
 *
 * <p>Why not GeoTools' writer: it converts float samples one at a time through the generic raster path,
 * most of a second for a 4096 x 4096 grid.
 */
final class FloatGeoTiffWriter {

    private static final int STRIP_BYTES = 64 * 1024;
    private static final short SHORT = 3, LONG = 4, DOUBLE = 12, ASCII = 2;

    private FloatGeoTiffWriter() {
    }

    /**
     * Writes {@code grid} to {@code file} (created or replaced), blanks as {@code nodata}.
     *
     * @param epsg the EPSG code of the grid's projected CRS
     */
    static void write(Grid grid, int epsg, float nodata, Path file) throws IOException {
        GridGeometry g = grid.geometry();
        int w = g.columns(), h = g.rows();
        long rowBytes = 4L * w;
        int rowsPerStrip = (int) Math.max(1, Math.min(h, STRIP_BYTES / rowBytes));
        int strips = (h + rowsPerStrip - 1) / rowsPerStrip;
        long dataBytes = rowBytes * h;
        if (8 + dataBytes + 4096L + 8L * strips > 0xFFFF_FFFFL) {
            throw new IOException("grid of " + w + " x " + h + " is too large for a classic TIFF (4 GiB)");
        }
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            ByteBuffer head = le(8);
            head.put((byte) 'I').put((byte) 'I').putShort((short) 42).putInt((int) (8 + dataBytes + (dataBytes & 1)));
            writeAll(ch, head.flip());
            writePixels(ch, grid, nodata, rowsPerStrip);
            if ((dataBytes & 1) != 0) {
                writeAll(ch, le(1).put((byte) 0).flip()); // the directory starts on a word boundary
            }
            writeAll(ch, directory(g, epsg, nodata, 8 + dataBytes + (dataBytes & 1), rowsPerStrip, strips).flip());
        }
    }

    private static void writePixels(FileChannel ch, Grid grid, float nodata, int rowsPerStrip) throws IOException {
        int w = grid.columns(), h = grid.rows();
        ByteBuffer buf = ByteBuffer.allocateDirect(4 * w * rowsPerStrip).order(ByteOrder.LITTLE_ENDIAN);
        for (int r0 = 0; r0 < h; r0 += rowsPerStrip) {
            buf.clear();
            for (int i = r0 * w, end = Math.min(h, r0 + rowsPerStrip) * w; i < end; i++) {
                float v = grid.get(i);
                buf.putFloat(Float.isNaN(v) ? nodata : v);
            }
            writeAll(ch, buf.flip());
        }
    }

    /** The image file directory at file offset {@code at}, with its out-of-line values after it. */
    private static ByteBuffer directory(GridGeometry g, int epsg, float nodata, long at, int rowsPerStrip, int strips) {
        int h = g.rows();
        long rowBytes = 4L * g.columns();
        byte[] nodataText = (formatNoData(nodata) + "\0").getBytes(StandardCharsets.US_ASCII);
        short[] geoKeys = {
            1, 1, 0, 3,                    // directory version 1, key revision 1.0, three keys
            1024, 0, 1, 1,                 // GTModelTypeGeoKey: projected
            1025, 0, 1, 1,                 // GTRasterTypeGeoKey: pixel is area
            3072, 0, 1, (short) epsg,      // ProjectedCSTypeGeoKey: the EPSG code
        };
        Entry[] entries = {
            Entry.longs(256, g.columns()),
            Entry.longs(257, h),
            Entry.shorts(258, (short) 32),
            Entry.shorts(259, (short) 1),                 // no compression
            Entry.shorts(262, (short) 1),                 // black is zero
            Entry.longs(273, stripValues(strips, i -> 8 + (long) i * rowsPerStrip * rowBytes)),
            Entry.shorts(277, (short) 1),
            Entry.longs(278, rowsPerStrip),
            Entry.longs(279, stripValues(strips, i -> Math.min(rowsPerStrip, h - (long) i * rowsPerStrip) * rowBytes)),
            Entry.shorts(284, (short) 1),                 // contiguous
            Entry.shorts(339, (short) 3),                 // IEEE floating point
            Entry.doubles(33550, g.cellSize(), g.cellSize(), 0),
            Entry.doubles(33922, 0, 0, 0, g.west(), g.north(), 0),
            Entry.shorts(34735, geoKeys),
            new Entry(42113, ASCII, nodataText.length, nodataText),
        };
        int ifdBytes = 2 + 12 * entries.length + 4;
        int extra = 0;
        for (Entry e : entries) {
            extra += e.outOfLine() ? (e.data.length + 1) & ~1 : 0;
        }
        ByteBuffer b = le(ifdBytes + extra);
        long next = at + ifdBytes;
        b.putShort((short) entries.length);
        ByteBuffer values = le(extra);
        for (Entry e : entries) {
            b.putShort((short) e.tag).putShort(e.type).putInt(e.count);
            if (e.outOfLine()) {
                b.putInt((int) (next + values.position()));
                values.put(e.data);
                if ((e.data.length & 1) != 0) {
                    values.put((byte) 0);
                }
            } else {
                byte[] four = new byte[4];
                System.arraycopy(e.data, 0, four, 0, e.data.length);
                b.put(four);
            }
        }
        b.putInt(0); // no further directory
        b.put(values.flip());
        return b;
    }

    private static long[] stripValues(int strips, java.util.function.IntToLongFunction f) {
        long[] v = new long[strips];
        for (int i = 0; i < strips; i++) {
            v[i] = f.applyAsLong(i);
        }
        return v;
    }

    /** The nodata value as GDAL writes it: an integer when it is one. */
    private static String formatNoData(float v) {
        return v == Math.rint(v) && Math.abs(v) < 1e9 ? Long.toString((long) v) : Float.toString(v);
    }

    private static ByteBuffer le(int n) {
        return ByteBuffer.allocate(n).order(ByteOrder.LITTLE_ENDIAN);
    }

    private static void writeAll(FileChannel ch, ByteBuffer b) throws IOException {
        while (b.hasRemaining()) {
            ch.write(b);
        }
    }

    /** One directory entry: tag, field type, value count and the values as little-endian bytes. */
    private record Entry(int tag, short type, int count, byte[] data) {

        boolean outOfLine() {
            return data.length > 4;
        }

        static Entry shorts(int tag, short... v) {
            ByteBuffer b = le(2 * v.length);
            for (short s : v) {
                b.putShort(s);
            }
            return new Entry(tag, SHORT, v.length, b.array());
        }

        static Entry longs(int tag, long... v) {
            ByteBuffer b = le(4 * v.length);
            for (long l : v) {
                b.putInt((int) l);
            }
            return new Entry(tag, LONG, v.length, b.array());
        }

        static Entry doubles(int tag, double... v) {
            ByteBuffer b = le(8 * v.length);
            for (double d : v) {
                b.putDouble(d);
            }
            return new Entry(tag, DOUBLE, v.length, b.array());
        }
    }
}
