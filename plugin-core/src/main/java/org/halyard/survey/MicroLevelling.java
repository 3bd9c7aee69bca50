package org.halyard.survey;

import java.util.Arrays;
import java.util.Locale;

/**
 * Micro-levelling: removes the residual line-to-line striping that tie-line levelling leaves, by a
 * directional filter after Minty 1991 ("Simple micro-levelling for aeromagnetic data", Exploration
 * Geophysics 22, 591-592): a high-pass across the lines followed by a low-pass along them isolates the
 * corrugation, which is clipped and subtracted from the line data.
 *
 * <p><b>Algorithm:</b>
 * <ol>
 *   <li>The dominant traverse direction is the length-weighted axial mean of the traverse lines' end-to-end
 *       directions; traverse lines within {@value #PARALLEL_DEG} degrees of it take part, tie lines and
 *       other lines are left alone. Each row gets an along coordinate u and an across coordinate w; a line's
 *       across position is the median of its w. The line spacing d is the median gap between neighbouring
 *       line positions.</li>
 *   <li>A line-aligned grid: one row per line, stations every {@code sigma_along / 4} along u; a station
 *       holds the mean of the line's values in it (empty stations are blank).</li>
 *   <li>High-pass across: at every station, the line's value minus a Gaussian-weighted least-squares
 *       quadratic in w through the lines within 3 sigma_across (the line itself included). A local
 *       quadratic rather than Minty's Fourier-domain filter so that smooth geology, whose across-line
 *       curvature is what a plain mean would leak, stays out of the estimate, and survey edges need no
 *       padding. The result is clipped to the limit, so that a strong local anomaly (a ferrous target)
 *       cannot leak into the correction of its line.</li>
 *   <li>Low-pass along: a Gaussian-weighted least-squares straight line in u through the stations within
 *       3 sigma_along (exact for offsets and linear drifts, up to the line ends). The result, clipped to
 *       the limit again, is the corrugation estimate; interpolated linearly to every row of the line, its
 *       negative is the correction.</li>
 * </ol>
 * Filter widths are stated as wavelengths: sigma = wavelength / (2 pi). Defaults: across
 * {@value #DEFAULT_ACROSS_SPACINGS} line spacings, along {@value #DEFAULT_ALONG_SPACINGS} line spacings,
 * limit {@value #DEFAULT_LIMIT_NT} nT.
 *
 * <p><b>Accuracy:</b> per-line errors that change slowly along the lines and alternate from line to line
 * are removed; the part of random per-line errors that is smooth across the lines (longer than the
 * across wavelength) is indistinguishable from geology and stays (see the tests for figures).
 *
 * <p><b>Limitations:</b> geology elongated along the lines with a short across-line width (a cable or
 * pipeline parallel to the lines, a narrow dyke) looks like corrugation and is damped up to the limit;
 * keep the limit just above the expected striping. Needs at least four parallel traverse lines.
 *
 * <p><b>Thread safety:</b> stateless; the inputs are read, never changed.
 */
public final class MicroLevelling {

    /** Traverse lines whose direction is within this many degrees of the dominant one take part. */
    static final double PARALLEL_DEG = 20;
    /** Default across wavelength, in line spacings. */
    public static final double DEFAULT_ACROSS_SPACINGS = 10;
    /** Default along wavelength, in line spacings. */
    public static final double DEFAULT_ALONG_SPACINGS = 60;
    /** Default limit of the correction, nT. */
    public static final double DEFAULT_LIMIT_NT = 5;
    /** Fewest lines a local across fit needs (a quadratic has three coefficients). */
    static final int MIN_ACROSS_LINES = 4;

    /**
     * Filter settings.
     *
     * @param acrossWavelengthM across-line high-pass wavelength, m (sigma = wavelength / 2 pi); NaN for
     *                          {@value #DEFAULT_ACROSS_SPACINGS} line spacings
     * @param alongWavelengthM  along-line low-pass wavelength, m; NaN for {@value #DEFAULT_ALONG_SPACINGS}
     *                          line spacings
     * @param limitNt           largest correction, nT (&gt; 0)
     */
    public record Settings(double acrossWavelengthM, double alongWavelengthM, double limitNt) {
        public Settings {
            if (!Double.isNaN(acrossWavelengthM) && !(acrossWavelengthM > 0)) {
                throw new IllegalArgumentException("micro-levelling across wavelength must be positive metres, got "
                        + acrossWavelengthM);
            }
            if (!Double.isNaN(alongWavelengthM) && !(alongWavelengthM > 0)) {
                throw new IllegalArgumentException("micro-levelling along wavelength must be positive metres, got "
                        + alongWavelengthM);
            }
            if (!(limitNt > 0) || Double.isInfinite(limitNt)) {
                throw new IllegalArgumentException("micro-levelling limit must be a positive number of nT, got " + limitNt);
            }
        }

