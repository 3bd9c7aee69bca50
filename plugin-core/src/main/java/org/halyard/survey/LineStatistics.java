package org.halyard.survey;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Per-line QC figures: length, speed, sample interval, gaps, altitude against a limit, spikes, noise,
 * spacing and levelling (definitions in {@link LineQc}).
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class LineStatistics {

    private LineStatistics() {
    }

    static List<LineQc> compute(SurveyLines lines, boolean[] isTie, double[] distanceM, SurveyOptions opt,
                                int[] spikesPerLine, double[] noisePerLine, LineSpacing.Result spacing,
                                double[] levellingPerLine) {
        List<LineQc> out = new ArrayList<>(lines.lineCount());
        double[] t = lines.time();
        float[] alt = lines.altitude();
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l), n = e - s;
            double length = n > 0 ? distanceM[e - 1] - distanceM[s] : 0;
            double duration = Double.NaN, speed = Double.NaN, median = Double.NaN;
            int gaps = 0;
            if (lines.hasTime() && n > 1) {
                duration = t[e - 1] - t[s];
                speed = duration > 0 ? length / duration : Double.NaN;
                double[] dt = new double[n - 1];
                for (int i = s; i < e - 1; i++) {
                    dt[i - s] = t[i + 1] - t[i];
                }
                median = Robust.median(dt.clone());
                for (double d : dt) {
                    if (d > opt.gapFactor() * median) {
                        gaps++;
                    }
                }
            }
            double am = 0, ax = Double.NaN;
            int na = 0, over = 0;
            for (int i = s; i < e; i++) {
                float a = alt[i];
                if (!Float.isNaN(a)) {
                    am += a;
                    na++;
                    ax = Double.isNaN(ax) ? a : Math.max(ax, a);
                    if (a > opt.altitudeLimitM()) {
                        over++;
                    }
                }
            }
            double overFrac = na > 0 && !Double.isNaN(opt.altitudeLimitM()) ? (double) over / na : Double.NaN;
            out.add(new LineQc(lines.lineId(l), isTie[l], n, length, duration, speed, median, gaps,
                    na > 0 ? am / na : Double.NaN, ax, overFrac, spikesPerLine[l], noisePerLine[l],
                    spacing != null ? spacing.medianM()[l] : Double.NaN,
                    spacing != null ? spacing.overLimit()[l] : Double.NaN, levellingPerLine[l]));
        }
        return out;
    }

    /** Element-wise maximum of per-line noise over sensors, ignoring NaN. */
    static double[] maxNoise(List<double[]> perSensor, int lineCount) {
        double[] m = new double[lineCount];
        Arrays.fill(m, Double.NaN);
        for (double[] a : perSensor) {
            for (int l = 0; l < lineCount; l++) {
                if (!Double.isNaN(a[l]) && !(a[l] <= m[l])) {
                    m[l] = a[l];
                }
            }
        }
        return m;
    }
}
