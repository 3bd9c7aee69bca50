package org.halyard.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Set;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.junit.jupiter.api.Test;

class PairGradientTest {

    static final FieldDirection F = new FieldDirection(66, 1.5);
    static final Dipole D = Dipole.along(103.0, 52.0, 4.0, 50, F); // 4 m below the sensors (z = 0)

    /**
     * Analytic gradient of the total-field anomaly of a dipole: differentiating
     * B = C [3 (m.r) r / r^5 - m / r^3] (Blakely 1995, eq. 4.13) gives
     * dB_i/dr_j = C [3 (m_j r_i + (m.r) delta_ij) / r^5 - 15 (m.r) r_i r_j / r^7 + 3 m_i r_j / r^5];
     * derived here, so checked against a fine central difference of Dipole.totalField below.
     */
    static double[] analyticGradient(double px, double py, double pz) {
        double[] r = {px - D.x(), py - D.y(), pz - D.z()};
        double[] m = {D.mx(), D.my(), D.mz()};
        double[] f = F.unitVector();
        double r2 = r[0] * r[0] + r[1] * r[1] + r[2] * r[2], rr = Math.sqrt(r2);
        double r5 = r2 * r2 * rr, r7 = r5 * r2, mr = m[0] * r[0] + m[1] * r[1] + m[2] * r[2];
        double c = 100; // mu0/4pi * 1e9, nT m3 / (A m2)
        double[] g = new double[3];
        for (int j = 0; j < 3; j++) {
            double s = 0;
            for (int i = 0; i < 3; i++) {
                double dij = i == j ? 1 : 0;
                s += f[i] * c * (3 * (m[j] * r[i] + mr * dij) / r5 - 15 * mr * r[i] * r[j] / r7 + 3 * m[i] * r[j] / r5);
            }
            g[j] = s;
        }
        return g;
    }

    @Test
    void analyticGradientAgreesWithFineDifference() {
        double h = 1e-4;
        double[] p = {101.3, 50.2, 0};
        double[] g = analyticGradient(p[0], p[1], p[2]);
        double gx = (D.totalField(p[0] + h, p[1], 0, F) - D.totalField(p[0] - h, p[1], 0, F)) / (2 * h);
        double gy = (D.totalField(p[0], p[1] + h, 0, F) - D.totalField(p[0], p[1] - h, 0, F)) / (2 * h);
        assertThat(g[0]).isCloseTo(gx, org.assertj.core.data.Offset.offset(1e-5 * Math.abs(gx) + 1e-7));
        assertThat(g[1]).isCloseTo(gy, org.assertj.core.data.Offset.offset(1e-5 * Math.abs(gy) + 1e-7));
    }

    /** Third derivative of T along unit vector u, from the analytic gradient by a central second difference. */
    static double third(double x, double y, double ux, double uy) {
        return mixed(x, y, ux, uy, ux, uy);
    }

    /** d/du d2/dv2 of T: the second difference along v of the analytic gradient projected on u. */
    static double mixed(double x, double y, double ux, double uy, double vx, double vy) {
        double h = 1e-3;
        double[] a = analyticGradient(x + h * vx, y + h * vy, 0), b = analyticGradient(x, y, 0),
                c = analyticGradient(x - h * vx, y - h * vy, 0);
        return ((a[0] - 2 * b[0] + c[0]) * ux + (a[1] - 2 * b[1] + c[1]) * uy) / (h * h);
    }

