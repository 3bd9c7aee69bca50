package org.halyard.survey;

import java.util.Arrays;

/**
 * Removes the time-varying part of the geomagnetic field seen at a base station from survey readings.
 *
 * <p><b>Algorithm:</b> the base-station total field F is interpolated linearly in time to each survey
 * sample between the two nearest valid base samples; the correction is {@code F(t) - datum}, subtracted
 * from every sensor (common practice in marine and airborne magnetics). The datum defaults to the median
 * of the valid base F within the survey's time span.
 *
 * <p><b>Gaps:</b> a survey sample whose bracketing valid base samples are further apart than the gap
 * limit gets no correction: its corrected value is NaN and it is flagged {@link SampleFlags#BASE_GAP}.
 * Survey time outside the base record is refused with the covered fraction, unless it is within the gap
 * limit of the first or last base sample (it is then also flagged, never extrapolated).
 *
 * <p><b>Accuracy:</b> linear interpolation of a variation of amplitude A and period P sampled every dt
 * errs by at most A (2 pi dt / P)^2 / 8; for 1 s data that is far below the 0.01 nT resolution of the
 * format, for 1 min data about 0.001 nT for a 20 nT, 6 h variation.
 *
 * <p><b>Limitations:</b> assumes the diurnal variation is the same at the base and over the survey (a
 * base more than some tens of kilometres away sees a different one); no time shift between them.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class DiurnalCorrection {

    /**
     * The correction values and what they cover.
     *
     * @param correction  per survey row, nT, to subtract from every sensor; NaN where not bridged
     * @param datumNt     the datum used, nT
     * @param flagged     number of survey rows left without correction
     * @param firstFlaggedRow first row left without correction, or -1
     */
    public record Result(double[] correction, double datumNt, int flagged, int firstFlaggedRow) {
    }

    private DiurnalCorrection() {
    }

    /**
     * Computes the diurnal correction for each survey time.
     *
     * @param surveySource the survey file name, for messages
     * @param time      survey times, epoch seconds (UTC); need not be sorted across lines
     * @param base      the base station
     * @param datumNt   the datum in nT, or NaN for the median of base F over the survey span
     * @param maxGapS   the longest interval between valid base samples that may be bridged, s
     * @throws IllegalArgumentException when the base station does not cover the survey, saying how much
     */
    public static Result compute(String surveySource, double[] time, BaseStation base, double datumNt, double maxGapS) {
        if (!(maxGapS > 0)) {
            throw new IllegalArgumentException("base-station gap limit must be positive seconds, got " + maxGapS);
        }
        double[] bt = base.time(), bf = base.total();
        int nv = 0;
        for (double f : bf) {
            if (!Double.isNaN(f)) {
                nv++;
            }
        }
        if (nv < 2) {
            throw new IllegalArgumentException(base.source() + ": fewer than two valid total-field samples");
        }
        double[] vt = new double[nv], vf = new double[nv];
        for (int i = 0, k = 0; i < bt.length; i++) {
            if (!Double.isNaN(bf[i])) {
                vt[k] = bt[i];
                vf[k++] = bf[i];
            }
        }
        double tmin = Double.POSITIVE_INFINITY, tmax = Double.NEGATIVE_INFINITY;
        for (double t : time) {
            tmin = Math.min(tmin, t);
            tmax = Math.max(tmax, t);
        }
        checkCoverage(surveySource, base, time, tmin, tmax, vt[0] - maxGapS, vt[nv - 1] + maxGapS);
        double datum = Double.isNaN(datumNt) ? medianWithin(vt, vf, tmin, tmax) : datumNt;
        double[] corr = new double[time.length];
        int flagged = 0, firstFlagged = -1;
        int k = 0;
        for (int i = 0; i < time.length; i++) {
            double t = time[i];
            // times are sorted within lines, so a local search from the last index is usually O(1)
            if (k >= nv - 1 || vt[k] > t || vt[k + 1] < t) {
                k = bracket(vt, t);
            }
            double c = Double.NaN;
            if (k >= 0 && k < nv - 1 && vt[k + 1] - vt[k] <= maxGapS) {
                double w = (t - vt[k]) / (vt[k + 1] - vt[k]);
                c = vf[k] + w * (vf[k + 1] - vf[k]) - datum;
            } else if (k >= 0 && k < nv && t == vt[k]) {
                c = vf[k] - datum;
            }
            if (Double.isNaN(c)) {
                flagged++;
                if (firstFlagged < 0) {
                    firstFlagged = i;
                }
                k = Math.max(0, Math.min(k, nv - 2));
            }
            corr[i] = c;
        }
        return new Result(corr, datum, flagged, firstFlagged);
    }

    /** Index k with vt[k] &lt;= t &lt; vt[k+1], nv-1 when t is the last time, -1 before the first. */
    private static int bracket(double[] vt, double t) {
        int j = Arrays.binarySearch(vt, t);
        if (j >= 0) {
            return j;
        }
        return -j - 2;
    }

    private static void checkCoverage(String survey, BaseStation base, double[] time, double tmin, double tmax,
                                      double lo, double hi) {
        if (tmin >= lo && tmax <= hi) {
            return;
        }
        int inside = 0;
        for (double t : time) {
            if (t >= lo && t <= hi) {
                inside++;
            }
        }
        throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                "%s: base station covers %.1f%% of the survey samples (%d of %d): base %s to %s, survey %s to %s",
                base.source(), 100.0 * inside / time.length, inside, time.length,
                stamp(base.time()[0]), stamp(base.time()[base.size() - 1]), stamp(tmin), stamp(tmax))
                + (survey != null ? " (" + survey + ")" : ""));
    }

    private static String stamp(double t) {
        return java.time.Instant.ofEpochMilli(Math.round(t * 1000)).toString();
    }

    private static double medianWithin(double[] vt, double[] vf, double tmin, double tmax) {
        int a = bracket(vt, tmin);
        a = Math.max(0, a);
        int b = Math.min(vt.length - 1, bracket(vt, tmax) + 1);
        double[] w = Arrays.copyOfRange(vf, a, b + 1);
        return Robust.median(w);
    }
}
