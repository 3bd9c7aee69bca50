package org.halyard.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class PrismTest {

    private static final FieldDirection NORTH_SEA = new FieldDirection(66, 1.5);
    private static final FieldDirection OBLIQUE = new FieldDirection(35, -40);

    /** Midpoint-rule volume integral of the dipole field: an independent computation of the prism anomaly. */
    private static double dipoleSum(Prism p, int nx, int ny, int nz, double px, double py, double pz,
                                    FieldDirection f) {
        double dx = (p.xMax() - p.xMin()) / nx, dy = (p.yMax() - p.yMin()) / ny, dz = (p.zBottom() - p.zTop()) / nz;
        double dv = dx * dy * dz;
        double s = 0;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                for (int k = 0; k < nz; k++) {
                    Dipole d = new Dipole(p.xMin() + (i + 0.5) * dx, p.yMin() + (j + 0.5) * dy,
                            p.zTop() + (k + 0.5) * dz, p.mEast() * dv, p.mNorth() * dv, p.mDown() * dv);
                    s += d.totalField(px, py, pz, f);
                }
            }
        }
        return s;
    }

    @Test
    void matchesFineSumOfDipolesForArbitraryMagnetisation() {
        // Bhattacharyya 1964 eq. 11 versus the volume integral of Blakely 1995 eq. 4.13 (midpoint rule, 0.05 m cells)
        Prism p = new Prism(0, 2, 0, 3, 5, 6.5, 1.2, -0.7, 2.0);
        double[][] obs = {{1, 1.5, 2}, {-2, 4, 3}, {3.5, -1, 1}, {0.2, 2.9, 4}, {10, 7, 0}};
        for (FieldDirection f : new FieldDirection[] {NORTH_SEA, OBLIQUE}) {
            for (double[] o : obs) {
                double closed = p.totalField(o[0], o[1], o[2], f);
                double sum = dipoleSum(p, 40, 60, 30, o[0], o[1], o[2], f);
                // midpoint-rule error ~ (cell / distance)^2 ~ 3e-4 here; 2e-3 relative plus a floor for near-zero values
                assertThat(closed).as("prism at %s, field %s", java.util.Arrays.toString(o), f)
                        .isCloseTo(sum, within(2e-3 * Math.abs(sum) + 1e-4));
            }
        }
    }

    @Test
    void farFieldIsThatOfADipoleOfEqualMoment() {
        // far from a compact source its field is the dipole field of moment M V (Blakely 1995 sec. 5.4)
        Prism p = new Prism(-0.5, 0.5, -0.5, 0.5, 10, 11, 0.4, 0.3, -0.9);
        double v = p.volume();
        Dipole d = new Dipole(0, 0, 10.5, p.mEast() * v, p.mNorth() * v, p.mDown() * v);
        double[][] obs = {{150, 80, -100}, {-60, 20, -200}, {5, -3, -150}};
        for (double[] o : obs) {
            double expected = d.totalField(o[0], o[1], o[2], OBLIQUE);
            // next multipole term is (size / distance)^2 ~ 1e-4 smaller
            assertThat(p.totalField(o[0], o[1], o[2], OBLIQUE)).isCloseTo(expected, within(1e-3 * Math.abs(expected)));
        }
    }

    @Test
    void inducedMagnetisationIsSusceptibilityTimesH() {
        // M = chi B0 / mu0 (Blakely 1995 eq. 5.7): 0.01 * 50000e-9 / (4 pi 1e-7) = 0.39789 A/m
        Prism p = Prism.induced(0, 1, 0, 1, 1, 2, 0.01, 50000, FieldDirection.POLE);
        assertThat(p.mDown()).isCloseTo(0.01 * 50000e-9 / (4e-7 * Math.PI), within(1e-12));
        assertThat(p.mDown()).isCloseTo(0.39789, within(1e-5)); // hand computation of the line above
        assertThat(p.mEast()).isCloseTo(0, within(1e-15));
    }

    @Test
    void rejectsObservationsInsideOrBelowTheTop() {
        Prism p = new Prism(0, 1, 0, 1, 1, 2, 0, 0, 1);
        assertThatThrownBy(() -> p.totalField(0.5, 0.5, 1.5, NORTH_SEA))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("above the prism top");
        assertThatThrownBy(() -> new Prism(1, 0, 0, 1, 1, 2, 0, 0, 1)).isInstanceOf(IllegalArgumentException.class);
    }
}