    @Test
    void transverseGradientMatchesAnalyticWithinFiniteDifferenceError() {
        double s = 1.0;
        // one line through the anomaly at heading 30 degrees
        double h = Math.toRadians(30);
        double ux = Math.sin(h), uy = Math.cos(h);
        List<SyntheticLines.Spec> specs = List.of(new SyntheticLines.Spec("L1", 103 - 40 * ux + 1.2 * uy,
                52 - 40 * uy - 1.2 * ux, 103 + 40 * ux + 1.2 * uy, 52 + 40 * uy - 1.2 * ux));
        SurveyLines lines = SyntheticLines.build(specs, 2.0, 0.1, 1.78e9, new double[] {-s / 2, s / 2},
                (x, y, t) -> D.totalField(x, y, 0, F), null);
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.of()),
                SurveyOptions.defaults().withCleaning(0, 10), null, null);
        GradientPoints g = ps.gradients().get(0);
        double stx = Math.cos(h), sty = -Math.sin(h);
        int checked = 0;
        for (int i = 0; i < g.size(); i++) {
            double dd = Math.hypot(g.x()[i] - 103, g.y()[i] - 52);
            if (dd > 12 || i < 10 || i > g.size() - 10) {
                continue;
            }
            double[] a = analyticGradient(g.x()[i], g.y()[i], 0);
            double trueT = a[0] * stx + a[1] * sty;
            // central difference error s^2/24 T'''(xi) for xi within the pair (Taylor remainder)
            double maxT3 = 0, maxA3 = 0;
            for (int k = -20; k <= 20; k++) { // dense enough to find the maximum on the stencil
                double q = k * s / 40;
                maxT3 = Math.max(maxT3, Math.abs(third(g.x()[i] + q * stx, g.y()[i] + q * sty, stx, sty)));
                maxA3 = Math.max(maxA3, Math.abs(third(g.x()[i] + 4 * q * 0.2 * ux, g.y()[i] + 4 * q * 0.2 * uy, ux, uy)));
            }
            double tolT = s * s / 24 * maxT3 * 1.05 + 1e-4;
            assertThat(g.transverse(i, ps.headingDeg()[i])).as("transverse gradient at %d", i)
                    .isCloseTo(trueT, org.assertj.core.data.Offset.offset(tolT));
            // along: 5-point least-squares slope, error h^2 * (sum k^4 / sum k^2) / 6 f''' = 0.567 h^2 f'''
            // plus the pair mean differing from the midpoint field by (s/2)^2/2 T_tt (Taylor), whose
            // along derivative is s^2/8 T_att
            double tolA = 0.567 * 0.2 * 0.2 * maxA3 * 1.05
                    + s * s / 8 * Math.abs(mixed(g.x()[i], g.y()[i], ux, uy, stx, sty)) * 1.05 + 1e-4;
            double trueA = a[0] * ux + a[1] * uy;
            assertThat(g.along(i, ps.headingDeg()[i])).isCloseTo(trueA, org.assertj.core.data.Offset.offset(tolA));
            // rotated to map axes
            assertThat(g.gx()[i]).isCloseTo(a[0], org.assertj.core.data.Offset.offset(tolT + tolA));
            assertThat(g.gy()[i]).isCloseTo(a[1], org.assertj.core.data.Offset.offset(tolT + tolA));
            checked++;
        }
        assertThat(checked).isGreaterThan(100);
    }

    @Test
    void errorShrinksWithSeparationSquared() {
        // Taylor: halving s divides the central-difference error by about four.
        double[] err = new double[2];
        for (int k = 0; k < 2; k++) {
            double s = k == 0 ? 1.0 : 0.5;
            List<SyntheticLines.Spec> specs = List.of(new SyntheticLines.Spec("L1", 104.0, 20, 104.0, 80));
            SurveyLines lines = SyntheticLines.build(specs, 2.0, 0.1, 1.78e9, new double[] {-s / 2, s / 2},
                    (x, y, t) -> D.totalField(x, y, 0, F), null);
            ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.of()),
                    SurveyOptions.defaults().withCleaning(0, 10), null, null);
            GradientPoints g = ps.gradients().get(0);
            for (int i = 0; i < g.size(); i++) {
                double[] a = analyticGradient(g.x()[i], g.y()[i], 0);
                err[k] = Math.max(err[k], Math.abs(g.transverse(i, ps.headingDeg()[i]) - a[0])); // heading north: starboard = east
            }
        }
        assertThat(err[0] / err[1]).isBetween(3.5, 4.5);
    }
}
