package org.halyard.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class DipoleLineTest {

    /**
     * Closed form of an infinite line of dipoles (line moment lambda per metre, unit direction m) along north:
     * B = (mu0 / 2 pi) lambda [2 (m.rho^) rho^ - m_perp] / rho^2 in the plane across the line; the along-line
     * moment gives no field. Derived by integrating Blakely 1995 eq. 4.13 along the line with
     * int dy / (rho^2 + y^2)^(5/2) = 4 / (3 rho^4) and int dy / (rho^2 + y^2)^(3/2) = 2 / rho^2.
     */
    private static double infiniteLine(double lambda, FieldDirection m, double rx, double rz, FieldDirection f) {
        double rho2 = rx * rx + rz * rz;
        double rho = Math.sqrt(rho2);
        double ux = rx / rho, uz = rz / rho;
        double mdot = m.east() * ux + m.down() * uz;
        double k = 2e-7 * 1e9 * lambda / rho2; // mu0 / 2 pi = 2e-7 T m / A, in nT
        double bx = k * (2 * mdot * ux - m.east());
        double bz = k * (2 * mdot * uz - m.down());
        return bx * f.east() + bz * f.down();
    }

    @Test
    void longStraightLineMatchesTheInfiniteLineClosedForm() {
        FieldDirection field = new FieldDirection(66, 30);
        double lambda = 0.8; // A m2 per metre
        DipoleLine line = new DipoleLine(new double[] {0, -2000, 5, 0, 2000, 5}, lambda, field, 0.1);
        for (double[] o : new double[][] {{3, 0}, {-1.5, 2}, {0, 3.5}, {8, 0}}) {
            double expected = infiniteLine(lambda, field, o[0], o[1] - 5, field);
            // ends 2 km away perturb by (rho / L)^2 ~ 1e-5; midpoint rule by (0.1 / rho)^2 ~ 1e-3 at most
            assertThat(line.totalField(o[0], 0, o[1], field)).isCloseTo(expected, within(2e-3 * Math.abs(expected)));
        }
    }

    @Test
    void bentLineIsTheSumOfItsStraightPieces() {
        // superposition: a polyline equals the sum of its segments modelled separately (Blakely 1995 sec. 4.1)
        FieldDirection f = new FieldDirection(66, 1.5);
        DipoleLine bent = new DipoleLine(new double[] {0, 0, 4, 30, 10, 5, 40, 40, 6}, 0.5, f, 0.25);
        DipoleLine a = new DipoleLine(new double[] {0, 0, 4, 30, 10, 5}, 0.5, f, 0.25);
        DipoleLine b = new DipoleLine(new double[] {30, 10, 5, 40, 40, 6}, 0.5, f, 0.25);
        assertThat(bent.totalField(25, 12, 0, f)).isCloseTo(a.totalField(25, 12, 0, f) + b.totalField(25, 12, 0, f),
                within(1e-9));
        assertThat(bent.length()).isCloseTo(Math.sqrt(30 * 30 + 10 * 10 + 1) + Math.sqrt(10 * 10 + 30 * 30 + 1), within(1e-9));
        assertThat(bent.dipoleCount()).isEqualTo(a.dipoleCount() + b.dipoleCount());
    }

    @Test
    void inducedMomentPerMetreOfASteelCylinder() {
        // M = 2 H0 for a permeable cylinder across the field (textbook magnetostatics):
        // 50 kg/m -> A = 50 / 7850 m2; 2 * A * 50000e-9 / (4 pi 1e-7) = 0.506863 A m2/m (hand computation)
        assertThat(DipoleLine.inducedMomentPerMetre(50, 50000)).isCloseTo(0.506863, within(1e-6));
    }

    @Test
    void rejectsDegenerateInput() {
        FieldDirection f = FieldDirection.POLE;
        assertThatThrownBy(() -> new DipoleLine(new double[] {0, 0, 1}, 1, f, 1))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("two vertices");
        assertThatThrownBy(() -> new DipoleLine(new double[] {0, 0, 1, 1, 1, 1}, 1, f, 0))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("spacing");
    }
}