        /** Wavelengths from the line spacing, limit {@value #DEFAULT_LIMIT_NT} nT. */
        public static Settings defaults() {
            return new Settings(Double.NaN, Double.NaN, DEFAULT_LIMIT_NT);
        }
    }

    /**
     * What micro-levelling did.
     *
     * @param correctionNt      per row, the correction added to every sensor, nT (0 where none)
     * @param linesCorrected    traverse lines that took part
     * @param linesSkipped      traverse lines left alone (not parallel to the others, or too short)
     * @param lineSpacingM      median line spacing, m (NaN when not measured)
     * @param acrossWavelengthM across wavelength used, m
     * @param alongWavelengthM  along wavelength used, m
     * @param limitNt           limit used, nT
     * @param rmsNt             RMS of the correction over the rows of the lines that took part, nT
     * @param maxAbsNt          largest absolute correction, nT
     * @param clippedFraction   fraction of grid stations whose estimate reached the limit
     * @param note              one sentence saying what was done, or why nothing was
     */
    public record Result(double[] correctionNt, int linesCorrected, int linesSkipped, double lineSpacingM,
                         double acrossWavelengthM, double alongWavelengthM, double limitNt, double rmsNt,
                         double maxAbsNt, double clippedFraction, String note) {
    }

    private MicroLevelling() {
    }

