package org.halyard.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LinesCommandTest {

    @TempDir
    Path dir;

    private String run(int expectedCode, String... args) {
        PrintStream oldErr = System.err, oldOut = System.out;
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try {
            System.setErr(new PrintStream(err, true));
            System.setOut(new PrintStream(new ByteArrayOutputStream(), true));
            assertThat(HalyardCli.execute(args)).isEqualTo(expectedCode);
        } finally {
            System.setErr(oldErr);
            System.setOut(oldOut);
        }
        return err.toString();
    }

    @Test
    void processesAFileAndRefusesBadInputWithOneLineAndNoOutput() throws Exception {
        StringBuilder sb = new StringBuilder("line,time,x,y,mag_port,mag_stbd\n");
        for (int l = 0; l < 3; l++) {
            for (int i = 0; i < 300; i++) {
                sb.append(l < 2 ? "L" + l : "T1").append(",2026-05-14T09:").append(10 + l * 10).append(':')
                        .append(String.format(java.util.Locale.ROOT, "%04.1f", i * 0.1)).append("Z,");
                if (l < 2) {
                    sb.append(500000 + 10 * l).append(',').append(6100000 + i * 0.2);
                } else {
                    sb.append(499995 + i * 0.2).append(',').append(6100030);
                }
                sb.append(',').append(49000 + l).append(',').append(49000.5 + l).append('\n');
            }
        }
        Path csv = dir.resolve("lines.csv");
        Files.writeString(csv, sb.toString());
        Path out = dir.resolve("out");
        run(0, "lines", csv.toString(), "--out", out.toString(), "--crs", "EPSG:32631",
                "--sensor", "mag_port:-0.75", "--sensor", "mag_stbd:0.75", "--tie", "T1");
        assertThat(out.resolve("lines_processed.csv")).exists();
        assertThat(out.resolve("report/qc.html")).exists();

        Path out2 = dir.resolve("out2");
        String err = run(1, "lines", csv.toString(), "--out", out2.toString(), "--crs", "EPSG:32631",
                "--sensor", "mag_bow:0");
        assertThat(err).startsWith("error: ").contains("lines.csv").contains("mag_bow")
                .contains("columns present: line, time, x, y, mag_port, mag_stbd");
        assertThat(err.lines().count()).isEqualTo(1);
        assertThat(out2).doesNotExist();
    }
}
