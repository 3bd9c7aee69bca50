package org.halyard.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.io.GeoTiffGrids;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code halyard sheet} end to end: a GeoTIFF and a target CSV in, PDFs out; bad input, one-line error. */
class SheetCommandTest {

    @TempDir
    Path dir;

    private Path grid() {
        FieldDirection f = new FieldDirection(66, 1.5);
        Dipole d = Dipole.along(300_150, 6_100_080, 2.5, 40, f);
        Grid g = Grid.sample(new GridGeometry(300, 200, 300_000, 6_100_200, 1.0, "EPSG:32631"),
                (x, y) -> d.totalField(x, y, 0, f));
        Path tif = dir.resolve("total_field.tif");
        GeoTiffGrids.write(g, tif);
        return tif;
    }

    @Test
    void writesSheetsIndexAndTargetList() throws IOException {
        Path targets = dir.resolve("targets.csv");
        Files.writeString(targets, "id,x,y,class,depth_below_sensor_m,asset\nT001,300150,6100080,discrete,2.5,\n"
                + "T002,300210,6100120,linear,1.9,CAB-7\n");
        Path qc = dir.resolve("qc.csv");
        Files.writeString(qc, "check,value,limit,verdict\nLine spacing,2.6 m,<= 3 m,pass\nnote,Fictional data.,,\n");
        Path out = dir.resolve("sheets");
        int code = HalyardCli.execute("sheet", grid().toString(), "--targets", targets.toString(), "--qc",
                qc.toString(), "--out", out.toString(), "--paper", "A4", "--scale", "1:1000", "--dpi", "100",
                "--project", "Test block", "--revision", "C");
        assertThat(code).isZero();
        assertThat(out.resolve("index.pdf")).exists();
        assertThat(out.resolve("target-list.pdf")).exists();
        assertThat(out.resolve("qc-summary.pdf")).exists();
        try (PDDocument d = Loader.loadPDF(out.resolve("sheet-01.pdf").toFile())) {
            String t = new PDFTextStripper().getText(d);
            assertThat(t).contains("SCALE 1:1000", "EPSG:32631", "TOTAL FIELD (nT)", "Test block", "SHEET 1 OF");
        }
        try (PDDocument d = Loader.loadPDF(out.resolve("index.pdf").toFile())) {
            assertThat(new PDFTextStripper().getText(d)).contains("INDEX TO SHEETS", "T001", "T002");
        }
        try (PDDocument d = Loader.loadPDF(out.resolve("target-list.pdf").toFile())) {
            assertThat(new PDFTextStripper().getText(d)).contains("CAB-7", "depth_below_sensor_m");
        }
    }

    @Test
    void missingColumnIsOneLineError() throws IOException {
        Path targets = dir.resolve("bad.csv");
        Files.writeString(targets, "id,east,north\nT1,1,2\n");
        PrintStream old = System.err;
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code;
        try {
            System.setErr(new PrintStream(err, true));
            code = HalyardCli.execute("sheet", grid().toString(), "--targets", targets.toString(), "--out",
                    dir.resolve("o").toString());
        } finally {
            System.setErr(old);
        }
        assertThat(code).isEqualTo(1);
        assertThat(err.toString().trim()).startsWith("error: ").contains("bad.csv", "no column 'x'")
                .doesNotContain("\n");
    }
}
