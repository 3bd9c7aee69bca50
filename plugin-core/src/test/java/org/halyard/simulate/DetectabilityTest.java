package org.halyard.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.halyard.model.FieldDirection;
import org.halyard.model.SteelSphere;
import org.junit.jupiter.api.Test;

class DetectabilityTest {

    private static final Detectability.Survey POLE =
            new Detectability.Survey(FieldDirection.POLE, 50000, 90, 0.1, 0.1, 5);
    private static final Detectability.Survey NORTH_SEA =
            new Detectability.Survey(new FieldDirection(66, 1.5), 49000, 90, 0.05, 0.05 * Math.sqrt(2) / 1.5, 5);

    @Test
    void overAVerticalDipoleAtThePoleTheClosedFormsHold() {
        // on the axis of a dipole: T = 2 C m / r^3 and |A| = |dT/dz| = 6 C m / r^4 (Blakely 1995 eq. 4.13, C = 1e-7 T m/A)
        double m = SteelSphere.inducedMoment(1, 50000);
        for (double r : new double[] {1.5, 3, 7}) {
            Detectability.Case c = Detectability.evaluate(POLE, 0.5, r - 0.5, 0);
            assertThat(c.distanceM()).isCloseTo(r, within(1e-12));
            assertThat(c.peakNtPerKg()).isCloseTo(2 * 100 * m / (r * r * r), within(1e-9 * c.peakNtPerKg()));
            // central-difference truncation error ~ (step / r)^2 = 1e-6
            assertThat(c.peakAsNtPerMPerKg()).isCloseTo(6 * 100 * m / Math.pow(r, 4), within(1e-5 * c.peakAsNtPerMPerKg()));
        }
    }

    @Test
    void fieldFallsAsInverseCubeAndAnalyticSignalAsInverseFourthPower() {
        // a dipole field is homogeneous of degree -3 in distance, its gradients of degree -4 (Blakely 1995 ch. 4):
        // scaling burial, altitude and spacing together by 2 divides the peaks by 8 and 16
        for (double[] g : new double[][] {{0.5, 2, 3}, {1, 1.5, 6}, {0, 3, 10}}) {
            Detectability.Case a = Detectability.evaluate(NORTH_SEA, g[0], g[1], g[2]);
            Detectability.Case b = Detectability.evaluate(NORTH_SEA, 2 * g[0], 2 * g[1], 2 * g[2]);
            // the along-line sampling (r / 200) scales too, so the ratio is exact up to rounding
            assertThat(a.peakNtPerKg() / b.peakNtPerKg()).isCloseTo(8, within(1e-6));
            assertThat(a.peakAsNtPerMPerKg() / b.peakAsNtPerMPerKg()).isCloseTo(16, within(1e-4));
            assertThat(b.minMassFieldKg() / a.minMassFieldKg()).isCloseTo(8, within(1e-6));
        }
    }

    @Test
    void widerSpacingAndHigherSensorsNeedHeavierObjects() {
        double prev = 0;
        for (double s : new double[] {1, 2, 4, 8, 16}) {
            double m = Detectability.evaluate(NORTH_SEA, 0.5, 2, s).minMassFieldKg();
            assertThat(m).isGreaterThan(prev);
            prev = m;
        }
        assertThat(Detectability.evaluate(NORTH_SEA, 0.5, 4, 3).minMassAsKg())
                .isGreaterThan(Detectability.evaluate(NORTH_SEA, 0.5, 2, 3).minMassAsKg());
    }

    @Test
    void minimumMassIsSnrTimesNoiseOverPeakPerKg() {
        Detectability.Case c = Detectability.evaluate(NORTH_SEA, 1, 2, 3);
        assertThat(c.minMassFieldKg() * c.peakNtPerKg()).isCloseTo(5 * 0.05, within(1e-12));
        assertThat(c.minMassAsKg() * c.peakAsNtPerMPerKg()).isCloseTo(5 * 0.05 * Math.sqrt(2) / 1.5, within(1e-12));
    }
}
