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
        return runBoth(expectedCode, args)[1];
    }

    /** Runs the CLI; returns {stdout, stderr}. */
    private String[] runBoth(int expectedCode, String... args) {
        PrintStream oldErr = System.err, oldOut = System.out;
        ByteArrayOutputStream err = new ByteArrayOutputStream(), out = new ByteArrayOutputStream();
        try {
            System.setErr(new PrintStream(err, true));
            System.setOut(new PrintStream(out, true));
            assertThat(HalyardCli.execute(args)).isEqualTo(expectedCode);
        } finally {
            System.setErr(oldErr);
            System.setOut(oldOut);
        }
        return new String[] {out.toString(), err.toString()};
    }

    @Test
    void estimatesAndAppliesTheLagAndMicroLevelsOnRequest() throws Exception {
        // eight alternating north-south lines 5 m apart over an east-west ridge, readings late by 0.3 s
        // (0.6 m at 2 m/s), and one tie line
        StringBuilder sb = new StringBuilder("line,time,x,y,mag_port,mag_stbd\n");
        double t0 = java.time.Instant.parse("2026-05-14T09:00:00Z").getEpochSecond();
        for (int l = 0; l < 9; l++) {
            for (int i = 0; i < 500; i++) {
                double t = t0 + l * 120 + i * 0.1;
                double x = l < 8 ? 500000 + 5 * l : 499998 + i * 0.1, y;
                double dir = (l & 1) == 0 ? 1 : -1;
                y = l < 8 ? 6100000 + (dir > 0 ? i * 0.2 : 100 - i * 0.2) : 6100050;
                double yr = l < 8 ? y - dir * 0.6 : y;
                double v = 49000 + 30 / (1 + Math.pow((yr - 6100040) / 3, 2)) + (l < 8 ? 0.4 * l % 3 : 0);
                sb.append(l < 8 ? "L" + l : "T1").append(',')
                        .append(java.time.Instant.ofEpochMilli(Math.round(t * 1000))).append(',')
                        .append(String.format(java.util.Locale.ROOT, "%.3f,%.3f,%.4f,%.4f", x, y, v, v)).append('\n');
            }
        }
        Path csv = dir.resolve("lag.csv");
        Files.writeString(csv, sb.toString());
        Path out = dir.resolve("lag-out");
        String[] r = runBoth(0, "lines", csv.toString(), "--out", out.toString(), "--crs", "EPSG:32631",
                "--sensor", "mag_port:-0.75", "--sensor", "mag_stbd:0.75", "--tie", "T1", "--apply-estimated-lag",
                "--micro-level", "--micro-limit", "1");
        assertThat(r[0]).contains("lag estimated from 7 pairs").contains("positions shifted along track")
                .contains("micro-levelling (after Minty 1991) of 8 traverse lines").contains("limit 1.00 nT");
        // construction above: 0.3 s; a fifth of the 0.1 s sample interval (as the kernel's test)
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("opposite-direction lines: (-?[0-9.]+) s").matcher(r[0]);
        assertThat(m.find()).isTrue();
        assertThat(Double.parseDouble(m.group(1))).isCloseTo(0.3, org.assertj.core.data.Offset.offset(0.02));
        assertThat(Files.readString(out.resolve("report/qc.html"))).contains("RMS of the applied correction");

        String err = run(1, "lines", csv.toString(), "--out", dir.resolve("bad").toString(), "--crs", "EPSG:32631",
                "--sensor", "mag_port:0", "--micro-limit", "2");
        assertThat(err).startsWith("error: ").contains("--micro-level");
        assertThat(err.lines().count()).isEqualTo(1);
        err = run(1, "lines", csv.toString(), "--out", dir.resolve("bad").toString(), "--crs", "EPSG:32631",
                "--sensor", "mag_port:0", "--lag", "0.2", "--apply-estimated-lag");
        assertThat(err).startsWith("error: ").contains("not both");
        assertThat(err.lines().count()).isEqualTo(1);
    }

    @Test
    void everyListedBadInputIsOneLineNamingFileLineAndColumn() throws Exception {
        // issue 3, "Bad input": each case through the command line, one line on stderr, no output folder
        String header = "line,time,x,y,mag\n";
        String row1 = "L1,2026-05-14T09:30:00.100Z,500000.0,6100000.0,49000.1\n";
        String[][] cases = {
                {"line,time,x,mag\n" + row1, "line 1", "missing column y", "columns present: line, time, x, mag"},
                {header + row1 + "L1,2026-05-14T09:30:00.200Z,500000.2,6100000.0,49k\n", "line 3", "column 'mag'", "not a number"},
                {header + row1 + "L1,2026-05-14T09:30:00.200Z,500000.2\n", "line 3", "column 'y'", "truncated"},
                {header + row1 + "L1,2026-05-14T09:30:00.000Z,500000.2,6100000.0,49000\n", "line 3", "column 'time'", "backwards"},
                {header + row1 + row1, "line 3", "column 'time'", "duplicate time"},
        };
        for (String[] c : cases) {
            Path csv = dir.resolve("bad.csv");
            Files.writeString(csv, c[0]);
            Path out = dir.resolve("never");
            String err = run(1, "lines", csv.toString(), "--out", out.toString(), "--crs", "EPSG:32631",
                    "--sensor", "mag:0");
            assertThat(err).as(c[2]).startsWith("error: ").contains("bad.csv").contains(c[1]).contains(c[2]).contains(c[3])
                    .doesNotContain("Exception").doesNotContain("\tat ");
            assertThat(err.lines().count()).isEqualTo(1);
            assertThat(out).doesNotExist();
        }
        // With --skip-bad-rows the same faults become one warning with the count and the first lines.
        StringBuilder mixed = new StringBuilder(header).append(row1);
        for (int i = 2; i <= 30; i++) {
            mixed.append(row1.replace("00.100Z", String.format(java.util.Locale.ROOT, "%02d.100Z", i))
                    .replace("49000.1", i % 10 == 0 ? "49k" : "49000." + i));
        }
        Path csvMixed = dir.resolve("mixed.csv");
        Files.writeString(csvMixed, mixed.toString());
        Path kept = dir.resolve("kept");
        String warn = run(0, "lines", csvMixed.toString(), "--out", kept.toString(), "--crs", "EPSG:32631",
                "--sensor", "mag:0", "--skip-bad-rows");
        // rows 10, 20 and 30 hold '49k': file lines 11, 21 and 31
        assertThat(warn).contains("warning: mixed.csv: skipped 3 rows").contains("line 11, column 'mag'")
                .contains("line 31");
        assertThat(kept.resolve("lines_processed.csv")).exists();
        Path csv = dir.resolve("good.csv");
        Files.writeString(csv, header + row1 + row1.replace("00.100Z", "00.200Z"));
        String err = run(1, "lines", csv.toString(), "--out", dir.resolve("never").toString(), "--crs", "EPSG:99999999",
                "--sensor", "mag:0");
        assertThat(err).startsWith("error: ").contains("EPSG:99999999").contains("unknown CRS code");
        assertThat(err.lines().count()).isEqualTo(1);
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
