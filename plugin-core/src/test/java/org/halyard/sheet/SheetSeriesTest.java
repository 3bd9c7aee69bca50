package org.halyard.sheet;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A series at 1:1000 on A3 landscape: what the PDFs say and where they draw it. */
class SheetSeriesTest {

    @TempDir
    static Path dir;
    static SheetSet set;

    @BeforeAll
    static void writeSeries() {
        SheetOptions o = SheetOptions.defaults().withScale(1000).withDpi(150);
        set = SheetSeries.write(SheetFixture.request(new Coverage.AllContent(), o), dir);
    }

    static String text(Path pdf) throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(d);
        }
    }

    static PdfRecorder record(Path pdf) throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            PDPage p = d.getPage(0);
            return new PdfRecorder(p);
        }
    }

    @Test
    void tilesTheAreaIntoNumberedSheets() throws IOException {
        // 400 x 300 m of grid at 1:1000 on an A3 map frame of roughly 300 x 250 mm needs 2 x 2 sheets.
        assertThat(set.sheets()).hasSize(4);
        for (int i = 0; i < set.sheets().size(); i++) {
            assertThat(text(set.sheets().get(i))).contains("SHEET " + (i + 1) + " OF 4");
        }
        assertThat(text(set.index())).contains("INDEX TO SHEETS 1-4");
    }

    @Test
    void textNamesScaleCrsUnitsAndCautions() throws IOException {
        String t = text(set.sheets().get(0));
        assertThat(t).contains("SCALE 1:1000", "1:1000 at A3 landscape");
        assertThat(t).contains("WGS 84 / UTM zone 31N (EPSG:32631)", "World Geodetic System 1984");
        assertThat(t).contains("TOTAL FIELD (nT)", "Total field nT", "coordinates metres");
        assertThat(t).contains("Distances are Cartesian (grid) metres in EPSG:32631");
        assertThat(t).contains("Grid convergence");
        assertThat(t.replaceAll("\\s+", " ")).contains("never a clearance certificate",
                "Defer to local regulations, qualified explosive-ordnance specialists and licensed practice");
    }

    @Test
    void pageIsA3Landscape() throws IOException {
        try (PDDocument d = Loader.loadPDF(set.sheets().get(0).toFile())) {
            var box = d.getPage(0).getMediaBox();
            // ISO 216: A3 is 297 x 420 mm = 841.89 x 1190.55 pt, "842 x 1191 pt" in the issue.
            assertThat(box.getWidth()).isCloseTo(1190.55f, within(0.01f));
            assertThat(box.getHeight()).isCloseTo(841.89f, within(0.01f));
            assertThat(Math.round(box.getWidth())).isEqualTo(1191);
            assertThat(Math.round(box.getHeight())).isEqualTo(842);
        }
    }

    @Test
    void scaleBarLengthMatchesStatedScale() throws IOException {
        for (Path sheet : List.of(set.sheets().get(0), set.index())) {
            String t = text(sheet);
            Matcher m = Pattern.compile("SCALE 1:(\\d+)").matcher(t);
            assertThat(m.find()).isTrue();
            int denom = Integer.parseInt(m.group(1));
            PdfRecorder rec = record(sheet);
            List<PdfRecorder.Vertex> bar = rec.in("ScaleBar");
            double lo = bar.stream().mapToDouble(PdfRecorder.Vertex::x).min().orElseThrow();
            double hi = bar.stream().mapToDouble(PdfRecorder.Vertex::x).max().orElseThrow();
            double statedMetres = rec.words("ScaleBar").stream().map(PdfRecorder.Glyph::text)
                    .filter(s -> s.matches("\\d+(\\.\\d+)?")).mapToDouble(Double::parseDouble).max().orElseThrow();
            // Paper length of a ground distance at 1:N: metres * 1000 / N mm, 72/25.4 pt per mm (PDF points).
            double expectedPt = statedMetres * 1000.0 / denom * 72 / 25.4;
            assertThat(hi - lo).as("bar on %s", sheet.getFileName()).isCloseTo(expectedPt,
                    within(0.005 * expectedPt));
        }
    }

    @Test
    void ticksAreLinearInTheCrsAndLocateATarget() throws IOException {
        PdfRecorder rec = record(set.sheets().get(0));
        // Bottom-edge labels and ticks: the lowest row of "...mE" words and the vertical tick segments under
        // the frame.
        List<PdfRecorder.Glyph> labels = rec.words("CoordinateTicks").stream()
                .filter(g -> g.text().endsWith("mE")).toList();
        double bottomY = labels.stream().mapToDouble(PdfRecorder.Glyph::y).min().orElseThrow();
        List<PdfRecorder.Glyph> bottom = labels.stream().filter(g -> Math.abs(g.y() - bottomY) < 0.5)
                .sorted(Comparator.comparingDouble(PdfRecorder.Glyph::x)).toList();
        List<PdfRecorder.Vertex> v = rec.in("CoordinateTicks");
        double frameBottom = v.stream().mapToDouble(PdfRecorder.Vertex::y).filter(y -> y > bottomY).min().orElseThrow();
        List<Double> tickX = v.stream().filter(p -> Math.abs(p.y() - frameBottom) < 0.01)
                .map(PdfRecorder.Vertex::x).sorted().distinct().toList();
        assertThat(bottom).hasSizeGreaterThanOrEqualTo(3);
        assertThat(tickX).hasSameSizeAs(bottom);
        double[] east = bottom.stream().mapToDouble(g -> Double.parseDouble(g.text().replace("mE", ""))).toArray();
        double slope = (tickX.get(tickX.size() - 1) - tickX.get(0)) / (east[east.length - 1] - east[0]);
        // Points per metre at 1:1000: 72 / 0.0254 / 1000 (definition of the PDF point and of map scale).
        assertThat(slope).isCloseTo(72 / 0.0254 / 1000, within(0.005 * 72 / 0.0254 / 1000));
        for (int i = 0; i < east.length; i++) {
            assertThat(tickX.get(0) + (east[i] - east[0]) * slope).isCloseTo(tickX.get(i), within(0.05));
            assertThat(east[i] % 50).as("ticks on whole multiples of the 50 m interval").isEqualTo(0);
        }
        // Every target ring read back through the tick labels lands on its input position (SheetFixture).
        List<PdfRecorder.Vertex> marks = rec.in("Targets");
        List<PdfRecorder.Glyph> ids = rec.words("TargetLabel");
        int found = 0;
        for (PdfRecorder.Glyph id : ids) {
            int k = Integer.parseInt(id.text().substring(1)) - 1;
            // The symbol is the path whose centre is nearest left of the label.
            double best = Double.MAX_VALUE, bestX = 0;
            for (int path : marks.stream().map(PdfRecorder.Vertex::path).distinct().toList()) {
                List<PdfRecorder.Vertex> p = marks.stream().filter(q -> q.path() == path).toList();
                double cx = (p.stream().mapToDouble(PdfRecorder.Vertex::x).max().orElseThrow()
                        + p.stream().mapToDouble(PdfRecorder.Vertex::x).min().orElseThrow()) / 2;
                double cy = p.stream().mapToDouble(PdfRecorder.Vertex::y).average().orElseThrow();
                double d = Math.hypot(id.x() - cx, id.y() - cy);
                if (cx < id.x() && d < best) {
                    best = d;
                    bestX = cx;
                }
            }
            double easting = east[0] + (bestX - tickX.get(0)) / slope;
            assertThat(easting).as(id.text()).isCloseTo(SheetFixture.SOURCES[k][0], within(0.05));
            found++;
        }
        assertThat(found).isPositive();
    }

    @Test
    void rasterIsEmbeddedAtTheRequestedResolution() throws IOException {
        PdfRecorder rec = record(set.sheets().get(0));
        assertThat(rec.images).isNotEmpty();
        for (PdfRecorder.Placed p : rec.images) {
            // dots per inch = pixels / (points / 72)
            assertThat(p.pixelsWide() / (p.width() / 72)).isCloseTo(150, within(1.0));
        }
    }

    @Test
    void eachRasterLayerGetsItsOwnPage(@TempDir Path out) throws IOException {
        MapContent one = SheetFixture.content();
        RasterLayer first = one.rasters().get(0);
        RasterLayer second = SheetLayers.raster("Vertical derivative", first.grid(), "nT/m",
                SheetLayers.StretchKind.LINEAR);
        MapContent two = new MapContent(List.of(first, second), one.vectors(), one.targets());
        SheetSet s = SheetSeries.write(new SheetRequest(SheetFixture.title(), SheetFixture.CRS, two,
                new Coverage.AllContent(), SheetOptions.defaults().withDpi(50)), out);
        assertThat(s.sheets()).hasSize(1);
        try (PDDocument d = Loader.loadPDF(s.sheets().get(0).toFile())) {
            assertThat(d.getNumberOfPages()).isEqualTo(2);
            PDFTextStripper t = new PDFTextStripper();
            t.setStartPage(2);
            t.setEndPage(2);
            String p2 = t.getText(d);
            assertThat(p2).contains("VERTICAL DERIVATIVE (nT/m)", "SHEET 1 OF 1").doesNotContain("TOTAL FIELD (nT)");
        }
    }

    @Test
    void footprintsOverlapByTheRequestedFraction() {
        SheetFootprint a = set.footprints().get(0), b = set.footprints().get(1);
        double width = a.east() - a.west();
        assertThat(a.east() - b.west()).isCloseTo(0.1 * width, within(1e-6));
        assertThat(a.north()).isEqualTo(b.north());
    }
}
