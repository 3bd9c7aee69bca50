package org.halyard.sheet;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The latitude/longitude lines drawn on a sheet, read back and checked with PROJ. */
@Tag("external")
class GraticuleTest {

    @TempDir
    Path dir;

    @Test
    void graticuleLinesLieOnTheirLatitudeOrLongitude() throws IOException {
        ExternalTools.require("proj");
        SheetOptions o = SheetOptions.defaults().withScale(2500).withDpi(72).withGraticule(true);
        SheetSet set = SheetSeries.write(SheetFixture.request(new Coverage.AllContent(), o), dir);
        SheetFootprint fp = set.footprints().get(0);
        PdfRecorder rec;
        try (PDDocument d = Loader.loadPDF(set.sheets().get(0).toFile())) {
            rec = new PdfRecorder(d.getPage(0));
        }
        List<PdfRecorder.Vertex> neat = rec.in("Neatline");
        double fx = neat.stream().mapToDouble(PdfRecorder.Vertex::x).min().orElseThrow();
        double fy = neat.stream().mapToDouble(PdfRecorder.Vertex::y).min().orElseThrow();
        double ppm = 72 / 0.0254 / set.scaleDenominator(); // points per ground metre at the sheet scale
        Map<Integer, List<PdfRecorder.Vertex>> paths = rec.in("Graticule").stream()
                .collect(Collectors.groupingBy(PdfRecorder.Vertex::path));
        StringBuilder in = new StringBuilder();
        List<Integer> order = new ArrayList<>(paths.keySet());
        for (int k : order) {
            for (PdfRecorder.Vertex v : paths.get(k)) {
                in.append(String.format(Locale.ROOT, "%.4f %.4f%n", fp.west() + (v.x() - fx) / ppm,
                        fp.south() + (v.y() - fy) / ppm));
            }
        }
        String out = ExternalTools.run(List.of("sh", "-c", "proj -I -f %.10f +proj=utm +zone=31 +datum=WGS84 <<'EOF'\n"
                + in + "EOF"), null).orFail();
        String[] lines = out.trim().split("\n");
        // Meridian labels are rotated, so their glyphs come as separate words: compare without spaces.
        String labels = String.join(" ", rec.words("GraticuleLabel").stream().map(PdfRecorder.Glyph::text).toList())
                .replace(" ", "");
        int line = 0;
        int checked = 0;
        for (int k : order) {
            int n = paths.get(k).size();
            double[] lon = new double[n], lat = new double[n];
            for (int i = 0; i < n; i++) {
                String[] f = lines[line++].trim().split("\\s+");
                lon[i] = Double.parseDouble(f[0]);
                lat[i] = Double.parseDouble(f[1]);
            }
            boolean parallel = range(lat) < range(lon);
            double[] along = parallel ? lat : lon;
            double value = along[0];
            for (double a : along) {
                // 3e-7 degree is about 3 cm: PDF coordinates are written with about 1e-4 pt precision.
                assertThat(a).isCloseTo(value, within(3e-7));
            }
            String label = Graticule.dms(value, parallel ? "N" : "E", parallel ? "S" : "W");
            assertThat(labels).as("label for a line at %s", label).contains(label);
            checked++;
        }
        assertThat(checked).isGreaterThanOrEqualTo(3);
    }

    @Test
    void printedConvergenceMatchesProjAtThePrintedPoint() throws IOException {
        ExternalTools.require("proj");
        SheetSet set = SheetSeries.write(SheetFixture.request(new Coverage.AllContent(),
                SheetOptions.defaults().withDpi(50)), dir);
        String text;
        try (PDDocument d = Loader.loadPDF(set.sheets().get(0).toFile())) {
            text = new org.apache.pdfbox.text.PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
        var m = java.util.regex.Pattern.compile(
                "Grid convergence ([+-][0-9.]+)\u00b0 at sheet centre (\\d+)mE (\\d+)mN").matcher(text);
        assertThat(m.find()).as(text).isTrue();
        String out = ExternalTools.run(List.of("sh", "-c", "echo '" + m.group(2) + " " + m.group(3)
                + "' | proj -I -f %.10f +proj=utm +zone=31 +datum=WGS84 | proj -V +proj=utm +zone=31 +datum=WGS84"),
                null).orFail();
        var c = java.util.regex.Pattern.compile("Convergence : .*\\[\\s*(-?[0-9.]+)\\s*]").matcher(out);
        assertThat(c.find()).as(out).isTrue();
        // PROJ 'proj -V' meridian convergence; the sheet prints three decimals.
        assertThat(Double.parseDouble(m.group(1))).isCloseTo(Double.parseDouble(c.group(1)), within(0.0006));
    }

    private static double range(double[] a) {
        double lo = Double.MAX_VALUE, hi = -Double.MAX_VALUE;
        for (double v : a) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        return hi - lo;
    }
}
