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
    void aPipeOnTheFlankCallsForTheQuadraticBackground() {
        // A 500 kg-class induced dipole 4 m under the sensors with a 90 kg/m pipe 10 m east (both Blakely 1995
        // forward models): the pipe's field curves across the 6 m fit window, which a plane cannot follow.
        Dipole target = Dipole.along(25, 25, 21.5, 12.8, SyntheticSurvey.FIELD);
        double perMetre = org.halyard.model.DipoleLine.inducedMomentPerMetre(90, 49000);
        SyntheticSurvey s = new SyntheticSurvey(List.of(target),
                List.of(SyntheticSurvey.line(35, -20, 35, 70, 20.0, perMetre)), 17.5);
        LineSamples lines = s.lines(1.5, 50, 0, 50, 3, 0.05, 2.5, 7);
        DipoleFitOptions plane = new DipoleFitOptions(6, DipoleFitOptions.Background.PLANE, 20, 200, 0.5);
        DipoleFitResult p = DipoleFit.fit(lines, SyntheticSurvey.FIELD, 25, 25, 4, plane).orElseThrow();
        DipoleFitResult a = DipoleFit.fit(lines, SyntheticSurvey.FIELD, 25, 25, 4, DipoleFitOptions.DEFAULT).orElseThrow();
        double ep = Math.hypot(p.dipole().x() - 25, p.dipole().y() - 25);
        double ea = Math.hypot(a.dipole().x() - 25, a.dipole().y() - 25);
        System.out.printf("pipe on the flank: plane %.3f m, %.2f A m2, rms %.3f nT; auto %.3f m, %.2f A m2, rms %.3f nT%n",
                ep, p.dipole().moment(), p.rms(), ea, a.dipole().moment(), a.rms());
        assertThat(a.rms()).isLessThan(p.rms());
        assertThat(ea).isLessThan(ep);
        // issue 5 acceptance: horizontal error at most 0.3 m, moment within 20 %
        assertThat(ea).isLessThanOrEqualTo(0.3);
        assertThat(a.dipole().moment()).isCloseTo(12.8, offset(2.56));
        // Alone, the same dipole keeps the plane: the criterion does not buy terms it does not need.
        LineSamples alone = new SyntheticSurvey(List.of(target), 17.5).lines(1.5, 50, 0, 50, 3, 0.05, 2.5, 7);
        DipoleFitResult pa = DipoleFit.fit(alone, SyntheticSurvey.FIELD, 25, 25, 4, plane).orElseThrow();
        DipoleFitResult aa = DipoleFit.fit(alone, SyntheticSurvey.FIELD, 25, 25, 4, DipoleFitOptions.DEFAULT).orElseThrow();
        assertThat(aa.dipole()).isEqualTo(pa.dipole());
    }

    @Test
    void tooFewSamplesGivesNoFit() {
        LineSamples few = LineSamples.withoutAltitude(new double[] {1, 2}, new double[] {1, 2}, new double[] {17, 17},
                new double[] {0.1, 0.2});
        assertThat(DipoleFit.fit(few, SyntheticSurvey.FIELD, 1, 1, 2, DipoleFitOptions.DEFAULT)).isEmpty();
    }
}
