package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.halyard.model.Dipole;
import org.junit.jupiter.api.Test;

class DipoleFitTest {

    static final Dipole REMANENT = new Dipole(25.4, 24.7, 20.8, 1.2, -0.7, 0.9);

    @Test
    void recoversANoiseFreeRemanentDipole() {
        SyntheticSurvey s = new SyntheticSurvey(List.of(REMANENT), 17.5);
        LineSamples lines = s.lines(1.5, 50, 0, 50, 3, 0, 2.5, 1);
        DipoleFitResult f = DipoleFit.fit(lines, SyntheticSurvey.FIELD, 25, 25, 2, DipoleFitOptions.DEFAULT).orElseThrow();
        // The model is the forward model (Blakely 1995 eq. 4.13): the fit must close to rounding.
        assertThat(f.dipole().x()).isCloseTo(REMANENT.x(), offset(1e-6));
        assertThat(f.dipole().z()).isCloseTo(REMANENT.z(), offset(1e-6));
        assertThat(f.dipole().mx()).isCloseTo(REMANENT.mx(), offset(1e-6));
        assertThat(f.dipole().mz()).isCloseTo(REMANENT.mz(), offset(1e-6));
        assertThat(f.depthBelowSensor()).isCloseTo(REMANENT.z() - f.sensorDepth(), offset(1e-12));
    }

    @Test
    void statedErrorsMatchTheScatter() {
        // Numerical Recipes (Press et al., 3rd ed., 15.5): s^2 (J^T J)^-1 is the covariance of the estimate,
        // so the standardised errors over independent noise draws have unit RMS (chi-square spread of 24 draws).
        double sum = 0;
        int n = 24;
        for (int seed = 0; seed < n; seed++) {
            SyntheticSurvey s = new SyntheticSurvey(List.of(REMANENT), 17.5);
            LineSamples lines = s.lines(1.5, 50, 0, 50, 3, 0.5, 2.5, 100 + seed);
            DipoleFitResult f = DipoleFit.fit(lines, SyntheticSurvey.FIELD, 25, 25, 2, DipoleFitOptions.DEFAULT)
                    .orElseThrow();
            double ez = (f.dipole().z() - REMANENT.z()) / f.sigmaZ();
            sum += ez * ez;
        }
        assertThat(Math.sqrt(sum / n)).isBetween(0.6, 1.5);
    }

    @Test
    void tooFewSamplesGivesNoFit() {
        LineSamples few = LineSamples.withoutAltitude(new double[] {1, 2}, new double[] {1, 2}, new double[] {17, 17},
                new double[] {0.1, 0.2});
        assertThat(DipoleFit.fit(few, SyntheticSurvey.FIELD, 1, 1, 2, DipoleFitOptions.DEFAULT)).isEmpty();
    }
}