    /**
     * Estimates the corrugation of the traverse lines and the correction that removes it.
     *
     * @param lines    the lines (reference positions m, x east, y north)
     * @param value    the levelled value per row, nT (e.g. the sensor mean); NaN where missing
     * @param isTie    per line, whether it is a tie line (left alone)
     * @param settings filter widths and limit
     * @return the correction per row (nT, to be added) and its figures
     */
    public static Result compute(SurveyLines lines, double[] value, boolean[] isTie, Settings settings) {
        int nl = lines.lineCount();
        double[] x = lines.x(), y = lines.y();
        double[] corr = new double[lines.size()];
        double c2 = 0, s2 = 0;
        double[] phi = new double[nl];
        int traverse = 0;
        for (int l = 0; l < nl; l++) {
            phi[l] = Double.NaN;
            int s = lines.start(l), e = lines.end(l);
            if (isTie[l] || e - s < 2) {
                continue;
            }
            traverse++;
            double dx = x[e - 1] - x[s], dy = y[e - 1] - y[s], len = Math.hypot(dx, dy);
            if (len > 0) {
                phi[l] = Math.atan2(dy, dx);
                c2 += len * Math.cos(2 * phi[l]);
                s2 += len * Math.sin(2 * phi[l]);
            }
        }
        double phi0 = 0.5 * Math.atan2(s2, c2);
        double ax = Math.cos(phi0), ay = Math.sin(phi0), cx = -ay, cy = ax;
        int[] kept = new int[nl];
        int nk = 0;
        for (int l = 0; l < nl; l++) {
            if (!Double.isNaN(phi[l])) {
                double d = Math.abs(phi[l] - phi0) % Math.PI;
                if (Math.toDegrees(Math.min(d, Math.PI - d)) <= PARALLEL_DEG) {
                    kept[nk++] = l;
                }
            }
        }
        if (nk < MIN_ACROSS_LINES) {
            return empty(corr, traverse, settings, "micro-levelling skipped: fewer than " + MIN_ACROSS_LINES
                    + " parallel traverse lines");
        }
        double x0 = x[lines.start(kept[0])], y0 = y[lines.start(kept[0])];
        double[] w = new double[nk], uMin = new double[nk], uMax = new double[nk];
        double u0 = Double.POSITIVE_INFINITY;
        for (int q = 0; q < nk; q++) {
            int s = lines.start(kept[q]), e = lines.end(kept[q]);
            double[] across = new double[e - s];
            uMin[q] = Double.POSITIVE_INFINITY;
            uMax[q] = Double.NEGATIVE_INFINITY;
            for (int i = s; i < e; i++) {
                double u = (x[i] - x0) * ax + (y[i] - y0) * ay;
                across[i - s] = (x[i] - x0) * cx + (y[i] - y0) * cy;
                uMin[q] = Math.min(uMin[q], u);
                uMax[q] = Math.max(uMax[q], u);
            }
            w[q] = Robust.median(across);
            u0 = Math.min(u0, uMin[q]);
        }
        Integer[] order = new Integer[nk];
        for (int q = 0; q < nk; q++) {
            order[q] = q;
        }
        Arrays.sort(order, (a, b) -> Double.compare(w[a], w[b]));
        double[] gaps = new double[nk - 1];
        int ng = 0;
        for (int q = 1; q < nk; q++) {
            double g = w[order[q]] - w[order[q - 1]];
            if (g > 1e-6) {
                gaps[ng++] = g;
            }
        }
        if (ng == 0) {
            return empty(corr, traverse, settings, "micro-levelling skipped: the traverse lines do not spread across");
        }
        double spacing = Robust.median(Arrays.copyOf(gaps, ng));
        double across = Double.isNaN(settings.acrossWavelengthM()) ? DEFAULT_ACROSS_SPACINGS * spacing
                : settings.acrossWavelengthM();
        double along = Double.isNaN(settings.alongWavelengthM()) ? DEFAULT_ALONG_SPACINGS * spacing
                : settings.alongWavelengthM();
        double sigC = across / (2 * Math.PI), sigA = along / (2 * Math.PI), limit = settings.limitNt();
        double du = sigA / 4;

        // line-aligned grid, lines in across order
        int[] line = new int[nk], k0 = new int[nk];
        double[] ws = new double[nk];
        double[][] grid = new double[nk][];
        for (int p = 0; p < nk; p++) {
            int q = order[p];
            line[p] = kept[q];
            ws[p] = w[q];
            k0[p] = (int) Math.floor((uMin[q] - u0) / du);
            int k1 = (int) Math.floor((uMax[q] - u0) / du);
            double[] sum = new double[k1 - k0[p] + 1];
            int[] cnt = new int[sum.length];
            for (int i = lines.start(line[p]); i < lines.end(line[p]); i++) {
                if (Double.isFinite(value[i])) {
                    int k = (int) Math.floor(((x[i] - x0) * ax + (y[i] - y0) * ay - u0) / du) - k0[p];
                    k = Math.max(0, Math.min(sum.length - 1, k));
                    sum[k] += value[i];
                    cnt[k]++;
                }
            }
            for (int k = 0; k < sum.length; k++) {
                sum[k] = cnt[k] > 0 ? sum[k] / cnt[k] : Double.NaN;
            }
            grid[p] = sum;
        }
        double[][] high = acrossHighPass(grid, k0, ws, sigC, limit);
        int[] clipped = new int[1], finite = new int[1];
        double[][] est = new double[nk][];
        for (int p = 0; p < nk; p++) {
            est[p] = alongLowPass(high[p], sigA / du, limit, clipped, finite);
        }
        // back to the rows
        double ss = 0, maxAbs = 0;
        long rows = 0;
        for (int p = 0; p < nk; p++) {
            double[] e = est[p];
            for (int i = lines.start(line[p]); i < lines.end(line[p]); i++) {
                double f = ((x[i] - x0) * ax + (y[i] - y0) * ay - u0) / du - 0.5 - k0[p];
                int k = (int) Math.floor(f);
                double t = f - k;
                double a = at(e, k), b = at(e, k + 1);
                double c = Double.isNaN(a) ? (Double.isNaN(b) ? 0 : b) : Double.isNaN(b) ? a : a + t * (b - a);
                corr[i] = -c;
                ss += c * c;
                maxAbs = Math.max(maxAbs, Math.abs(c));
                rows++;
            }
        }
        double rms = rows > 0 ? Math.sqrt(ss / rows) : 0;
        double clippedFraction = finite[0] > 0 ? (double) clipped[0] / finite[0] : 0;
        String note = String.format(Locale.ROOT, "micro-levelling (after Minty 1991) of %d traverse lines%s: line "
                        + "spacing %.2f m, across wavelength %.1f m, along wavelength %.1f m, limit %.2f nT; correction "
                        + "RMS %.3f nT, largest %.3f nT, %.1f%% of stations at the limit", nk,
                traverse > nk ? " (" + (traverse - nk) + " not parallel, left alone)" : "", spacing, across, along,
                limit, rms, maxAbs, 100 * clippedFraction);
        return new Result(corr, nk, traverse - nk, spacing, across, along, limit, rms, maxAbs, clippedFraction, note);
    }

