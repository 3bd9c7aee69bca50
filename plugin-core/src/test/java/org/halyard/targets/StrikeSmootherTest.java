package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.junit.jupiter.api.Test;

/**
 * Smoothing along the strike on a straight ridge at 30 degrees from east whose crest rises and falls along
 * it: f = a(s) exp(-d^2 / w^2), d across and s along the ridge, a(s) = 1 + 0.5 sin(2 pi s / 8 m).
 */
class StrikeSmootherTest {

    static final GridGeometry GEO = new GridGeometry(160, 160, 0, 80, 0.5, null);
    static final double ANGLE = Math.toRadians(30);
    static final double W = 2.5;
    static final double WAVE_M = 8;

    static double across(double x, double y) {
        return -(x - 40) * Math.sin(ANGLE) + (y - 40) * Math.cos(ANGLE);
    }

    static double along(double x, double y) {
        return (x - 40) * Math.cos(ANGLE) + (y - 40) * Math.sin(ANGLE);
    }

    static final Grid RIDGE = Grid.sample(GEO, (x, y) -> {
        double d = across(x, y);
        return (1 + 0.5 * Math.sin(2 * Math.PI * along(x, y) / WAVE_M)) * Math.exp(-d * d / (W * W));
    });

    /** Value at distance {@code d} across the ridge and {@code s} along it from the centre (40, 40). */
    static double at(Grid g, double s, double d) {
        return g.valueAt(40 + s * Math.cos(ANGLE) - d * Math.sin(ANGLE), 40 + s * Math.sin(ANGLE) + d * Math.cos(ANGLE));
    }

    @Test
    void theCrestEvensOutAlongTheRidge() {
        Grid out = StrikeSmoother.smooth(RIDGE, 3, 2);
        double lo = Double.POSITIVE_INFINITY, hi = 0;
        for (double s = -15; s <= 15; s += 0.25) {
            lo = Math.min(lo, at(out, s, 0));
            hi = Math.max(hi, at(out, s, 0));
        }
        // Fourier transform of a Gaussian: a ripple of wavelength L keeps exp(-2 pi^2 sigma^2 / L^2) of its
        // amplitude, 0.062 for sigma 3 m and L 8 m; the crest (1 +- 0.5) becomes 1 +- 0.031. Tolerance 0.02:
        // bilinear samples between cell centres fall short of a crest by up to h^2 |f''| / 8 = 0.01 (Taylor
        // remainder, h 0.5 m, f'' = 2 / w^2), and 0.01 for the strike's residual error next to the beads.
        double kept = Math.exp(-2 * Math.PI * Math.PI * 9 / (WAVE_M * WAVE_M));
        assertThat(hi).isCloseTo(1 + 0.5 * kept, within(0.02));
        assertThat(lo).isCloseTo(1 - 0.5 * kept, within(0.02));
        assertThat(hi - lo).isLessThan(0.2 * (1.5 - 0.5)); // the 1.5 : 0.5 crest evened out (by the same law)
    }

    @Test
    void theProfileAcrossIsKept() {
        Grid out = StrikeSmoother.smooth(RIDGE, 3, 2);
        // Averaging along a straight ridge leaves a(s)'s mean (1) times the across profile exp(-d^2/w^2);
        // the ripple that survives (0.031, previous test) is averaged out over a wavelength of s.
        for (double d = -3; d <= 3; d += 0.5) {
            double mean = 0;
            int n = 0;
            for (double s = -4; s < 4; s += 0.25) {
                mean += at(out, s, d);
                n++;
            }
            // The model's own profile; 0.02 for the bilinear shortfall and misorientation as above.
            assertThat(mean / n).isCloseTo(Math.exp(-d * d / (W * W)), within(0.02));
        }
    }

    @Test
    void underACellItReturnsTheGridAndBlanksStayBlank() {
        assertThat(StrikeSmoother.smooth(RIDGE, 0.25, 2)).isSameAs(RIDGE);
        float[] v = RIDGE.toArray();
        int blank = GEO.index(80, 80);
        v[blank] = Float.NaN;
        Grid out = StrikeSmoother.smooth(Grid.wrap(GEO, v), 3, 2);
        assertThat(out.get(blank)).isNaN();
        assertThat(out.get(GEO.index(82, 80))).isFinite(); // blanks leave their neighbours' averages defined
    }
}
