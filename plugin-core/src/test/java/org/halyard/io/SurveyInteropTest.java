package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.halyard.survey.BaseStation;
import org.halyard.survey.ProcessedSurvey;
import org.halyard.survey.SensorSpec;
import org.halyard.survey.SurveyColumns;
import org.halyard.survey.SurveyInput;
import org.halyard.survey.SurveyLines;
import org.halyard.survey.SurveyOptions;
import org.halyard.survey.SurveyProcessing;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Survey reading of what the simulate branch writes (Iaga2002Writer, the demo workspace). */
class SurveyInteropTest {

    @TempDir
    Path dir;

    @Test
    void readsWhatIaga2002WriterWrites() {
        long t0 = java.time.Instant.parse("2026-05-14T00:00:00Z").toEpochMilli();
        int n = 180;
        long[] t = new long[n];
        double[] x = new double[n], y = new double[n], z = new double[n], f = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = t0 + i * 1000L;
            x[i] = 17000 + i * 0.01;
            y[i] = -400.5;
            z[i] = 46000.25;
            f[i] = i == 7 ? Double.NaN : 49000 + i * 0.02;
        }
        Path p = dir.resolve("w.iaga2002");
        Iaga2002Writer.write(p, new Iaga2002Writer.Header("test", "Quillan Skerry", "ZZQ", 55.1, 3.2, 12,
                "1 second", "1-second (instantaneous)", "Variation", List.of()), t, x, y, z, f);
        BaseStation b = Iaga2002Reader.read(p);
        assertThat(b.size()).isEqualTo(n);
        assertThat(b.cadenceSeconds()).isEqualTo(1.0);
        assertThat(b.time()[0]).isEqualTo(t0 / 1000.0);
        assertThat(b.north()[100]).isCloseTo(18.0 + 17000 - 17, within(1e-9));
        assertThat(b.total()[7]).isNaN();
        assertThat(b.missingCount()).isEqualTo(1);
        assertThat(b.total()[100]).isCloseTo(49002.0, within(1e-9));
    }

    @Test
    void processesTheDemoWorkspace() {
        Path ws = Path.of("../sample-workspace/skerrow-sound");
        Assumptions.assumeTrue(Files.exists(ws.resolve("lines.csv")), "demo workspace present");
        SurveyColumns cols = SurveyColumns.projected("line", "time", "x", "y", "altitude", "depth",
                List.of(new SensorSpec("mag_port", -0.75, 0), new SensorSpec("mag_stbd", 0.75, 0)));
        SurveyLines lines = SurveyCsvReader.read(ws.resolve("lines.csv"), cols, "EPSG:32631", null);
        BaseStation base = Iaga2002Reader.read(ws.resolve("base.iaga2002"));
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.of("T01", "T02", "T03", "T04", "T05")),
                SurveyOptions.defaults().withLimits(3, 6), base, null);
        assertThat(lines.lineCount()).isEqualTo(56);
        assertThat(ps.crossovers()).isNotEmpty();
        // least squares cannot increase the misfit it minimises (Yarger et al. 1978)
        assertThat(ps.qc().after().rmsNt()).isLessThanOrEqualTo(ps.qc().before().rmsNt());
        assertThat(ps.gradients()).hasSize(1);
        assertThat(ps.tracks()).hasSize(56 * 2);
        assertThat(ps.qc().coverageAreaM2()).isPositive();

        // the tracks layer through the GeoPackage writer of the simulate branch, read back
        Path gpkg = dir.resolve("halyard.gpkg");
        GeoPackageWriter.write(gpkg, List.of(TrackLayer.of(ps.tracks(), "EPSG:32631")), java.time.Instant.EPOCH);
        FeatureLayer back = GeoPackageReader.read(gpkg, "tracks");
        assertThat(back.features()).hasSize(ps.tracks().size());
        FeatureLayer.Feature f0 = back.features().get(0);
        assertThat(f0.attributes().get("line")).isEqualTo(ps.tracks().get(0).line());
        assertThat(f0.geometry().getNumPoints()).isEqualTo(ps.tracks().get(0).geometry().getNumPoints());
        assertThat(((Number) f0.attributes().get("length_m")).doubleValue())
                .isCloseTo(ps.tracks().get(0).qc().lengthM(), within(1e-9));
    }
}
