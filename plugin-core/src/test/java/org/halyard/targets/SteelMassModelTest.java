package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class SteelMassModelTest {

    /**
     * Demagnetising factor along the c axis of an ellipsoid with a = b, by numerical quadrature of the
     * general integral N_c = (a^2 c / 2) int_0^inf ds / ((c^2 + s)^(3/2) (a^2 + s)) (Osborn 1945, eq. 2.1c),
     * substituted s = q^2, q = u / (1 - u), which maps it onto [0, 1] with a smooth integrand.
     */
    static double integral(double aspect) {
        double c = aspect, a = 1;
        return 0.5 * a * a * c * new IterativeLegendreGaussIntegrator(8, 1e-11, 1e-13).integrate(1000000, u -> {
            if (u >= 1) {
                return 0;
            }
            double q = u / (1 - u);
            double s = q * q;
            return 2 * q / ((1 - u) * (1 - u)) / (Math.pow(c * c + s, 1.5) * (a * a + s));
        }, 0, 1);
    }

    @ParameterizedTest
    @ValueSource(doubles = {1.0, 1.000001, 1.5, 3, 5, 10, 30})
    void axialFactorMatchesTheOsbornIntegral(double aspect) {
        // The closed form is written from memory (Osborn 1945 eq. 2.5): checked against the quadrature.
        assertThat(SpheroidDemagnetisation.axial(aspect)).isCloseTo(integral(aspect), offset(1e-6));
    }

    @Test
    void sphereAndSumRule() {
        assertThat(SpheroidDemagnetisation.axial(1)).isCloseTo(1.0 / 3, offset(1e-12)); // Osborn 1945: sphere 1/3
        double n = SpheroidDemagnetisation.axial(4);
        // Osborn 1945: the three principal factors sum to 1.
        assertThat(n + 2 * SpheroidDemagnetisation.transverse(4)).isCloseTo(1, offset(1e-12));
    }

    @Test
    void sphereMassInvertsThePermeableSphereRelation() {
        // DOMAIN.md: m = 3 V B0 / mu0 for a highly permeable sphere; a 50 kg steel ball in 49000 nT.
        double mu0 = 4e-7 * Math.PI;
        double v = 50 / 7850.0;
        double m = 3 * v * 49000e-9 / mu0;
        MassRange r = SteelMassModel.DEFAULT.massRange(m, 49000);
        assertThat(r.sphereKg()).isCloseTo(50, offset(1e-9));
        assertThat(r.minKg()).isLessThan(r.sphereKg());
        assertThat(r.maxKg()).isGreaterThan(r.sphereKg());
        // Heaviest: N across -> 1/2 at most, so at most 1.5 x the sphere (Osborn 1945 sum rule).
        assertThat(r.maxKg()).isLessThanOrEqualTo(1.5 * r.sphereKg());
    }

    @Test
    void refusesNonsense() {
        assertThatThrownBy(() -> SpheroidDemagnetisation.axial(0.5)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> SteelMassModel.DEFAULT.massRange(1, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new SteelMassModel(7850, 0.9)).isInstanceOf(IllegalArgumentException.class);
    }
}
