package org.halyard.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.halyard.grid.Grid;
import org.halyard.io.GeoPackageReader;
import org.halyard.io.GeoTiffGrids;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SurveySimulatorTest {

    @TempDir
    Path dir;

    /** The sample scenario, shrunk to a 40 x 12 m patch so the test stays small. */
    private static Scenario small() throws Exception {
        Path sample = Path.of("..", "sample-workspace", "skerrow-sound", "scenario.json");
        String json = Files.readString(sample).replace("\"length_m\": 200.0", "\"length_m\": 40.0")
                .replace("\"width_m\": 150.0", "\"width_m\": 12.0")
                .replace("\"missing_start_min\": 100.0", "\"missing_start_min\": 5.0");
        Path f = Files.createTempFile("scenario", ".json");
        Files.writeString(f, json);
        return Scenario.read(f);
    }

    @Test
    void sameScenarioGivesSameBytes() throws Exception {
        Scenario s = small();
        SurveySimulator.run(s, dir.resolve("a"), null);
        SurveySimulator.run(s, dir.resolve("b"), null);
        for (String name : List.of(SurveySimulator.LINES, SurveySimulator.BASE, SurveySimulator.BATHYMETRY,
                SurveySimulator.ASSETS, SurveySimulator.TRUTH, SurveySimulator.RECIPE)) {
            assertThat(Files.readAllBytes(dir.resolve("b").resolve(name))).as(name)
                    .isEqualTo(Files.readAllBytes(dir.resolve("a").resolve(name)));
        }
    }

    @Test
    void outputsAgreeWithEachOtherAndWithTheFormats() throws Exception {
        Scenario s = small();
        SurveySimulator.Summary sum = SurveySimulator.run(s, dir, null);
        List<String> lines = Files.readAllLines(dir.resolve(SurveySimulator.LINES));
        assertThat(lines.get(0)).isEqualTo("line,time,x,y,altitude,depth,mag_port,mag_stbd");
        assertThat(lines).hasSize(sum.samples() + 1);
        Grid bathy = GeoTiffGrids.read(dir.resolve(SurveySimulator.BATHYMETRY));
        int checked = 0;
        for (String row : lines.subList(1, lines.size())) {
            String[] c = row.split(",");
            double seabed = Double.parseDouble(c[4]) + Double.parseDouble(c[5]);
            // altitude + sensor depth = seabed depth; the GeoTIFF (1 m cells, bilinear) agrees within cm rounding
            // plus the interpolation error of 0.3 m sand waves, (h^2 / 8) |d''| < 5 mm (numerical analysis)
            assertThat(bathy.valueAt(Double.parseDouble(c[2]), Double.parseDouble(c[3]))).isCloseTo(seabed, within(0.02));
            checked++;
        }
        assertThat(checked).isGreaterThan(1000);
        // 10 Hz: consecutive rows within a line are 100 ms apart except across gaps
        long step = java.time.Duration.between(java.time.Instant.parse(lines.get(1).split(",")[1]),
                java.time.Instant.parse(lines.get(2).split(",")[1])).toMillis();
        assertThat(step).isEqualTo(100);

        // IAGA-2002 (format description): records of 70 characters; headers end with '|'; F = |(X, Y, Z)|
        List<String> base = Files.readAllLines(dir.resolve(SurveySimulator.BASE));
        assertThat(base).allSatisfy(l -> assertThat(l).hasSize(70));
        int data = 0, missing = 0;
        for (String l : base) {
            if (l.startsWith(" ") || l.startsWith("DATE")) {
                assertThat(l).endsWith("|");
                continue;
            }
            String[] v = l.trim().split("\\s+");
            double x = Double.parseDouble(v[3]), y = Double.parseDouble(v[4]), z = Double.parseDouble(v[5]),
                    f = Double.parseDouble(v[6]);
            if (f == 99999.00) {
                missing++;
                continue;
            }
            assertThat(Math.sqrt(x * x + y * y + z * z)).isCloseTo(f, within(0.02));
            data++;
        }
        assertThat(data).isGreaterThan(100);
        assertThat(missing).isEqualTo(90); // 90 s missing at 1 s cadence (scenario)

        // the charted cable lies chart_shift_m = 2 m from the true one (scenario)
        var layer = GeoPackageReader.read(dir.resolve(SurveySimulator.ASSETS), SurveySimulator.ASSET_LINES);
        assertThat(layer.crsCode()).isEqualTo("EPSG:32631");
        var cable = layer.features().get(0);
        assertThat(cable.attributes().get("asset")).isEqualTo("TARRIN-C1");
        var truth = Files.readAllLines(dir.resolve(SurveySimulator.TRUTH)).stream()
                .filter(l -> l.startsWith("LIN1,")).findFirst().orElseThrow();
        String wkt = truth.substring(truth.indexOf("\"") + 1, truth.lastIndexOf("\""));
        var trueLine = new org.locationtech.jts.io.WKTReader().read(wkt);
        assertThat(cable.geometry().getCoordinates()[1].distance(trueLine.getCoordinates()[1])).isCloseTo(2.0, within(0.02));
    }
}
