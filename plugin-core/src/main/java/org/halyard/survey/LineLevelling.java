package org.halyard.survey;

import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * Least-squares line corrections from traverse/tie crossovers (Yarger, Robertson and Wentland 1978,
 * Geophysics 43(6) 1148-1156).
 *
 * <p><b>Algorithm:</b> each adjustable line L gets a correction {@code c_L(t) = sum_j a_Lj tau^j},
 * tau = (t - t_mid) / half-duration in [-1, 1], of order up to the requested trend (reduced where a line
 * has fewer crossovers than coefficients). Each crossover k between traverse line T and tie line S gives
 * the observation {@code c_T(t_k) - c_S(t'_k) = v_S - v_T}; the coefficients minimise the sum of squared
 * residuals through the normal equations (Cholesky, Commons Math) with a ridge of
 * {@value #RIDGE} times the largest diagonal term so that poorly tied coefficients stay near zero rather
 * than making the system singular. With tie lines fixed (the default) they are the datum and only
 * traverse lines move; with ties adjusted as well, the mean correction of the tie lines is constrained to
 * zero (each coefficient order), which fixes the datum.
 *
 * <p><b>Accuracy:</b> for offsets alone and an exact field at the crossovers, offsets are recovered to
 * the interpolation error of the crossover values (see the tests).
 *
 * <p><b>Limitations:</b> crossovers among traverse lines or among tie lines are not used. Lines without
 * crossovers are left as they are and flagged.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class LineLevelling {

    /** Relative ridge added to the normal equations. */
    static final double RIDGE = 1e-9;
    /** Weight of the datum constraint when ties are adjusted too. */
    static final double DATUM_WEIGHT = 1e3;
    /** Reweighting passes of the robust fit, the first {@value #HUBER_ITERATIONS} with Huber weights. */
    static final int ROBUST_ITERATIONS = 8;
    static final int HUBER_ITERATIONS = 3;
    /** Below this residual scale (nT) the crossovers already agree and reweighting stops. */
    static final double MIN_ROBUST_SCALE_NT = 1e-4;

    /**
     * The fitted corrections.
     *
     * @param order   per line, the order used, -1 where the line is not corrected
     * @param coeff   per line, the coefficients a_j, nT (empty where not corrected)
     * @param tMid    per line, the centre time, epoch seconds
     * @param tHalf   per line, the half duration, s (at least 1)
     */
    public record Solution(int[] order, double[][] coeff, double[] tMid, double[] tHalf) {

        /** The correction of line {@code l} at time {@code t}, nT (0 where the line is not corrected). */
        public double correction(int l, double t) {
            if (order[l] < 0) {
                return 0;
            }
            double tau = (t - tMid[l]) / tHalf[l], p = 1, c = 0;
            for (int j = 0; j <= order[l]; j++) {
                c += coeff[l][j] * p;
                p *= tau;
            }
            return c;
        }
    }

    private LineLevelling() {
    }

    /**
     * Solves for line corrections.
     *
     * @param lines       the line index and times
     * @param isTie       per line, whether it is a tie line
     * @param crossovers  the crossovers
     * @param trend       the correction form per line
     * @param adjustTies  whether tie lines are corrected too (mean tie correction zero); otherwise fixed
     */
    public static Solution solve(SurveyLines lines, boolean[] isTie, List<Crossover> crossovers, LevellingTrend trend,
                                 boolean adjustTies) {
        int nl = lines.lineCount();
        int[] count = new int[nl];
        for (Crossover c : crossovers) {
            count[c.traverseLine()]++;
            count[c.tieLine()]++;
        }
        int[] order = new int[nl];
        int[] offset = new int[nl];
        double[] tMid = new double[nl], tHalf = new double[nl];
        double[] t = lines.time();
        int nu = 0;
        for (int l = 0; l < nl; l++) {
            boolean adjustable = !isTie[l] || adjustTies;
            order[l] = adjustable && count[l] > 0 && trend.order() >= 0 ? Math.min(trend.order(), count[l] - 1) : -1;
            offset[l] = nu;
            nu += order[l] + 1;
            int s = lines.start(l), e = lines.end(l);
            tMid[l] = e > s ? 0.5 * (t[s] + t[e - 1]) : 0;
            tHalf[l] = e > s ? Math.max(1, 0.5 * (t[e - 1] - t[s])) : 1;
        }
        double[][] coeff = new double[nl][];
        for (int l = 0; l < nl; l++) {
            coeff[l] = new double[order[l] + 1];
        }
        if (nu == 0) {
            return new Solution(order, coeff, tMid, tHalf);
        }
        // Robust fit by iteratively reweighted least squares: crossovers over steep anomalies (a sensor pair
        // crossing a pipe along a tie line sees it at other offsets) are outliers that plain least squares
        // spreads over whole lines. Huber weights first, then Tukey's bisquare (Holland and Welsch 1977,
        // Commun. Statist. A6(9) 813-827).
        double[] w = new double[crossovers.size()];
        java.util.Arrays.fill(w, 1);
        RealVector sol = null;
        for (int iter = 0; iter < ROBUST_ITERATIONS; iter++) {
            sol = weightedSolve(crossovers, w, nu, nl, isTie, order, offset, tMid, tHalf, trend, adjustTies);
            double[] r = new double[crossovers.size()];
            for (int c = 0; c < r.length; c++) {
                r[c] = residual(crossovers.get(c), sol, order, offset, tMid, tHalf);
            }
            double scale = 1.4826 * medianAbs(r);
            if (!(scale > MIN_ROBUST_SCALE_NT)) {
                break;
            }
            boolean bisquare = iter >= HUBER_ITERATIONS;
            for (int c = 0; c < r.length; c++) {
                double u = Math.abs(r[c]) / scale;
                w[c] = bisquare ? (u < 4.685 ? Math.pow(1 - (u / 4.685) * (u / 4.685), 2) : 0)
                        : (u <= 1.345 ? 1 : 1.345 / u);
            }
        }
        for (int l = 0; l < nl; l++) {
            for (int j = 0; j <= order[l]; j++) {
                coeff[l][j] = sol.getEntry(offset[l] + j);
            }
        }
        return new Solution(order, coeff, tMid, tHalf);
    }

    private static RealVector weightedSolve(List<Crossover> crossovers, double[] w, int nu, int nl, boolean[] isTie,
                                            int[] order, int[] offset, double[] tMid, double[] tHalf,
                                            LevellingTrend trend, boolean adjustTies) {
        double[][] nm = new double[nu][nu];
        double[] rhs = new double[nu];
        int[] idx = new int[6];
        double[] a = new double[6];
        for (int ci = 0; ci < crossovers.size(); ci++) {
            Crossover c = crossovers.get(ci);
            int k = 0;
            k = basis(c.traverseLine(), c.traverseTime(), 1, order, offset, tMid, tHalf, idx, a, k);
            k = basis(c.tieLine(), c.tieTime(), -1, order, offset, tMid, tHalf, idx, a, k);
            accumulate(nm, rhs, idx, a, k, c.tieValue() - c.traverseValue(), w[ci]);
        }
        if (adjustTies) {
            for (int j = 0; j <= Math.max(0, trend.order()); j++) {
                int k = 0;
                for (int l = 0; l < nl; l++) {
                    if (isTie[l] && order[l] >= j) {
                        if (k == idx.length) {
                            idx = java.util.Arrays.copyOf(idx, k * 2);
                            a = java.util.Arrays.copyOf(a, k * 2);
                        }
                        idx[k] = offset[l] + j;
                        a[k++] = 1;
                    }
                }
                accumulate(nm, rhs, idx, a, k, 0, DATUM_WEIGHT);
            }
        }
        double maxDiag = 0;
        for (int i = 0; i < nu; i++) {
            maxDiag = Math.max(maxDiag, nm[i][i]);
        }
        for (int i = 0; i < nu; i++) {
            nm[i][i] += RIDGE * Math.max(maxDiag, 1);
        }
        return new CholeskyDecomposition(new Array2DRowRealMatrix(nm, false), 1e-6, 0)
                .getSolver().solve(new ArrayRealVector(rhs, false));
    }

    /** The misfit left at a crossover by the corrections {@code sol}, nT. */
    private static double residual(Crossover c, RealVector sol, int[] order, int[] offset, double[] tMid, double[] tHalf) {
        int[] idx = new int[12];
        double[] a = new double[12];
        int k = basis(c.traverseLine(), c.traverseTime(), 1, order, offset, tMid, tHalf, idx, a, 0);
        k = basis(c.tieLine(), c.tieTime(), -1, order, offset, tMid, tHalf, idx, a, k);
        double model = 0;
        for (int p = 0; p < k; p++) {
            model += a[p] * sol.getEntry(idx[p]);
        }
        return model - (c.tieValue() - c.traverseValue());
    }

    private static double medianAbs(double[] r) {
        double[] a = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            a[i] = Math.abs(r[i]);
        }
        java.util.Arrays.sort(a);
        return a.length == 0 ? 0 : a[a.length / 2];
    }

    private static int basis(int l, double time, double sign, int[] order, int[] offset, double[] tMid,
                             double[] tHalf, int[] idx, double[] a, int k) {
        double tau = (time - tMid[l]) / tHalf[l], p = 1;
        for (int j = 0; j <= order[l]; j++) {
            idx[k] = offset[l] + j;
            a[k++] = sign * p;
            p *= tau;
        }
        return k;
    }

    private static void accumulate(double[][] nm, double[] rhs, int[] idx, double[] a, int k, double d, double w) {
        for (int p = 0; p < k; p++) {
            rhs[idx[p]] += w * a[p] * d;
            for (int q = 0; q < k; q++) {
                nm[idx[p]][idx[q]] += w * a[p] * a[q];
            }
        }
    }
}
