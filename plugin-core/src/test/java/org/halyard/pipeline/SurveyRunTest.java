package org.halyard.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.halyard.grid.Progress;
import org.halyard.io.CsvTableReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The whole job on the sample workspace (a simulated survey, so the truth is known): outputs as
 * CONTRACT.md lists them, scores against the truth, byte-identical reruns, and no partial outputs after a
 * failure. The score floors are regression guards set below what the demo reaches today (printed), not
 * the goals of the targets issue, which are checked on cleaner data in the targets tests.
 */
class SurveyRunTest {

    static final Path RECIPE = Path.of("../sample-workspace/skerrow-sound/recipe.json");
    static final Path TRUTH = Path.of("../sample-workspace/skerrow-sound/truth.csv");

    @TempDir
    static Path dir;
    static Path first;

    @BeforeAll
    static void runOnce() {
        first = dir.resolve("first");
        new SurveyRun().run(RecipeReader.read(RECIPE), first, RunListener.SILENT);
    }

    @Test
    void writesEveryContractOutput() {
        for (String f : List.of("grids/total_field.tif", "grids/analytic_signal.tif", "grids/vertical_derivative.tif",
                "grids/tilt.tif", "grids/reduced_to_pole.tif", "grids/analytic_signal_measured.tif", "targets.csv",
                "linear_features.csv", "halyard.gpkg", "report/run.log", "report/qc.html", "sheets/index.pdf")) {
            assertThat(first.resolve(f)).as(f).isRegularFile();
        }
        try (CsvTableReader r = CsvTableReader.open(first.resolve("targets.csv"))) {
            assertThat(r.header()).contains("id", "x", "y", "class", "depth_below_sensor_m", "burial_m", "amplitude",
                    "moment_am2", "mass_kg_min", "mass_kg_max", "asset");
        }
        try (CsvTableReader r = CsvTableReader.open(first.resolve("linear_features.csv"))) {
            assertThat(r.header()).contains("id", "wkt", "length_m", "asset");
        }
        assertThat(Stream.of(dir.toFile().list())).noneMatch(n -> n.contains("partial"));
    }

    @Test
    void findsTheSimulatedObjects() {
        // Truth: the simulator's own record of what it buried (sample-workspace/skerrow-sound/truth.csv).
        List<double[]> truth = new ArrayList<>();
        try (CsvTableReader r = CsvTableReader.open(TRUTH)) {
            int cls = r.column("class"), x = r.column("x"), y = r.column("y");
            while (r.next()) {
                if (r.text(cls).toString().equals("discrete")) {
                    truth.add(new double[] {r.number(x), r.number(y)});
                }
            }
        }
        List<double[]> picks = new ArrayList<>();
        try (CsvTableReader r = CsvTableReader.open(first.resolve("targets.csv"))) {
            int x = r.column("x"), y = r.column("y");
            while (r.next()) {
                picks.add(new double[] {r.number(x), r.number(y)});
            }
        }
        double[] err = new double[truth.size()];
        int found = 0;
        for (int i = 0; i < truth.size(); i++) {
            double best = Double.POSITIVE_INFINITY;
            for (double[] p : picks) {
                best = Math.min(best, Math.hypot(p[0] - truth.get(i)[0], p[1] - truth.get(i)[1]));
            }
            err[i] = best;
            found += best <= 1.5 ? 1 : 0;
        }
        Arrays.sort(err);
        double recall = (double) found / truth.size();
        System.out.printf("demo score: %d of %d discrete objects picked within 1.5 m (recall %.2f), median "
                + "position error of the nearest pick %.2f m, %d picks in all%n", found, truth.size(), recall,
                err[err.length / 2], picks.size());
        // Regression floor one below the level reached (13 of 20 with the fourth-difference noise, smoothed
        // picking and the plane-or-quadratic dipole background of issue 5; 8 before).
        assertThat(found).isGreaterThanOrEqualTo(12);
    }

    @Test
    void findsTheThreeLinearsAndTheirAssets() {
        // Truth (truth.csv): LIN1 charted TARRIN-C1 at 118.4 degrees, LIN2 the pipe TARRIN-P1 running north-south
        // across the east-west lines (no tie line over it is gridded), LIN3 uncharted at 81.7 degrees.
        List<String> assets = new ArrayList<>();
        double pipeAz = Double.NaN;
        try (CsvTableReader r = CsvTableReader.open(first.resolve("linear_features.csv"))) {
            int asset = r.column("asset"), az = r.column("azimuth_deg");
            while (r.next()) {
                String a = r.text(asset).toString();
                assets.add(a);
                if (a.equals("TARRIN-P1")) {
                    pipeAz = r.number(az);
                }
            }
        }
        System.out.printf("demo linears: %s, pipe at %.2f degrees%n", assets, pipeAz);
        assertThat(assets).containsExactlyInAnyOrder("TARRIN-C1", "TARRIN-P1", "");
        assertThat(Math.min(pipeAz, 180 - pipeAz)).isLessThanOrEqualTo(2.0); // issue 5: within 2 degrees
    }

    @Test
    void rerunGivesTheSameBytesExceptTimings() throws IOException {
        Path second = dir.resolve("second");
        new SurveyRun().run(RecipeReader.read(RECIPE), second, RunListener.SILENT);
        List<Path> files;
        try (Stream<Path> s = Files.walk(first)) {
            files = s.filter(Files::isRegularFile).toList();
        }
        assertThat(files).hasSizeGreaterThan(10);
        for (Path f : files) {
            Path rel = first.relativize(f);
            if (rel.toString().equals("report/run.log")) {
                continue; // holds the timings
            }
            assertThat(Files.readAllBytes(second.resolve(rel))).as(rel.toString()).isEqualTo(Files.readAllBytes(f));
        }
    }

    @Test
    void aFailedRunLeavesThePreviousOutputsAndNoPartialFiles() throws IOException {
        Path out = dir.resolve("kept");
        Files.createDirectories(out);
        Files.writeString(out.resolve("earlier.txt"), "from an earlier run");
        Stage writesThenFails = new Stage() {
            @Override
            public String name() {
                return "fails";
            }

            @Override
            public void run(RunContext ctx, Progress p) throws IOException {
                Files.writeString(ctx.work().resolve("targets.csv"), "half");
                throw new IllegalArgumentException("lines.csv: line 7: broken on purpose");
            }
        };
        assertThatThrownBy(() -> new SurveyRun(List.of(writesThenFails)).run(RecipeReader.read(RECIPE), out,
                RunListener.SILENT)).hasMessageContaining("broken on purpose");
        assertThat(out.resolve("earlier.txt")).hasContent("from an earlier run");
        assertThat(out.resolve("targets.csv")).doesNotExist();
        assertThat(Stream.of(dir.toFile().list())).noneMatch(n -> n.contains("partial"));
    }
}
