package org.halyard.survey;

import java.util.ArrayList;
import java.util.List;

/**
 * Estimates the time lag between positions and readings from pairs of neighbouring lines run in opposite
 * directions: a lag displaces an anomaly backward along each line's own track, so opposite lines disagree
 * by twice the displacement, and the lag that best reconciles their profiles is the estimate.
 *
 * <p><b>Algorithm:</b> consecutive traverse lines (file order) whose mean headings differ by more than
 * 150 degrees form pairs. Both are projected on the first line's mean direction; for a trial lag tau a
 * reading is placed at the position the line had at {@code t - tau}, i.e. moved back by
 * {@code speed * tau} along its own direction. The misfit of a pair is the variance of the difference of
 * the second line's values and the first line's values interpolated at the same along-axis coordinate
 * (mean difference removed, so line offsets do not matter). Trial lags run over [-maxLag, maxLag] in
 * steps of the median sample interval; a parabola through the best three refines the minimum (common
 * practice for opposite-line lag tests).
 *
 * <p><b>Accuracy:</b> a fraction of the sample interval when the field varies mainly along the lines over
 * the line spacing; biased when anomalies are oblique and lines far apart.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class LagEstimator {

    /** Lines whose mean headings differ by more than this are opposite, degrees. */
    static final double OPPOSITE_DEG = 150;
    /** Shorter lines are not used. */
    static final int MIN_SAMPLES = 10;

    /**
     * @param lagS   estimated lag, s: positive when readings are late (belong to an earlier position)
     * @param pairs  number of opposite line pairs used
     * @param misfit misfit at the estimate, nT^2
     */
    public record Result(double lagS, int pairs, double misfit) {
    }

    private LagEstimator() {
    }

    /**
     * @param lines     the lines (reference positions m, times s)
     * @param value     the value per row, nT (e.g. the sensor mean)
     * @param isTie     per line, whether it is a tie line (excluded)
     * @param maxLagS   the largest lag tried either way, s (&gt; 0)
     * @throws IllegalArgumentException when no pair of opposite lines exists
     */
    public static Result estimate(SurveyLines lines, double[] value, boolean[] isTie, double maxLagS) {
        List<int[]> pairs = oppositePairs(lines, isTie);
        double[] t = lines.time();
        double dtSum = 0;
        int dtN = 0;
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            if (!isTie[l] && e - s >= MIN_SAMPLES) {
                dtSum += (t[e - 1] - t[s]) / (e - s - 1);
                dtN++;
            }
        }
        double step = dtSum / dtN;
        int k = (int) Math.ceil(maxLagS / step);
        double[] m = new double[2 * k + 1];
        for (int j = -k; j <= k; j++) {
            for (int[] p : pairs) {
                m[j + k] += misfit(lines, value, p[0], p[1], j * step);
            }
        }
        int best = 0;
        for (int j = 1; j < m.length; j++) {
            if (m[j] < m[best]) {
                best = j;
            }
        }
        double lag = (best - k) * step;
        if (best > 0 && best < m.length - 1) {
            double a = m[best - 1], b = m[best], c = m[best + 1];
            double den = a - 2 * b + c;
            if (den > 0) {
                lag += 0.5 * (a - c) / den * step;
            }
        }
        return new Result(lag, pairs.size(), m[best] / pairs.size());
    }

    /**
     * The mean misfit of the opposite-direction pairs for one trial lag: the figure {@link #estimate}
     * minimises, for reporting the mismatch before and after a lag is applied.
     *
     * @param lines the lines (reference positions m, times s)
     * @param value the value per row, nT
     * @param isTie per line, whether it is a tie line (excluded)
     * @param lagS  the trial lag, s (positive: readings late)
     * @return the mean over pairs of the variance of the difference of the two profiles, nT^2
     * @throws IllegalArgumentException when no pair of opposite lines exists
     */
    public static double meanMisfit(SurveyLines lines, double[] value, boolean[] isTie, double lagS) {
        List<int[]> pairs = oppositePairs(lines, isTie);
        double m = 0;
        for (int[] p : pairs) {
            m += misfit(lines, value, p[0], p[1], lagS);
        }
        return m / pairs.size();
    }

    /** Consecutive traverse lines (file order) of at least {@value #MIN_SAMPLES} samples run in opposite directions. */
    private static List<int[]> oppositePairs(SurveyLines lines, boolean[] isTie) {
        double[] x = lines.x(), y = lines.y();
        List<int[]> pairs = new ArrayList<>();
        int prev = -1;
        for (int l = 0; l < lines.lineCount(); l++) {
            if (isTie[l] || lines.end(l) - lines.start(l) < MIN_SAMPLES) {
                continue;
            }
            if (prev >= 0 && angle(heading(x, y, lines, prev), heading(x, y, lines, l)) > OPPOSITE_DEG) {
                pairs.add(new int[] {prev, l});
            }
            prev = l;
        }
        if (pairs.isEmpty()) {
            throw new IllegalArgumentException(lines.source() + ": no neighbouring traverse lines run in opposite "
                    + "directions; the lag cannot be estimated");
        }
        return pairs;
    }

    private static double heading(double[] x, double[] y, SurveyLines lines, int l) {
        int s = lines.start(l), e = lines.end(l) - 1;
        return Math.toDegrees(Math.atan2(x[e] - x[s], y[e] - y[s]));
    }

    private static double angle(double a, double b) {
        double d = Math.abs(a - b) % 360;
        return d > 180 ? 360 - d : d;
    }

    /** Misfit variance between lines a and b for a trial lag, on a's mean direction. */
    static double misfit(SurveyLines lines, double[] v, int a, int b, double lag) {
        double[] x = lines.x(), y = lines.y(), t = lines.time();
        int sa = lines.start(a), ea = lines.end(a), sb = lines.start(b), eb = lines.end(b);
        double ux = x[ea - 1] - x[sa], uy = y[ea - 1] - y[sa], len = Math.hypot(ux, uy);
        ux /= len;
        uy /= len;
        double va = len / (t[ea - 1] - t[sa]);
        double vb = Math.hypot(x[eb - 1] - x[sb], y[eb - 1] - y[sb]) / (t[eb - 1] - t[sb]);
        // a runs along +u, b along -u: moving a reading back along its own track by speed * lag
        int na = ea - sa;
        double[] pa = new double[na];
        for (int i = 0; i < na; i++) {
            pa[i] = (x[sa + i] - x[sa]) * ux + (y[sa + i] - y[sa]) * uy - va * lag;
        }
        double sum = 0, sum2 = 0;
        int n = 0;
        int j = 0;
        for (int i = eb - 1; i >= sb; i--) { // b reversed: increasing along u
            double p = (x[i] - x[sa]) * ux + (y[i] - y[sa]) * uy + vb * lag;
            while (j < na - 2 && pa[j + 1] < p) {
                j++;
            }
            if (p < pa[0] || p > pa[na - 1] || Double.isNaN(v[i])) {
                continue;
            }
            double w = (p - pa[j]) / (pa[j + 1] - pa[j]);
            double d = v[i] - (v[sa + j] + w * (v[sa + j + 1] - v[sa + j]));
            if (!Double.isNaN(d)) {
                sum += d;
                sum2 += d * d;
                n++;
            }
        }
        return n > 1 ? sum2 / n - (sum / n) * (sum / n) : Double.POSITIVE_INFINITY;
    }
}
