package org.halyard.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.halyard.grid.Grid;
import org.halyard.io.GeoTiffGrids;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code halyard grid} as CONTRACT.md writes it: a GeoTIFF on success, one {@code error:} line otherwise. */
class GridCommandTest {

    @TempDir
    Path dir;

    private record Run(int code, String err) {
    }

    private static Run run(String... args) {
        PrintStream old = System.err;
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        System.setErr(new PrintStream(buf, true, StandardCharsets.UTF_8));
        try {
            return new Run(HalyardCli.execute(args), buf.toString(StandardCharsets.UTF_8));
        } finally {
            System.setErr(old);
        }
    }

    private Path lines() throws Exception {
        StringBuilder sb = new StringBuilder("line,east,north,mag\n");
        for (int l = 0; l < 8; l++) {
            for (int i = 0; i <= 100; i++) {
                double x = 500000 + 2.0 * l + 0.1, y = 5800000 + 0.2 * i;
                sb.append(String.format(Locale.ROOT, "L%d,%.2f,%.2f,%.4f%n", l, x, y, 0.5 * (x - 500000) + 3));
            }
        }
        sb.append("L9,500001.00,5800001.00,\n"); // an empty value: skipped and counted
        Path p = dir.resolve("lines.csv");
        Files.writeString(p, sb);
        return p;
    }

    @Test
    void gridsACsvToAGeoTiff() throws Exception {
        Path out = dir.resolve("tf.tif");
        Run r = run("grid", lines().toString(), out.toString(), "--x", "east", "--y", "north", "--value", "mag",
                "--cell", "0.5", "--crs", "EPSG:32631");
        assertThat(r.code).as(r.err).isZero();
        assertThat(r.err).contains("1 rows skipped");
        Grid g = GeoTiffGrids.read(out);
        assertThat(g.geometry().crsCode()).isEqualTo("EPSG:32631");
        assertThat(g.geometry().cellSize()).isEqualTo(0.5);
        // Between the lines the data are a plane of slope 0.5 nT/m east; the spline in tension reproduces it
        // where data surround the cell (Smith and Wessel 1990: planes solve the interior equation).
        double x = 500007.25, y = 5800010.25;
        assertThat(g.valueAt(x, y)).isCloseTo(0.5 * (x - 500000) + 3, org.assertj.core.data.Offset.offset(0.05));
    }

    @Test
    void badInputGivesOneErrorLine() throws Exception {
        Path csv = lines();
        String out = dir.resolve("x.tif").toString();
        Run noColumn = run("grid", csv.toString(), out, "--x", "east", "--y", "north", "--value", "nope",
                "--cell", "0.5", "--crs", "EPSG:32631");
        assertThat(noColumn.code).isEqualTo(1);
        assertThat(noColumn.err.strip()).startsWith("error: ").contains("no column 'nope'").doesNotContain("\n");
        Run bigCell = run("grid", csv.toString(), out, "--x", "east", "--y", "north", "--value", "mag",
                "--cell", "50", "--crs", "EPSG:32631");
        assertThat(bigCell.err.strip()).startsWith("error: ").contains("too large for the data extent");
        Run noCrs = run("grid", csv.toString(), out, "--x", "east", "--y", "north", "--value", "mag", "--cell", "0.5");
        assertThat(noCrs.err.strip()).startsWith("error: ").contains("--crs");
        Path two = dir.resolve("two.csv");
        Files.writeString(two, "x,y,v\n1,2,3\n4,5,NaN\n6,7,8\n");
        Run few = run("grid", two.toString(), out, "--x", "x", "--y", "y", "--value", "v", "--cell", "1", "--crs",
                "EPSG:32631");
        assertThat(few.err.strip()).startsWith("error: ").contains("at least 3 rows").contains("1 rows skipped");
    }
}
