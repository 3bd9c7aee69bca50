package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.halyard.survey.ProcessedSurvey;
import org.halyard.survey.QcReportWriter;
import org.halyard.survey.SensorSpec;
import org.halyard.survey.SurveyColumns;
import org.halyard.survey.SurveyInput;
import org.halyard.survey.SurveyLines;
import org.halyard.survey.SurveyOptions;
import org.halyard.survey.SurveyProcessing;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SurveyCsvReaderTest {

    @TempDir
    Path dir;

    static final SurveyColumns COLS = SurveyColumns.projected("line", "time", "x", "y", "altitude", "depth",
            List.of(new SensorSpec("mag_port", -0.75, 0), new SensorSpec("mag_stbd", 0.75, 0)));

    static final String HEADER = "line,time,x,y,altitude,depth,mag_port,mag_stbd\n";

    private Path write(String text) throws IOException {
        Path p = dir.resolve("lines.csv");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void readsColumnsTimesAndInternsLineIds() throws IOException {
        Path p = write(HEADER
                + "L1,2026-05-14T09:30:00.100Z,500000.0,6100000.0,2.5,20.1,49000.125,49000.5\n"
                + "L1,2026-05-14T09:30:00.200Z,500000.2,6100000.0,2.4,20.1,49000.25,\n"
                + "L2,2026-05-14T09:40:00.000Z,500010.0,6100100.0,2.3,20.0,49001,49002\n");
        SurveyLines s = SurveyCsvReader.read(p, COLS, "EPSG:32631", null);
        assertThat(s.lineCount()).isEqualTo(2);
        assertThat(s.lineId(1)).isEqualTo("L2");
        assertThat(s.end(0)).isEqualTo(2);
        // reference: java.time.Instant's ISO 8601 parser
        assertThat(s.time()[0]).isEqualTo(java.time.Instant.parse("2026-05-14T09:30:00.100Z").toEpochMilli() / 1000.0);
        assertThat(s.values(1)[1]).isNaN();
        assertThat(s.altitude()[1]).isEqualTo(2.4f);
        assertThat(s.hasTime()).isTrue();
    }

    @Test
    void isoTimesAgreeWithJavaTime() {
        // reference: java.time.Instant.parse / toString (ISO 8601), across leap years and centuries
        java.util.Random r = new java.util.Random(11);
        for (int k = 0; k < 20000; k++) {
            long ms = (long) (r.nextDouble() * 8e12) - 2_000_000_000_000L;
            String s = java.time.Instant.ofEpochMilli(ms).toString();
            char[] c = s.toCharArray();
            assertThat(IsoTime.parse(c, 0, c.length)).as(s).isCloseTo(ms / 1000.0, within(1e-6));
            assertThat(IsoTime.parse(IsoTime.format(ms / 1000.0))).isCloseTo(ms / 1000.0, within(1e-6));
        }
        assertThat(IsoTime.format(java.time.Instant.parse("2024-02-29T23:59:59.999Z").toEpochMilli() / 1000.0))
                .isEqualTo("2024-02-29T23:59:59.999Z");
        assertThat(IsoTime.parse("2026-02-30T00:00:00Z")).isNaN();
        assertThat(IsoTime.parse("2026-05-14T09:30:00+02:00")).isNaN();
    }

    @Test
    void badInputNamesFileLineAndColumn() throws IOException {
        assertThatThrownBy(() -> SurveyCsvReader.read(write("line,time,x,y,mag_port\nL1,2026-05-14T09:30:00Z,1,2,3\n"),
                COLS, "EPSG:32631", null))
                .hasMessageContaining("lines.csv").hasMessageContaining("missing columns altitude, depth, mag_stbd")
                .hasMessageContaining("columns present: line, time, x, y, mag_port");
        String row1 = "L1,2026-05-14T09:30:00.100Z,500000.0,6100000.0,2.5,20.1,49000.1,49000.5\n";
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1
                + "L1,2026-05-14T09:30:00.200Z,500000.2,6100000.0,2.5,20.1,4900o.1,49000.5\n"), COLS, "EPSG:32631", null))
                .hasMessageContaining("line 3").hasMessageContaining("'mag_port'").hasMessageContaining("not a number");
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1 + "L1,2026-05-14T09:30:00.200Z,500000.2\n"),
                COLS, "EPSG:32631", null)).hasMessageContaining("line 3").hasMessageContaining("column 'y'")
                .hasMessageContaining("truncated");
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1
                + "L1,2026-05-14T09:30:00.000Z,500000.2,6100000.0,2.5,20.1,49000.1,49000.5\n"), COLS, "EPSG:32631", null))
                .hasMessageContaining("line 3").hasMessageContaining("'time'").hasMessageContaining("backwards");
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1 + row1), COLS, "EPSG:32631", null))
                .hasMessageContaining("line 3").hasMessageContaining("duplicate time");
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1
                + "L1,14/05/2026 09:30,500000.2,6100000.0,2.5,20.1,49000.1,49000.5\n"), COLS, "EPSG:32631", null))
                .hasMessageContaining("line 3").hasMessageContaining("not an ISO 8601");
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1), COLS, "EPSG:99999999", null))
                .hasMessageContaining("EPSG:99999999").hasMessageContaining("unknown CRS code");
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1), COLS, "EPSG:4326", null))
                .hasMessageContaining("not a projected CRS");
        String l2 = "L2,2026-05-14T09:31:00.000Z,500000.2,6100000.0,2.5,20.1,49000.1,49000.5\n";
        assertThatThrownBy(() -> SurveyCsvReader.read(write(HEADER + row1 + l2
                + row1.replace("00.100Z", "05.000Z")), COLS, "EPSG:32631", null))
                .hasMessageContaining("line 4").hasMessageContaining("contiguous");
        assertThatThrownBy(() -> new SurveyInput(SurveyCsvReader.read(write(HEADER + row1), COLS, "EPSG:32631", null),
                Set.of("T9"))).hasMessageContaining("tie line T9").hasMessageContaining("L1");
    }

    @Test
    void badRowsAreSkippedWhenAskedWithTheirCountAndFirstLines() throws IOException {
        String ok1 = "L1,2026-05-14T09:30:00.100Z,500000.0,6100000.0,2.5,20.1,49000.1,49000.5\n";
        String bad = "L1,2026-05-14T09:30:00.200Z,500000.2,6100000.0,2.5,20.1,4900o.1,49000.5\n"; // line 3
        String ok2 = "L1,2026-05-14T09:30:00.300Z,500000.4,6100000.0,2.5,20.1,49000.3,49000.7\n";
        String dup = ok2;                                                                           // line 5
        String cut = "L2,2026-05-14T09:31:00.000Z,500000.2\n";                                     // line 6
        String l2 = "L2,2026-05-14T09:31:00.100Z,500000.2,6100002.0,2.5,20.1,49001.0,49001.4\n";
        Path p = write(HEADER + ok1 + bad + ok2 + dup + cut + l2);
        List<String> warnings = new java.util.ArrayList<>();
        SurveyLines s = SurveyCsvReader.read(p, COLS, "EPSG:32631", true, warnings::add, null);
        assertThat(s.size()).isEqualTo(3);
        assertThat(s.lineCount()).isEqualTo(2);
        assertThat(s.values(0)).containsExactly(49000.1, 49000.3, 49001.0);
        assertThat(s.start(1)).isEqualTo(2);
        assertThat(warnings).hasSize(1);
        assertThat(warnings.get(0)).startsWith("lines.csv: skipped 3 rows").contains("line 3, column 'mag_port'")
                .contains("line 5").contains("duplicate time").contains("line 6").contains("truncated");
        // Without the option the first bad row stops the read, as before.
        assertThatThrownBy(() -> SurveyCsvReader.read(p, COLS, "EPSG:32631", false, warnings::add, null))
                .hasMessageContaining("line 3");
        // A line resuming after another is a layout fault and is never skipped.
        Path resumed = write(HEADER + ok1 + l2 + ok2);
        assertThatThrownBy(() -> SurveyCsvReader.read(resumed, COLS, "EPSG:32631", true, warnings::add, null))
                .hasMessageContaining("contiguous");
    }

    @Test
    void latitudeLongitudeAreProjectedWithGeoTools() throws IOException {
        SurveyColumns geo = new SurveyColumns("line", Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.of("lat"), Optional.of("lon"), Optional.empty(), Optional.empty(),
                List.of(new SensorSpec("m", 0, 0)));
        Path p = write("line,lat,lon,m\nL1,0.0,3.0,1\nL1,0.0,3.001,2\n");
        SurveyLines s = SurveyCsvReader.read(p, geo, "EPSG:32631", null);
        // UTM zone 31N: the central meridian 3 E on the equator maps to the false easting 500000 m,
        // northing 0 (definition of UTM, EPSG guidance note 7-2)
        assertThat(s.x()[0]).isCloseTo(500000, within(1e-6));
        assertThat(s.y()[0]).isCloseTo(0, within(1e-6));
        assertThat(s.hasTime()).isFalse();
        // 0.001 degree of longitude on the equator is k0 a (pi/180) 0.001 = 0.9996 * 6378137 * 1.745e-5 m (from memory)
        assertThat(s.x()[1] - s.x()[0]).isCloseTo(0.9996 * 6378137 * Math.toRadians(0.001), within(0.01));
    }

    @Test
    void endToEndWritesCsvAndReport() throws IOException {
        StringBuilder sb = new StringBuilder(HEADER);
        double t0 = java.time.Instant.parse("2026-05-14T09:30:00Z").getEpochSecond();
        for (int l = 0; l < 4; l++) {
            for (int i = 0; i < 500; i++) {
                double t = t0 + l * 100 + i * 0.1;
                double y = 6100000 + (l % 2 == 0 ? i * 0.2 : 100 - i * 0.2);
                double v = 49000 + Math.sin(y / 7) + (i == 250 && l == 1 ? 40 : 0);
                sb.append("L").append(l).append(',').append(IsoTime.format(t)).append(',').append(500000 + 10 * l).append(',')
                        .append(y).append(",2.0,20.0,").append(v).append(',').append(v + 0.01).append('\n');
            }
        }
        for (int i = 0; i < 250; i++) {
            double t = t0 + 1000 + i * 0.1;
            sb.append("T1,").append(IsoTime.format(t)).append(',').append(499995 + i * 0.2).append(",6100050.0,2.0,20.0,")
                    .append(49000 + Math.sin(50 / 7.0)).append(',').append(49000.01 + Math.sin(50 / 7.0)).append('\n');
        }
        SurveyLines s = SurveyCsvReader.read(write(sb.toString()), COLS, "EPSG:32631", null);
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(s, Set.of("T1")),
                SurveyOptions.defaults().withLimits(1.5, 8), null, null);
        assertThat(ps.qc().spikeCount()).isEqualTo(2); // the 40 nT spike, on both sensors
        assertThat(ps.qc().spikes().get(0).line()).isEqualTo("L1");
        assertThat(ps.qc().lines().get(0).altitudeOverLimit()).isEqualTo(1.0); // 2.0 m against a 1.5 m limit
        assertThat(ps.qc().areaOverSpacing()).isEqualTo(1.0); // 10 m spacing against 8 m
        assertThat(ps.tracks()).hasSize(10);
        Path out = dir.resolve("out");
        LineDataCsvWriter.write(ps, out.resolve("lines_processed.csv"), null);
        QcReportWriter.write(ps, out.resolve("report"));
        List<String> rows = Files.readAllLines(out.resolve("lines_processed.csv"));
        assertThat(rows).hasSize(1 + s.size());
        assertThat(rows.get(0)).startsWith("line,time,x,y,heading_deg,distance_m,altitude,depth,mag_port_x");
        assertThat(rows.get(1)).startsWith("L0,2026-05-14T09:30:00.000Z,500000.000,6100000.000,0.00,");
        assertThat(Files.readString(out.resolve("report/qc.html"))).contains("Crossovers").contains("L1");
        assertThat(Files.readAllLines(out.resolve("report/qc_lines.csv"))).hasSize(6);
        assertThat(out.resolve("report/tracks.png")).exists();
        assertThat(dir.resolve("out").toFile().list()).containsExactlyInAnyOrder("lines_processed.csv", "report");
    }
}