    private static Result empty(double[] corr, int traverse, Settings s, String note) {
        return new Result(corr, 0, traverse, Double.NaN, s.acrossWavelengthM(), s.alongWavelengthM(), s.limitNt(), 0,
                0, 0, note);
    }

    private static double at(double[] e, int k) {
        return k < 0 || k >= e.length ? Double.NaN : e[k];
    }

    /**
     * Each line's station values minus the local weighted quadratic across the neighbouring lines, clipped
     * to +-limit; NaN where fewer than {@value #MIN_ACROSS_LINES} lines have data or the fit is degenerate.
     */
    static double[][] acrossHighPass(double[][] grid, int[] k0, double[] w, double sigma, double limit) {
        int n = grid.length;
        double[][] out = new double[n][];
        double reach = 3 * sigma;
        int lo = 0, hi = 0;
        for (int p = 0; p < n; p++) {
            while (w[p] - w[lo] > reach) {
                lo++;
            }
            while (hi + 1 < n && w[hi + 1] - w[p] <= reach) {
                hi++;
            }
            double[] g = grid[p], h = new double[g.length];
            for (int k = 0; k < g.length; k++) {
                h[k] = Double.NaN;
                if (Double.isNaN(g[k])) {
                    continue;
                }
                int station = k0[p] + k;
                double m0 = 0, m1 = 0, m2 = 0, m3 = 0, m4 = 0, t0 = 0, t1 = 0, t2 = 0;
                int count = 0;
                for (int r = lo; r <= hi; r++) {
                    int kr = station - k0[r];
                    if (kr < 0 || kr >= grid[r].length || Double.isNaN(grid[r][kr])) {
                        continue;
                    }
                    double d = (w[r] - w[p]) / sigma, wt = Math.exp(-0.5 * d * d), v = grid[r][kr];
                    double d2 = d * d;
                    m0 += wt;
                    m1 += wt * d;
                    m2 += wt * d2;
                    m3 += wt * d2 * d;
                    m4 += wt * d2 * d2;
                    t0 += wt * v;
                    t1 += wt * v * d;
                    t2 += wt * v * d2;
                    count++;
                }
                if (count < MIN_ACROSS_LINES) {
                    continue;
                }
                // value at d = 0 of the weighted least-squares quadratic (Cramer's rule on the normal equations)
                double det = m0 * (m2 * m4 - m3 * m3) - m1 * (m1 * m4 - m3 * m2) + m2 * (m1 * m3 - m2 * m2);
                if (!(Math.abs(det) > 1e-9 * m0 * m0 * m0)) {
                    continue;
                }
                double a = (t0 * (m2 * m4 - m3 * m3) - m1 * (t1 * m4 - m3 * t2) + m2 * (t1 * m3 - m2 * t2)) / det;
                h[k] = Math.max(-limit, Math.min(limit, g[k] - a));
            }
            out[p] = h;
        }
        return out;
    }

    /**
     * The local weighted straight line through a line's stations (sigma in stations), clipped to +-limit;
     * NaN where fewer than half the window has data. Counts clipped and finite results.
     */
    static double[] alongLowPass(double[] h, double sigma, double limit, int[] clipped, int[] finite) {
        int reach = (int) Math.ceil(3 * sigma);
        double[] kernel = new double[reach + 1];
        for (int j = 0; j <= reach; j++) {
            kernel[j] = Math.exp(-0.5 * (j / sigma) * (j / sigma));
        }
        double[] out = new double[h.length];
        for (int k = 0; k < h.length; k++) {
            double m0 = 0, m1 = 0, m2 = 0, t0 = 0, t1 = 0;
            int count = 0;
            for (int j = Math.max(0, k - reach); j <= Math.min(h.length - 1, k + reach); j++) {
                if (Double.isNaN(h[j])) {
                    continue;
                }
                double d = j - k, wt = kernel[Math.abs(j - k)];
                m0 += wt;
                m1 += wt * d;
                m2 += wt * d * d;
                t0 += wt * h[j];
                t1 += wt * h[j] * d;
                count++;
            }
            double det = m0 * m2 - m1 * m1;
            if (count < reach || !(det > 1e-12 * m0 * m0)) {
                out[k] = Double.NaN;
                continue;
            }
            double a = (m2 * t0 - m1 * t1) / det;
            finite[0]++;
            if (Math.abs(a) >= limit) {
                clipped[0]++;
                a = Math.copySign(limit, a);
            }
            out[k] = a;
        }
        return out;
    }
}
