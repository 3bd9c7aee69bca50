package org.halyard.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class SteelSphereTest {

    @Test
    void momentOfOneKilogramInFiftyMicrotesla() {
        // m = 3 V B0 / mu0 (DOMAIN.md, permeable sphere): V = 1/7850 m3; 3 * 1.27389e-4 * 5e-5 / 1.256637e-6 = 0.015206
        assertThat(SteelSphere.inducedMoment(1, 50000)).isCloseTo(0.015206, within(1e-6));
        // the moment is proportional to mass (linear magnetostatics)
        assertThat(SteelSphere.inducedMoment(250, 50000)).isCloseTo(250 * SteelSphere.inducedMoment(1, 50000), within(1e-12));
    }

    @Test
    void massForMomentInvertsInducedMoment() {
        for (double kg : new double[] {0.5, 12, 900}) {
            assertThat(SteelSphere.massForMoment(SteelSphere.inducedMoment(kg, 48000), 48000)).isCloseTo(kg, within(1e-9 * kg));
        }
    }
}
