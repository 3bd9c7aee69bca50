package org.halyard.spectral;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.function.DoubleBinaryOperator;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.junit.jupiter.api.Test;

/**
 * Every wavenumber filter against the closed-form field of a point dipole (Blakely 1995, eq. 4.13 and
 * section 12.1): the interior RMS error must stay within 1% of the peak of the expected map.
 */
class DipoleFilterTest {

    /** Earth field of the demo area (inclination 66, declination 1.5 degrees). */
    static final FieldDirection FIELD = new FieldDirection(66, 1.5);
    static final double DEPTH = 6;           // source 6 m below the observation plane
    static final double CELL = 0.25;
    static final int N = 400;
    static final GridGeometry GEOMETRY = new GridGeometry(N, N, 500000 - N * CELL / 2, 5800000 + N * CELL / 2,
            CELL, "EPSG:32631");
    static final Dipole SOURCE = Dipole.along(500000, 5800000, DEPTH, 5.0, FIELD);
    /** Step of the central differences that give the expected derivatives (error ~ h^2, about 1e-7 relative). */
    static final double H = 1e-3;

    static double field(double x, double y, double z) {
        return SOURCE.totalField(x, y, z, FIELD);
    }

    static Grid observed() {
        return Grid.sample(GEOMETRY, (x, y) -> field(x, y, 0));
    }

    /** Interior RMS of (actual - expected) over the peak of |expected|, on the central half of the grid. */
    static double interiorError(Grid actual, DoubleBinaryOperator expected) {
        double se = 0, peak = 0;
        int n = 0;
        for (int r = N / 4; r < 3 * N / 4; r++) {
            for (int c = N / 4; c < 3 * N / 4; c++) {
                double e = expected.applyAsDouble(GEOMETRY.x(c), GEOMETRY.y(r));
                double d = actual.get(c, r) - e;
                se += d * d;
                peak = Math.max(peak, Math.abs(e));
                n++;
            }
        }
        return Math.sqrt(se / n) / peak;
    }

    static Grid run(FilterOperation op, FilterSettings s) {
        return new FilterBank(observed(), s).apply(op, Progress.NONE);
    }

    @Test
    void upwardContinuationMatchesFieldAtTheHigherLevel() {
        Grid up = run(FilterOperation.UPWARD, FilterSettings.defaults().withHeight(2));
        // Expected: the same dipole observed 2 m higher (z = -2, z down).
        assertThat(interiorError(up, (x, y) -> field(x, y, -2))).isLessThan(0.01);
    }

    @Test
    void downwardContinuationMatchesFieldAtTheLowerLevel() {
        Grid down = run(FilterOperation.DOWNWARD, FilterSettings.defaults().withHeight(1).withDamping(1e-6));
        // Expected: the dipole observed 1 m lower; light damping, smooth field (Blakely 1995, 12.3.2).
        assertThat(interiorError(down, (x, y) -> field(x, y, 1))).isLessThan(0.01);
    }

    @Test
    void verticalDerivativeMatchesAnalyticDerivative() {
        Grid vd = run(FilterOperation.VERTICAL_DERIVATIVE, FilterSettings.defaults());
        // d/dz with z down: the field one step deeper minus one step shallower.
        assertThat(interiorError(vd, (x, y) -> (field(x, y, H) - field(x, y, -H)) / (2 * H))).isLessThan(0.01);
    }

    @Test
    void secondVerticalDerivativeMatchesAnalyticDerivative() {
        Grid vd2 = run(FilterOperation.VERTICAL_DERIVATIVE, FilterSettings.defaults().withOrder(2));
        double h = 1e-2;
        assertThat(interiorError(vd2, (x, y) -> (field(x, y, h) - 2 * field(x, y, 0) + field(x, y, -h)) / (h * h)))
                .isLessThan(0.01);
    }

    @Test
    void horizontalDerivativesMatchAnalyticDerivatives() {
        Grid dx = run(FilterOperation.DX, FilterSettings.defaults());
        Grid dy = run(FilterOperation.DY, FilterSettings.defaults());
        assertThat(interiorError(dx, (x, y) -> (field(x + H, y, 0) - field(x - H, y, 0)) / (2 * H))).isLessThan(0.01);
        assertThat(interiorError(dy, (x, y) -> (field(x, y + H, 0) - field(x, y - H, 0)) / (2 * H))).isLessThan(0.01);
    }

