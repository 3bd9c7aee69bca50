package org.halyard.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class ColourRampTest {

    private static final int STEPS = 64;

    @Test
    void everyRampStaysInsideTheSrgbGamut() {
        // Unclipped linear sRGB in [0, 1] means the ramp reaches the screen as designed (IEC 61966-2-1).
        for (ColourRamp ramp : ColourRamp.all()) {
            for (int i = 0; i <= 200; i++) {
                for (double ch : Oklab.toLinearRgb(ramp.lab(i / 200.0))) {
                    assertThat(ch).as("%s at %d/200", ramp, i).isBetween(-1e-4, 1 + 1e-4);
                }
            }
        }
    }

    @Test
    void sequentialRampsRiseInLightnessWithEvenPerceptualSteps() {
        // Perceptual evenness: equal steps in position give near-equal OKLab distances (Ottosson 2020:
        // Euclidean OKLab distance approximates perceived difference). Tolerance: steps within a factor
        // of 1.6 of each other, our design target.
        for (ColourRamp ramp : new ColourRamp[] {ColourRamp.SHOAL, ColourRamp.PEWTER}) {
            double minStep = Double.MAX_VALUE, maxStep = 0, prevL = -1;
            for (int i = 1; i <= STEPS; i++) {
                double[] p = Oklab.fromArgb(ramp.argb((i - 1) / (double) STEPS));
                double[] q = Oklab.fromArgb(ramp.argb(i / (double) STEPS));
                assertThat(q[0]).as("%s lightness rises", ramp).isGreaterThan(prevL);
                prevL = q[0];
                double d = Math.sqrt(sq(q[0] - p[0]) + sq(q[1] - p[1]) + sq(q[2] - p[2]));
                minStep = Math.min(minStep, d);
                maxStep = Math.max(maxStep, d);
            }
            assertThat(maxStep / minStep).as("%s step ratio", ramp).isLessThan(1.6);
        }
    }

    @Test
    void divergingRampIsLightestAtTheCentreAndBalanced() {
        // Design rule of a diverging ramp (common practice): equal lightness at equal distance from the
        // centre, so positive and negative anomalies of equal size look equally strong.
        ColourRamp w = ColourRamp.WAKE;
        assertThat(w.isDiverging()).isTrue();
        double centre = Oklab.fromArgb(w.argb(0.5))[0];
        for (int i = 1; i <= 20; i++) {
            double d = i / 40.0;
            double lo = Oklab.fromArgb(w.argb(0.5 - d))[0], hi = Oklab.fromArgb(w.argb(0.5 + d))[0];
            assertThat(lo).isCloseTo(hi, within(0.01));
            assertThat(lo).isLessThan(centre);
        }
        // the two arms differ in hue: blue-ward (b < 0) below the centre, red-ward (a > 0) above
        assertThat(Oklab.fromArgb(w.argb(0.1))[2]).isNegative();
        assertThat(Oklab.fromArgb(w.argb(0.9))[1]).isPositive();
    }

    @Test
    void blankIsTransparentAndPositionsAreClamped() {
        assertThat(ColourRamp.SHOAL.argb(Double.NaN)).isZero();
        assertThat(ColourRamp.SHOAL.argb(-3)).isEqualTo(ColourRamp.SHOAL.argb(0));
        assertThat(ColourRamp.SHOAL.argb(7)).isEqualTo(ColourRamp.SHOAL.argb(1));
    }

    @Test
    void unknownNameSaysWhichExist() {
        assertThat(ColourRamp.named("WAKE")).isSameAs(ColourRamp.WAKE);
        assertThatThrownBy(() -> ColourRamp.named("rainbow")).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("shoal");
    }

    private static double sq(double v) {
        return v * v;
    }
}
