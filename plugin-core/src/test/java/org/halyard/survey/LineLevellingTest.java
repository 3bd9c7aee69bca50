package org.halyard.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

class LineLevellingTest {

    /** A smooth geological field, nT: wavelengths of 150-230 m, far longer than the sensor offsets. */
    static double geology(double x, double y) {
        return 30 * Math.sin(2 * Math.PI * x / 150) * Math.cos(2 * Math.PI * y / 230) + 0.05 * x;
    }

    @Test
    void recoversKnownLineOffsetsAndReducesCrossoverMisfit() {
        // Method: Yarger, Robertson and Wentland 1978, Geophysics 43(6) 1148-1156: least-squares line
        // corrections from crossover misfits, tie lines as datum.
        List<SyntheticLines.Spec> specs = SyntheticLines.grid(200, 200, 10, new double[] {15, 70, 130, 185});
        int traverse = specs.size() - 4;
        double[] offsets = new double[specs.size()];
        Random rnd = new Random(42);
        for (int l = 0; l < traverse; l++) {
            offsets[l] = 10 * (rnd.nextDouble() - 0.5);
        }
        SurveyLines lines = SyntheticLines.build(specs, 2.0, 0.1, 1.78e9, new double[] {-0.75, 0.75},
                (x, y, t) -> 49000 + geology(x, y), offsets);
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.of("T1", "T2", "T3", "T4")),
                SurveyOptions.defaults(), null, null);

        assertThat(ps.crossovers()).hasSize(traverse * 4);
        LineLevelling.Solution sol = ps.levelling().orElseThrow();
        double ss = 0;
        for (int l = 0; l < traverse; l++) {
            double recovered = -sol.correction(l, lines.time()[lines.start(l)]);
            ss += Math.pow(recovered - offsets[l], 2);
        }
        double rms = Math.sqrt(ss / traverse);
        assertThat(rms).as("offset recovery RMS, nT (issue 3: <= 0.05 nT)").isLessThanOrEqualTo(0.05);
        CrossoverStats before = ps.qc().before(), after = ps.qc().after();
        assertThat(before.rmsNt()).isGreaterThan(1.0);
        assertThat(before.rmsNt() / after.rmsNt()).as("crossover RMS reduction (issue 3: >= 10x)")
                .isGreaterThanOrEqualTo(10);

        // the corrected values of a traverse line now match the true field to the same accuracy
        int l = 3;
        int i = (lines.start(l) + lines.end(l)) / 2;
        SensorTrack port = ps.sensors().get(0);
        assertThat(port.value()[i]).isCloseTo(49000 + geology(port.x()[i], port.y()[i]),
                org.assertj.core.data.Offset.offset(0.1));
    }

    @Test
    void linearTrendRecoversDrift() {
        // Yarger et al. 1978: a low-order polynomial in time per line; here offset + drift per traverse line.
        List<SyntheticLines.Spec> specs = SyntheticLines.grid(100, 200, 10, new double[] {10, 60, 110, 160, 190});
        int traverse = specs.size() - 5;
        SurveyLines base = SyntheticLines.build(specs, 2.0, 0.1, 1.78e9, new double[] {-0.75, 0.75},
                (x, y, t) -> 49000 + geology(x, y), null);
        double[] a = new double[specs.size()], b = new double[specs.size()];
        Random rnd = new Random(3);
        for (int l = 0; l < traverse; l++) {
            a[l] = 8 * (rnd.nextDouble() - 0.5);
            b[l] = 4 * (rnd.nextDouble() - 0.5); // nT over the half-duration
        }
        for (int l = 0; l < traverse; l++) {
            int s = base.start(l), e = base.end(l);
            double mid = 0.5 * (base.time()[s] + base.time()[e - 1]), half = 0.5 * (base.time()[e - 1] - base.time()[s]);
            for (int i = s; i < e; i++) {
                double err = a[l] + b[l] * (base.time()[i] - mid) / half;
                base.values(0)[i] += err;
                base.values(1)[i] += err;
            }
        }
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(base, Set.of("T1", "T2", "T3", "T4", "T5")),
                SurveyOptions.defaults().withLevelling(LevellingTrend.LINEAR, false), null, null);
        LineLevelling.Solution sol = ps.levelling().orElseThrow();
        for (int l = 0; l < traverse; l++) {
            assertThat(-sol.coeff()[l][0]).isCloseTo(a[l], org.assertj.core.data.Offset.offset(0.05));
            assertThat(-sol.coeff()[l][1]).isCloseTo(b[l], org.assertj.core.data.Offset.offset(0.05));
        }
        assertThat(ps.qc().before().rmsNt() / ps.qc().after().rmsNt()).isGreaterThanOrEqualTo(10);
    }

    @Test
    void adjustedTiesKeepZeroMeanAndLinesWithoutCrossoversAreFlagged() {
        List<SyntheticLines.Spec> specs = new java.util.ArrayList<>(SyntheticLines.grid(50, 100, 10, new double[] {20, 80}));
        specs.add(new SyntheticLines.Spec("FAR", 500, 0, 500, 100)); // crosses nothing
        double[] off = new double[specs.size()];
        off[0] = 3;
        off[specs.size() - 3] = 1; // tie T1 off by 1 nT
        SurveyLines lines = SyntheticLines.build(specs, 2.0, 0.1, 1.78e9, new double[] {-0.75, 0.75},
                (x, y, t) -> 49000 + geology(x, y), off);
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.of("T1", "T2")),
                SurveyOptions.defaults().withLevelling(LevellingTrend.CONSTANT, true), null, null);
        LineLevelling.Solution sol = ps.levelling().orElseThrow();
        int t1 = lines.lineIndex("T1"), t2 = lines.lineIndex("T2"), far = lines.lineIndex("FAR");
        // datum constraint: mean tie correction is zero (LineLevelling javadoc)
        assertThat(sol.coeff()[t1][0] + sol.coeff()[t2][0]).isCloseTo(0, org.assertj.core.data.Offset.offset(0.01));
        // T1 is 1 nT above T2: corrections -0.5 and +0.5
        assertThat(sol.coeff()[t1][0]).isCloseTo(-0.5, org.assertj.core.data.Offset.offset(0.05));
        assertThat(sol.order()[far]).isEqualTo(-1);
        assertThat(ps.sensors().get(0).flags()[lines.start(far)] & SampleFlags.UNLEVELLED).isNotZero();
        assertThat(ps.messages()).anyMatch(m -> m.contains("FAR") && m.contains("not levelled"));
    }
}
