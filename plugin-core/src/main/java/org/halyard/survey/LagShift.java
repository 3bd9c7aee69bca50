package org.halyard.survey;

/**
 * Applies a time lag between positions and readings: each reading is moved to where the reference point
 * was {@code lag} seconds before the reading's time stamp, along the line's own track.
 *
 * <p><b>Algorithm:</b> per line, the reference position at {@code t - lag} by linear interpolation in time
 * between the line's own samples; before the first or after the last sample, linear extrapolation from
 * the first or last step (a lag is a fraction of a second, a few samples at most). The sign follows
 * {@link LagEstimator}: a positive lag means the readings are late and belong to earlier positions.
 *
 * <p><b>Accuracy:</b> exact on straight lines at constant speed; on a turn of radius R the chord error
 * of linear interpolation is at most (v dt)^2 / (8 R) for a step of v dt metres.
 *
 * <p><b>Limitations:</b> needs real times ({@link SurveyLines#hasTime()}); lines of one sample are left
 * where they are.
 *
 * <p><b>Thread safety:</b> stateless; the input is not changed.
 */
public final class LagShift {

    private LagShift() {
    }

    /**
     * Lines whose reference positions are shifted by {@code lagS}.
     *
     * @param lines the lines (positions m in the recipe CRS, x east, y north; times epoch s)
     * @param lagS  the lag, s: positive when readings are late (belong to earlier positions)
     * @return new lines sharing every array but the positions
     * @throws IllegalArgumentException when the lines have no time column or the lag is not finite
     */
    public static SurveyLines apply(SurveyLines lines, double lagS) {
        if (!lines.hasTime()) {
            throw new IllegalArgumentException(lines.source() + ": a lag cannot be applied without a time column");
        }
        if (!Double.isFinite(lagS)) {
            throw new IllegalArgumentException("lag must be a finite number of seconds, got " + lagS);
        }
        double[] x = lines.x(), y = lines.y(), t = lines.time();
        double[] nx = x.clone(), ny = y.clone();
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            if (e - s < 2) {
                continue;
            }
            int j = s; // segment [j, j+1] brackets the target time; targets increase with i
            for (int i = s; i < e; i++) {
                double target = t[i] - lagS;
                while (j < e - 2 && t[j + 1] < target) {
                    j++;
                }
                double w = (target - t[j]) / (t[j + 1] - t[j]); // may fall outside [0, 1] at the ends
                nx[i] = x[j] + w * (x[j + 1] - x[j]);
                ny[i] = y[j] + w * (y[j + 1] - y[j]);
            }
        }
        return lines.withPositions(nx, ny);
    }
}
