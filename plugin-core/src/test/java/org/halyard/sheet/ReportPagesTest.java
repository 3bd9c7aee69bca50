package org.halyard.sheet;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Target table and QC pages: pagination, repeated headers, cautions, page sizes. */
class ReportPagesTest {

    @TempDir
    Path dir;

    static TableModel targets(int n) {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            rows.add(List.of(String.format("T%03d", i), String.format("%.1f", 512000 + i * 1.7),
                    String.format("%.1f", 5772000 + i * 0.9), i % 5 == 0 ? "linear" : "discrete",
                    String.format("%.2f", 1 + i % 7 * 0.3), i % 3 == 0 ? "" : "0.8", "12.5"));
        }
        return new TableModel("Target list", List.of("id", "x", "y", "class", "depth_below_sensor_m", "burial_m",
                "amplitude"), rows, List.of("Depths positive down, metres."));
    }

    @Test
    void longTargetListIsPaginatedWithHeaderAndCautionOnEveryPage() throws IOException {
        Path f = dir.resolve("targets.pdf");
        int pages = ReportPages.write(targets(150), SheetFixture.title(), new PageFormat(Paper.A4,
                Orientation.PORTRAIT), f);
        assertThat(pages).isGreaterThan(1);
        try (PDDocument d = Loader.loadPDF(f.toFile())) {
            assertThat(d.getNumberOfPages()).isEqualTo(pages);
            // ISO 216: A4 is 210 x 297 mm = 595.28 x 841.89 pt, "595 x 842 pt" in the issue.
            assertThat(Math.round(d.getPage(0).getMediaBox().getWidth())).isEqualTo(595);
            assertThat(Math.round(d.getPage(0).getMediaBox().getHeight())).isEqualTo(842);
            PDFTextStripper s = new PDFTextStripper();
            StringBuilder all = new StringBuilder();
            for (int p = 1; p <= pages; p++) {
                s.setStartPage(p);
                s.setEndPage(p);
                String t = s.getText(d);
                all.append(t);
                assertThat(t).contains("PAGE " + p + " OF " + pages, "depth_below_sensor_m", "CAUTION");
                assertThat(t.replaceAll("\\s+", " ")).contains("never a clearance certificate");
            }
            for (int i = 1; i <= 150; i++) {
                String id = String.format("T%03d", i);
                assertThat(all.toString().split(id, -1)).as(id).hasSize(2);
            }
            assertThat(all.toString()).contains("Depths positive down, metres.");
        }
    }

    @Test
    void qcSummaryPage() throws IOException {
        QcSummary qc = new QcSummary(List.of(
                new QcSummary.Check("Fourth-difference noise, mag_port", "0.021 nT", "< 0.05 nT", "pass"),
                new QcSummary.Check("Line spacing, 95th percentile", "2.7 m", "<= 3.0 m", "pass"),
                new QcSummary.Check("Sensor altitude, 95th percentile", "4.4 m", "<= 4.0 m", "warn")),
                List.of("Base station: no file given, diurnal correction skipped."));
        Path f = dir.resolve("qc.pdf");
        assertThat(ReportPages.write(qc.toTable(), SheetFixture.title(), new PageFormat(Paper.A4,
                Orientation.PORTRAIT), f)).isEqualTo(1);
        try (PDDocument d = Loader.loadPDF(f.toFile())) {
            String t = new PDFTextStripper().getText(d);
            assertThat(t).contains("QC SUMMARY", "0.021 nT", "warn", "diurnal correction skipped", "PAGE 1 OF 1");
        }
    }
}
