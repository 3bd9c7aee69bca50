package org.halyard.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;

class LagEstimatorTest {

    /** Field varying along the lines (north) only, with sharp features: cables running east-west. */
    static double cables(double y) {
        return 40 / (1 + Math.pow((y - 60) / 2, 2)) - 25 / (1 + Math.pow((y - 130) / 3, 2)) + 0.05 * y;
    }

    @Test
    void recoversALagFromOppositeLines() {
        double lag = 0.35; // s: each reading belongs to the position 0.35 s earlier
        List<SyntheticLines.Spec> specs = SyntheticLines.grid(40, 200, 5, new double[0]);
        double speed = 2.0;
        // reading at time t along a line = field at the position 0.35 s earlier = 0.7 m back along the track
        SurveyLines lines = SyntheticLines.build(specs, speed, 0.1, 1.78e9, new double[] {0},
                (x, y, t) -> 0, null);
        double[] v = lines.values(0);
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            double dir = Math.signum(lines.y()[e - 1] - lines.y()[s]);
            for (int i = s; i < e; i++) {
                v[i] = 49000 + 3 * l + cables(lines.y()[i] - dir * speed * lag); // offsets per line do not matter
            }
        }
        LagEstimator.Result r = LagEstimator.estimate(lines, v, new boolean[lines.lineCount()], 2.0);
        assertThat(r.pairs()).isEqualTo(lines.lineCount() - 1);
        // construction above; tolerance a fifth of the 0.1 s sample interval
        assertThat(r.lagS()).isCloseTo(lag, org.assertj.core.data.Offset.offset(0.02));
    }

    @Test
    void refusesWithoutOppositeLines() {
        List<SyntheticLines.Spec> specs = List.of(new SyntheticLines.Spec("A", 0, 0, 0, 100),
                new SyntheticLines.Spec("B", 5, 0, 5, 100));
        SurveyLines lines = SyntheticLines.build(specs, 2, 0.1, 0, new double[] {0}, (x, y, t) -> y, null);
        assertThatThrownBy(() -> LagEstimator.estimate(lines, lines.values(0), new boolean[2], 1))
                .hasMessageContaining("opposite directions");
    }
}
