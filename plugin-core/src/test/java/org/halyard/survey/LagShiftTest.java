package org.halyard.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Set;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;

class LagShiftTest {

    static final double LAG = 0.35, SPEED = 2.0;

    /**
     * Alternating north-south lines over east-west cables ({@link LagEstimatorTest#cables}) whose readings
     * are late by {@link #LAG}: the reading at time t is the field where the array was at t - LAG, i.e.
     * SPEED x LAG = 0.7 m back along its own track.
     */
    static SurveyLines lateReadings() {
        List<SyntheticLines.Spec> specs = SyntheticLines.grid(40, 200, 5, new double[0]);
        SurveyLines lines = SyntheticLines.build(specs, SPEED, 0.1, 1.78e9, new double[] {-0.75, 0.75},
                (x, y, t) -> 0, null);
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            double dir = Math.signum(lines.y()[e - 1] - lines.y()[s]);
            for (int i = s; i < e; i++) {
                double v = 49000 + 3 * l + LagEstimatorTest.cables(lines.y()[i] - dir * SPEED * LAG);
                lines.values(0)[i] = v;
                lines.values(1)[i] = v;
            }
        }
        return lines;
    }

    @Test
    void estimatedLagIsRecoveredAppliedAndLowersTheOppositeLineMismatch() {
        SurveyLines lines = lateReadings();
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.of()),
                SurveyOptions.defaults().withLag(new LagOptions(true, true, Double.NaN, 2)), null, null);
        LagOutcome o = ps.lag().orElseThrow();
        // construction above; tolerance a fifth of the 0.1 s sample interval (as LagEstimatorTest)
        assertThat(o.estimatedS()).isCloseTo(LAG, Offset.offset(0.02));
        assertThat(o.appliedS()).isEqualTo(o.estimatedS());
        assertThat(o.pairs()).isEqualTo(lines.lineCount() - 1);
        // the profiles of opposite lines now agree: the misfit falls at least a hundredfold (the residual is the
        // 0.02 s estimate error and the interpolation of 0.2 m steps over cables 4-6 m wide; construction)
        assertThat(o.misfitBefore()).isGreaterThan(1);
        assertThat(o.misfitAfter()).isLessThan(o.misfitBefore() / 100);
        assertThat(ps.messages()).anyMatch(m -> m.startsWith("lag estimated") && m.contains("pairs"))
                .anyMatch(m -> m.startsWith("positions shifted") && m.contains("estimated"));
        // the sensors now sit where their readings were taken: the field there is the reading (construction),
        // to the position error SPEED x 0.02 s = 4 cm times the steepest cable gradient (about 7 nT/m)
        SensorTrack port = ps.sensors().get(0);
        for (int l = 0; l < lines.lineCount(); l++) {
            int i = (lines.start(l) + lines.end(l)) / 2;
            double reading = lines.values(0)[i] - 49000 - 3 * l;
            assertThat(LagEstimatorTest.cables(port.y()[i])).isCloseTo(reading, Offset.offset(0.3));
        }
    }

    @Test
    void aGivenLagMovesEachReadingBackAlongItsOwnTrack() {
        SurveyLines lines = lateReadings();
        SurveyLines shifted = LagShift.apply(lines, LAG);
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            double dir = Math.signum(lines.y()[e - 1] - lines.y()[s]);
            for (int i : new int[] {s, (s + e) / 2, e - 1}) { // ends extrapolated from the first and last steps
                // straight line at constant speed: exactly SPEED x LAG back (construction), to rounding
                assertThat(shifted.y()[i]).isCloseTo(lines.y()[i] - dir * SPEED * LAG, Offset.offset(1e-6));
                assertThat(shifted.x()[i]).isCloseTo(lines.x()[i], Offset.offset(1e-9));
            }
        }
        assertThat(shifted.time()).isSameAs(lines.time());
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.of()),
                SurveyOptions.defaults().withLag(new LagOptions(false, false, LAG, 2)), null, null);
        LagOutcome o = ps.lag().orElseThrow();
        assertThat(o.estimatedS()).isNaN();
        assertThat(o.appliedS()).isEqualTo(LAG);
        // the exact lag: only interpolation between 0.2 m steps is left (construction)
        assertThat(o.misfitAfter()).isLessThan(o.misfitBefore() / 100);
    }

    @Test
    void badLagSettingsAreRefused() {
        assertThatThrownBy(() -> new LagOptions(false, true, Double.NaN, 2)).hasMessageContaining("estimate");
        assertThatThrownBy(() -> new LagOptions(true, true, 0.2, 2)).hasMessageContaining("not both");
        assertThatThrownBy(() -> new LagOptions(true, false, Double.NaN, 0)).hasMessageContaining("positive");
        // a survey without opposite lines cannot give an estimate to apply
        List<SyntheticLines.Spec> specs = List.of(new SyntheticLines.Spec("A", 0, 0, 0, 100),
                new SyntheticLines.Spec("B", 5, 0, 5, 100));
        SurveyLines same = SyntheticLines.build(specs, 2, 0.1, 0, new double[] {0}, (x, y, t) -> y, null);
        assertThatThrownBy(() -> SurveyProcessing.run(new SurveyInput(same, Set.of()),
                SurveyOptions.defaults().withLag(new LagOptions(true, true, Double.NaN, 1)), null, null))
                .hasMessageContaining("opposite directions");
        // estimate only: reported as not possible, the run goes on
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(same, Set.of()),
                SurveyOptions.defaults().withLag(new LagOptions(true, false, Double.NaN, 1)), null, null);
        assertThat(ps.messages()).anyMatch(m -> m.startsWith("lag not estimated"));
    }
}
