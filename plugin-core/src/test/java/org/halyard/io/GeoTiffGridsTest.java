package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.GridRows;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GeoTiffGridsTest {

    @TempDir
    Path dir;

    private static Grid sample() {
        GridGeometry g = new GridGeometry(7, 5, 500123.25, 5800456.5, 0.25, "EPSG:32631");
        Grid grid = Grid.sample(g, (x, y) -> (x - 500123) * 3 + (y - 5800455) * 0.5);
        float[] v = grid.toArray();
        v[g.index(2, 3)] = Float.NaN;
        return Grid.of(g, v);
    }

    @Test
    void roundTripKeepsValuesBlanksGeometryAndCrs() throws IOException {
        Grid grid = sample();
        Path f = dir.resolve("a.tif");
        GeoTiffGrids.write(grid, f);
        Grid back = GeoTiffGrids.read(f);
        assertThat(back.geometry()).isEqualTo(grid.geometry());
        assertThat(back.toArray()).containsExactly(grid.toArray());
        assertThat(Files.list(dir).map(p -> p.getFileName().toString())).containsExactly("a.tif");
    }

    @Test
    void openReadsTheValuesStraightIntoStridedRowsOnce() throws IOException {
        Grid grid = sample();
        Path f = dir.resolve("s.tif");
        GeoTiffGrids.write(grid, f);
        GridRows rows = GeoTiffGrids.open(f);
        assertThat(rows.geometry()).isEqualTo(grid.geometry());
        int w = grid.columns(), stride = w + 4;
        float[] dst = new float[grid.rows() * stride];
        java.util.Arrays.fill(dst, 7f);
        rows.copyRows(dst, stride);
        for (int r = 0; r < grid.rows(); r++) {
            for (int c = 0; c < stride; c++) {
                // data cells as written (blank stays NaN); the caller's pad cells untouched
                assertThat(Float.valueOf(dst[r * stride + c])).isEqualTo(Float.valueOf(c < w ? grid.get(c, r) : 7f));
            }
        }
        assertThatThrownBy(() -> rows.copyRows(dst, stride)).isInstanceOf(IllegalStateException.class);
    }

    @Test
    void openReadsALargeGridInPartsIntoTheRightRows() throws IOException {
        // above a million cells the rows are decoded in two parts on two threads
        GridGeometry g = new GridGeometry(1100, 1001, 300000, 6200000, 0.5, "EPSG:32632");
        float[] v = Grid.sample(g, (x, y) -> (x - 300000) * 0.01 + (y - 6199000) * 0.37).toArray();
        v[g.index(5, 3)] = Float.NaN;
        v[g.index(1000, 900)] = Float.NaN;
        Path f = dir.resolve("big.tif");
        GeoTiffGrids.write(Grid.of(g, v), f);
        int stride = g.columns() + 6;
        float[] dst = new float[g.rows() * stride];
        GeoTiffGrids.open(f).copyRows(dst, stride);
        for (int r = 0; r < g.rows(); r++) {
            for (int c = 0; c < g.columns(); c++) {
                assertThat(Float.valueOf(dst[r * stride + c])).as("row " + r + " column " + c)
                        .isEqualTo(Float.valueOf(v[g.index(c, r)]));
            }
        }
    }

    @Test
    @Tag("external")
    void openReadsOtherSampleTypesThroughTheCoverage() throws IOException {
        ExternalTools.require("gdal_translate");
        Path asc = dir.resolve("i.asc");
        Files.writeString(asc, "ncols 3\nnrows 2\nxllcorner 400000\nyllcorner 6000000\ncellsize 2\n"
                + "NODATA_value -9999\n1 2 3\n4 -9999 6\n");
        for (String type : List.of("Int16", "Float64")) {
            Path tif = dir.resolve(type + ".tif");
            ExternalTools.run(List.of("gdal_translate", "-q", "-a_srs", "EPSG:32630", "-ot", type,
                    asc.toString(), tif.toString()), null).orFail();
            GridRows rows = GeoTiffGrids.open(tif);
            float[] dst = new float[2 * 5];
            rows.copyRows(dst, 5);
            // the ASCII grid's values, row 0 north; GDAL carries the nodata value into the TIFF
            assertThat(dst).as(type).containsExactly(1, 2, 3, 0, 0, 4, Float.NaN, 6, 0, 0);
        }
    }

    @Test
    @Tag("external")
    void openReadsBandOneOfAMultiBandFloatGrid() throws IOException {
        ExternalTools.require("gdal_translate");
        // two float32 bands in ENVI raw layout (band sequential, little-endian): band 1 = i, band 2 = 7
        int w = 5, h = 3;
        java.nio.ByteBuffer raw = java.nio.ByteBuffer.allocate(4 * 2 * w * h).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        for (int i = 0; i < w * h; i++) {
            raw.putFloat(i);
        }
        for (int i = 0; i < w * h; i++) {
            raw.putFloat(7);
        }
        Path bin = dir.resolve("two.f32");
        Files.write(bin, raw.array());
        Files.writeString(dir.resolve("two.hdr"), "ENVI\nsamples = 5\nlines = 3\nbands = 2\nheader offset = 0\n"
                + "file type = ENVI Standard\ndata type = 4\ninterleave = bsq\nbyte order = 0\n"
                + "map info = {UTM, 1, 1, 400000, 6000000, 2, 2, 31, North, WGS-84}\n");
        for (String interleave : List.of("PIXEL", "BAND")) {
            Path tif = dir.resolve("two-" + interleave + ".tif");
            ExternalTools.run(List.of("gdal_translate", "-q", "-a_srs", "EPSG:32631", "-co", "INTERLEAVE=" + interleave,
                    bin.toString(), tif.toString()), null).orFail();
            float[] dst = new float[h * w];
            GeoTiffGrids.open(tif).copyRows(dst, w);
            for (int i = 0; i < w * h; i++) {
                assertThat(dst[i]).as(interleave + " cell " + i).isEqualTo((float) i);
            }
        }
    }

    @Test
    @Tag("external")
    void gdalSeesEpsgGeotransformAndNodataAsWritten() throws IOException {
        ExternalTools.require("gdalinfo");
        Path f = dir.resolve("b.tif");
        GeoTiffGrids.write(sample(), f);
        // Reference: GDAL's own reading of the file (gdalinfo -json).
        JsonNode info = new ObjectMapper().readTree(
                ExternalTools.run(List.of("gdalinfo", "-json", f.toString()), null).orFail());
        JsonNode gt = info.get("geoTransform");
        assertThat(gt.get(0).asDouble()).isEqualTo(500123.25);
        assertThat(gt.get(1).asDouble()).isEqualTo(0.25);
        assertThat(gt.get(2).asDouble()).isEqualTo(0.0);
        assertThat(gt.get(3).asDouble()).isEqualTo(5800456.5);
        assertThat(gt.get(4).asDouble()).isEqualTo(0.0);
        assertThat(gt.get(5).asDouble()).isEqualTo(-0.25);
        JsonNode band = info.get("bands").get(0);
        assertThat(band.get("type").asText()).isEqualTo("Float32");
        assertThat(band.get("noDataValue").asDouble()).isEqualTo(GeoTiffGrids.NODATA);
        String wkt = info.get("coordinateSystem").get("wkt").asText();
        assertThat(wkt).contains("ID[\"EPSG\",32631]").contains("UTM zone 31N");
        assertThat(info.get("size").get(0).asInt()).isEqualTo(7);
        assertThat(info.get("size").get(1).asInt()).isEqualTo(5);
        // The value GDAL reads at a cell matches what we wrote (gdallocationinfo, pixel 4 line 1).
        String loc = ExternalTools.run(List.of("gdallocationinfo", "-valonly", f.toString(), "4", "1"), null).orFail();
        assertThat(Double.parseDouble(loc.trim())).isCloseTo(sample().get(4, 1), org.assertj.core.data.Offset.offset(1e-4));
    }

    @Test
    @Tag("external")
    void gdalReadsEveryCellOfAManyStripGridAsWritten() throws IOException {
        ExternalTools.require("gdal_translate");
        // 301 columns: 54 rows a 64 KiB strip, so 97 rows end in a part strip; blanks on a diagonal
        GridGeometry g = new GridGeometry(301, 97, 612345.5, 4987654.25, 1.5, "EPSG:32629");
        float[] v = Grid.sample(g, (x, y) -> Math.sin(x / 7) * 40 + (y - 4987600) * 0.01).toArray();
        for (int r = 0; r < g.rows(); r++) {
            v[g.index(r * 3, r)] = Float.NaN;
        }
        Path f = dir.resolve("m.tif"), raw = dir.resolve("m.f32");
        GeoTiffGrids.write(Grid.of(g, v), f);
        // Reference: GDAL's decoding of the file, dumped as raw little-endian float32 (ENVI).
        String err = ExternalTools.run(List.of("gdal_translate", "-q", "-of", "ENVI", f.toString(), raw.toString()), null).orFail();
        java.nio.ByteBuffer b = java.nio.ByteBuffer.wrap(Files.readAllBytes(raw)).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        assertThat(b.remaining()).isEqualTo(4 * g.size());
        for (int i = 0; i < g.size(); i++) {
            float got = b.getFloat();
            assertThat(Float.valueOf(got)).as("cell " + i).isEqualTo(Float.isNaN(v[i]) ? GeoTiffGrids.NODATA : v[i]);
        }
        assertThat(err).doesNotContainIgnoringCase("warning");
        assertThat(GeoTiffGrids.read(f).toArray()).containsExactly(v);
    }

    @Test
    @Tag("external")
    void readsGridWrittenByGdal() throws IOException {
        ExternalTools.require("gdal_translate");
        Path asc = dir.resolve("g.asc");
        Files.writeString(asc, "ncols 3\nnrows 2\nxllcorner 400000\nyllcorner 6000000\ncellsize 2\n"
                + "NODATA_value -9999\n1 2 3\n4 -9999 6\n");
        Path tif = dir.resolve("g.tif");
        ExternalTools.run(List.of("gdal_translate", "-q", "-a_srs", "EPSG:32630", "-ot", "Float32",
                asc.toString(), tif.toString()), null).orFail();
        Grid g = GeoTiffGrids.read(tif);
        // ESRI ASCII grid: first data row is the north row, xllcorner/yllcorner the outer lower-left corner.
        assertThat(g.geometry()).isEqualTo(new GridGeometry(3, 2, 400000, 6000004, 2, "EPSG:32630"));
        // the header from the GeoTIFF keys alone (open) agrees with the one GeoTools builds (read)
        assertThat(GeoTiffGrids.open(tif).geometry()).isEqualTo(g.geometry());
        assertThat(g.get(0, 0)).isEqualTo(1f);
        assertThat(g.get(2, 1)).isEqualTo(6f);
        assertThat(g.get(1, 1)).isNaN();
    }

    @Test
    @Tag("external")
    void refusesDegreesMissingCrsAndBlankGrids() throws IOException {
        ExternalTools.require("gdal_translate");
        Path asc = dir.resolve("d.asc");
        Files.writeString(asc, "ncols 2\nnrows 2\nxllcorner 2\nyllcorner 51\ncellsize 0.001\n"
                + "NODATA_value -9999\n1 2\n3 4\n");
        Path deg = dir.resolve("deg.tif");
        ExternalTools.run(List.of("gdal_translate", "-q", "-a_srs", "EPSG:4326", asc.toString(), deg.toString()), null).orFail();
        assertThatThrownBy(() -> GeoTiffGrids.read(deg)).hasMessageContaining("geographic CRS");
        assertThatThrownBy(() -> GeoTiffGrids.open(deg)).hasMessageContaining("geographic CRS");
        Path nocrs = dir.resolve("nocrs.tif");
        ExternalTools.run(List.of("gdal_translate", "-q", asc.toString(), nocrs.toString()), null).orFail();
        assertThatThrownBy(() -> GeoTiffGrids.read(nocrs)).hasMessageContaining("coordinate reference system");
        assertThatThrownBy(() -> GeoTiffGrids.open(nocrs)).hasMessageContaining("coordinate reference system");
        Files.writeString(asc, "ncols 2\nnrows 1\nxllcorner 400000\nyllcorner 6000000\ncellsize 1\n"
                + "NODATA_value -9999\n-9999 -9999\n");
        Path blank = dir.resolve("blank.tif");
        ExternalTools.run(List.of("gdal_translate", "-q", "-a_srs", "EPSG:32631", asc.toString(), blank.toString()), null).orFail();
        assertThatThrownBy(() -> GeoTiffGrids.read(blank)).hasMessageContaining("blank");
        assertThatThrownBy(() -> GeoTiffGrids.open(blank).copyRows(new float[2], 2)).hasMessageContaining("blank");
    }

    @Test
    void writesOnlyGridsInProjectedCrss() {
        GridGeometry g = new GridGeometry(2, 2, 2, 51, 0.001, "EPSG:4326");
        assertThatThrownBy(() -> GeoTiffGrids.write(Grid.filled(g, 1f), dir.resolve("deg.tif")))
                .hasMessageContaining("not an EPSG-coded projected CRS");
        GridGeometry unknown = new GridGeometry(2, 2, 0, 0, 1, "EPSG:99999");
        assertThatThrownBy(() -> GeoTiffGrids.write(Grid.filled(unknown, 1f), dir.resolve("u.tif")))
                .hasMessageContaining("unknown CRS code");
        assertThat(dir.toFile().list()).isEmpty();
    }

    @Test
    void refusesMissingAndNonTiffFiles() throws IOException {
        assertThatThrownBy(() -> GeoTiffGrids.read(dir.resolve("none.tif"))).hasMessageContaining("no such file");
        Path txt = dir.resolve("x.tif");
        Files.writeString(txt, "this is not a tiff");
        assertThatThrownBy(() -> GeoTiffGrids.read(txt)).hasMessageContaining("not a readable GeoTIFF");
        assertThatThrownBy(() -> GeoTiffGrids.open(dir.resolve("none.tif"))).hasMessageContaining("no such file");
        assertThatThrownBy(() -> GeoTiffGrids.open(txt)).hasMessageContaining("not a readable GeoTIFF");
    }
}