    static double gradientNorm(double x, double y, boolean vertical) {
        double gx = (field(x + H, y, 0) - field(x - H, y, 0)) / (2 * H);
        double gy = (field(x, y + H, 0) - field(x, y - H, 0)) / (2 * H);
        double gz = vertical ? (field(x, y, H) - field(x, y, -H)) / (2 * H) : 0;
        return Math.sqrt(gx * gx + gy * gy + gz * gz);
    }

    @Test
    void analyticSignalAndHorizontalGradientMatchGradientMagnitudes() {
        // Roest, Verhoef and Pilkington 1992: |A| = sqrt(Tx^2 + Ty^2 + Tz^2).
        Grid as = run(FilterOperation.ANALYTIC_SIGNAL, FilterSettings.defaults());
        Grid thg = run(FilterOperation.TOTAL_HORIZONTAL_GRADIENT, FilterSettings.defaults());
        assertThat(interiorError(as, (x, y) -> gradientNorm(x, y, true))).isLessThan(0.01);
        assertThat(interiorError(thg, (x, y) -> gradientNorm(x, y, false))).isLessThan(0.01);
        assertThat(as.range()[0]).isGreaterThanOrEqualTo(0);
    }

    @Test
    void reductionToPoleMatchesTheSameDipoleAtThePole() {
        Grid rtp = run(FilterOperation.REDUCE_TO_POLE, FilterSettings.defaults().withField(FIELD));
        // Expected: the dipole's moment vertical (down) and the field vertical (Baranov 1957; Blakely eq. 12.31).
        Dipole atPole = Dipole.along(SOURCE.x(), SOURCE.y(), DEPTH, 5.0, FieldDirection.POLE);
        assertThat(interiorError(rtp, (x, y) -> atPole.totalField(x, y, 0, FieldDirection.POLE))).isLessThan(0.01);
    }

    @Test
    void reductionToPoleOfRemanentSourceUsesTheMagnetisationDirection() {
        FieldDirection remanence = new FieldDirection(-30, 140);
        Dipole source = Dipole.along(SOURCE.x(), SOURCE.y(), DEPTH, 5.0, remanence);
        Grid obs = Grid.sample(GEOMETRY, (x, y) -> source.totalField(x, y, 0, FIELD));
        FilterSettings s = FilterSettings.defaults().withField(FIELD).withMagnetisation(remanence);
        Grid rtp = new FilterBank(obs, s).apply(FilterOperation.REDUCE_TO_POLE, Progress.NONE);
        Dipole atPole = Dipole.along(SOURCE.x(), SOURCE.y(), DEPTH, 5.0, FieldDirection.POLE);
        assertThat(interiorError(rtp, (x, y) -> atPole.totalField(x, y, 0, FieldDirection.POLE))).isLessThan(0.01);
    }

    @Test
    void verticalDerivativeFromHorizontalGradientsMatchesAnalyticDerivative() {
        // Harmonic relation F(Tz) = -i (kx F(Tx) + ky F(Ty)) / k, sign checked on a dipole (DOMAIN.md).
        Grid tx = Grid.sample(GEOMETRY, (x, y) -> (field(x + H, y, 0) - field(x - H, y, 0)) / (2 * H));
        Grid ty = Grid.sample(GEOMETRY, (x, y) -> (field(x, y + H, 0) - field(x, y - H, 0)) / (2 * H));
        Grid tz = HarmonicGradients.verticalDerivative(tx, ty, Progress.NONE);
        assertThat(interiorError(tz, (x, y) -> (field(x, y, H) - field(x, y, -H)) / (2 * H))).isLessThan(0.01);
        Grid as = HarmonicGradients.analyticSignal(tx, ty, Progress.NONE);
        assertThat(interiorError(as, (x, y) -> gradientNorm(x, y, true))).isLessThan(0.01);
    }

    @Test
    void blanksAreFilledForTheTransformAndRestoredAfter() {
        float[] v = observed().toArray();
        for (int r = 10; r < 30; r++) {
            for (int c = 300; c < 330; c++) {
                v[GEOMETRY.index(c, r)] = Float.NaN;
            }
        }
        Grid g = Grid.of(GEOMETRY, v);
        Grid up = new FilterBank(g, FilterSettings.defaults().withHeight(2)).apply(FilterOperation.UPWARD, Progress.NONE);
        assertThat(up.get(310, 20)).isNaN();
        assertThat(up.validCount()).isEqualTo(g.validCount());
        assertThat(interiorError(up, (x, y) -> field(x, y, -2))).isLessThan(0.01);
    }
}
