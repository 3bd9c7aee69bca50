package org.halyard.survey;

import java.util.Arrays;

/**
 * Finds and repairs isolated spikes in a sensor record, and measures its noise, with the fourth
 * difference {@code d4[i] = v[i-2] - 4 v[i-1] + 6 v[i] - 4 v[i+1] + v[i+2]} (the usual spike and noise
 * measure of a 10 Hz magnetometer record; common practice).
 *
 * <p><b>Algorithm:</b> per line, the scale of d4 is the MAD-based sigma (Hampel 1974), robust to the
 * spikes themselves. A sample is a spike when |d4| exceeds {@code k} sigma and d4 has the shape of a
 * one-sample impulse: its centre weight 6 dominates both neighbours (|d4[i]| &gt;= 1.3 |d4[i+-1]|, the
 * impulse ratio being 6/4) and changes sign against them. A smooth anomaly, even a sharp one, has
 * neighbouring d4 of similar size and sign and is left alone. Spikes are replaced by linear interpolation
 * in time between the nearest good samples of the line. For white noise of sigma s, d4 has sigma
 * s sqrt(70) (the sum of the squared weights 1, 16, 36, 16, 1), so the reported noise is sigma(d4)/sqrt(70).
 *
 * <p><b>Limitations:</b> bursts of several bad samples in a row are not found; a spike within two samples
 * of a line end or a missing value is not tested.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class SpikeDetector {

    /** White-noise variance gain of the fourth difference, 1 + 16 + 36 + 16 + 1. */
    static final double D4_GAIN = 70;
    /** How much the centre of a one-sample impulse must exceed its neighbours' fourth difference. */
    static final double IMPULSE_RATIO = 1.3;

    /**
     * @param spikeRows rows where spikes were found and repaired, ascending
     * @param noiseNt   per line, the fourth-difference noise estimate sigma(d4)/sqrt(70), nT; NaN for
     *                  lines shorter than five samples
     */
    public record Result(int[] spikeRows, double[] noiseNt) {
    }

    private SpikeDetector() {
    }

    /**
     * Detects and repairs spikes in {@code v}, in place, flagging them {@link SampleFlags#SPIKE}.
     *
     * @param lines           the line index (rows of each line) and times, epoch seconds
     * @param v               one sensor's values per row, nT; NaN samples are skipped
     * @param flags           per-row flags of this sensor, updated
     * @param thresholdSigmas the threshold k in MAD sigmas of d4 (e.g. 8); NaN or &lt;= 0 measures noise only
     */
    public static Result clean(SurveyLines lines, double[] v, byte[] flags, double thresholdSigmas) {
        int maxLen = 0;
        for (int l = 0; l < lines.lineCount(); l++) {
            maxLen = Math.max(maxLen, lines.end(l) - lines.start(l));
        }
        double[] d4 = new double[maxLen];
        double[] work = new double[maxLen];
        double[] noise = new double[lines.lineCount()];
        int[] spikes = new int[16];
        int nSpikes = 0;
        double[] t = lines.time();
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l), n = e - s;
            Arrays.fill(d4, 0, n, Double.NaN);
            int m = 0;
            for (int i = s + 2; i < e - 2; i++) {
                double d = v[i - 2] - 4 * v[i - 1] + 6 * v[i] - 4 * v[i + 1] + v[i + 2];
                d4[i - s] = d;
                if (!Double.isNaN(d)) {
                    work[m++] = d;
                }
            }
            if (m == 0) {
                noise[l] = Double.NaN;
                continue;
            }
            double sigma = Robust.sigma(Arrays.copyOf(work, m));
            noise[l] = sigma / Math.sqrt(D4_GAIN);
            if (!(thresholdSigmas > 0) || sigma == 0) {
                continue;
            }
            double thr = thresholdSigmas * sigma;
            int first = nSpikes;
            for (int k = 3; k < n - 3; k++) {
                double c = d4[k];
                if (!(Math.abs(c) > thr)) {
                    continue;
                }
                double a = d4[k - 1], b = d4[k + 1];
                if (Math.abs(c) >= IMPULSE_RATIO * Math.abs(a) && Math.abs(c) >= IMPULSE_RATIO * Math.abs(b)
                        && Math.signum(a) == -Math.signum(c) && Math.signum(b) == -Math.signum(c)) {
                    if (nSpikes == spikes.length) {
                        spikes = Arrays.copyOf(spikes, nSpikes * 2);
                    }
                    spikes[nSpikes++] = s + k;
                }
            }
            for (int q = first; q < nSpikes; q++) {
                flags[spikes[q]] |= SampleFlags.SPIKE;
            }
            for (int q = first; q < nSpikes; q++) {
                v[spikes[q]] = interpolate(v, t, flags, s, e, spikes[q]);
            }
        }
        return new Result(Arrays.copyOf(spikes, nSpikes), noise);
    }

    private static double interpolate(double[] v, double[] t, byte[] flags, int s, int e, int i) {
        int a = i - 1, b = i + 1;
        while (a >= s && (Double.isNaN(v[a]) || (flags[a] & SampleFlags.SPIKE) != 0)) {
            a--;
        }
        while (b < e && (Double.isNaN(v[b]) || (flags[b] & SampleFlags.SPIKE) != 0)) {
            b++;
        }
        if (a < s && b >= e) {
            return Double.NaN;
        }
        if (a < s) {
            return v[b];
        }
        if (b >= e) {
            return v[a];
        }
        double w = (t[i] - t[a]) / (t[b] - t[a]);
        return v[a] + w * (v[b] - v[a]);
    }
}
