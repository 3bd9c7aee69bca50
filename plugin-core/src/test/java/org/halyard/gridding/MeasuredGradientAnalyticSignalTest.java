package org.halyard.gridding;

import static org.assertj.core.api.Assertions.assertThat;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.model.Dipole;
import org.halyard.spectral.FilterBank;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;
import org.junit.jupiter.api.Test;

/**
 * Analytic signal from measured gradients against the exact analytic signal of a dipole: gradients of the
 * closed-form field (Blakely 1995, eq. 4.13) by central differences of 1 mm, |A| = sqrt(Tx^2+Ty^2+Tz^2)
 * (Roest, Verhoef and Pilkington 1992, eq. 4).
 */
class MeasuredGradientAnalyticSignalTest {

    static final double H = 1e-3;

    @Test
    void matchesTheExactDipoleAnalyticSignalAndBeatsTheGridDerivedOne() {
        Dipole d = Dipole.along(40, 40, 3, 2, LineSurvey.FIELD);
        double spacing = 1.5, step = 0.2;
        int lines = (int) (80 / spacing) + 1, per = (int) (80 / step) + 1;
        int n = lines * per;
        double[] x = new double[n], y = new double[n], v = new double[n], gx = new double[n], gy = new double[n];
        for (int l = 0, k = 0; l < lines; l++) {
            for (int i = 0; i < per; i++, k++) {
                x[k] = l * spacing + 0.1;
                y[k] = i * step;
                v[k] = d.totalField(x[k], y[k], 0, LineSurvey.FIELD);
                gx[k] = (d.totalField(x[k] + H, y[k], 0, LineSurvey.FIELD) - d.totalField(x[k] - H, y[k], 0, LineSurvey.FIELD)) / (2 * H);
                gy[k] = (d.totalField(x[k], y[k] + H, 0, LineSurvey.FIELD) - d.totalField(x[k], y[k] - H, 0, LineSurvey.FIELD)) / (2 * H);
            }
        }
        GridGeometry g = SplineGridder.geometryFor(x, y, 0.5, null);
        GriddingOptions opt = GriddingOptions.defaults().withBlankDistance(Double.POSITIVE_INFINITY);
        Grid measured = MeasuredGradientAnalyticSignal.compute(new GradientSamples(x, y, gx, gy), g, opt, null).amplitude();
        Grid fromField = new FilterBank(SplineGridder.grid(x, y, v, g, opt, null).grid(), FilterSettings.defaults())
                .apply(FilterOperation.ANALYTIC_SIGNAL, null);
        double sm = 0, sf = 0, peak = 0;
        int count = 0;
        for (int r = 0; r < g.rows(); r++) {
            for (int c = 0; c < g.columns(); c++) {
                double px = g.x(c), py = g.y(r);
                if (Math.hypot(px - 40, py - 40) > 20) {
                    continue; // interior only: the wavenumber engine's edges are not under test
                }
                double ax = (d.totalField(px + H, py, 0, LineSurvey.FIELD) - d.totalField(px - H, py, 0, LineSurvey.FIELD)) / (2 * H);
                double ay = (d.totalField(px, py + H, 0, LineSurvey.FIELD) - d.totalField(px, py - H, 0, LineSurvey.FIELD)) / (2 * H);
                double az = (d.totalField(px, py, H, LineSurvey.FIELD) - d.totalField(px, py, -H, LineSurvey.FIELD)) / (2 * H);
                double truth = Math.sqrt(ax * ax + ay * ay + az * az);
                peak = Math.max(peak, truth);
                sm += Math.pow(measured.get(c, r) - truth, 2);
                sf += Math.pow(fromField.get(c, r) - truth, 2);
                count++;
            }
        }
        double em = Math.sqrt(sm / count), ef = Math.sqrt(sf / count);
        System.out.printf("analytic signal RMS error: from measured gradients %.4f, from the field grid %.4f nT/m (peak %.3f)%n",
                em, ef, peak);
        // Bound chosen for this test (no published figure): 5 % of the peak; and no worse than the grid-derived one.
        assertThat(em).isLessThanOrEqualTo(0.05 * peak);
        assertThat(em).isLessThanOrEqualTo(ef);
    }
}
