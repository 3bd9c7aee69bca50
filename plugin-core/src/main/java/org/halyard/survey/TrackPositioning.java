package org.halyard.survey;

/**
 * Distance along each line and a smoothed heading of the array reference point.
 *
 * <p><b>Algorithm:</b> distance is the running sum of the straight steps between successive positions.
 * The heading at a sample is the direction of the chord between the first sample at least {@code w/2}
 * behind it and the last sample at most {@code w/2} ahead of it along the line, {@code w} the smoothing
 * length: on a circular arc with samples spaced evenly, the chord of an arc centred on a point is
 * parallel to the tangent there, so the heading of a steady turn is unbiased, while position noise is
 * averaged over the window. Two moving pointers make it O(n).
 *
 * <p><b>Accuracy:</b> with position noise sigma, the heading error is about sigma * sqrt(2) / w radians.
 * Within {@code w/2} of a line end the window is one-sided and a turn there is seen late.
 *
 * <p><b>Limitations:</b> step noise inflates the distance slightly (by sigma^2 / step per step).
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class TrackPositioning {

    private TrackPositioning() {
    }

    /**
     * Distance along the line and heading for every row.
     *
     * @param lines       the line data (x easting, y northing, m)
     * @param smoothingM  the heading smoothing length w, m (&gt; 0)
     * @param distanceM   out: distance from the start of each line, m
     * @param headingDeg  out: heading, degrees clockwise from grid north, in [0, 360)
     */
    public static void compute(SurveyLines lines, double smoothingM, double[] distanceM, float[] headingDeg) {
        if (!(smoothingM > 0)) {
            throw new IllegalArgumentException("heading smoothing length must be positive metres, got " + smoothingM);
        }
        double[] x = lines.x(), y = lines.y();
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            if (e == s) {
                continue;
            }
            distanceM[s] = 0;
            for (int i = s + 1; i < e; i++) {
                distanceM[i] = distanceM[i - 1] + Math.hypot(x[i] - x[i - 1], y[i] - y[i - 1]);
            }
            headings(x, y, distanceM, s, e, smoothingM / 2, headingDeg);
        }
    }

    private static void headings(double[] x, double[] y, double[] d, int s, int e, double half, float[] out) {
        int a = s, b = s;
        float last = Float.NaN;
        for (int i = s; i < e; i++) {
            while (d[a] < d[i] - half) {
                a++;
            }
            if (b < i) {
                b = i;
            }
            while (b + 1 < e && d[b + 1] <= d[i] + half) {
                b++;
            }
            int lo = a, hi = b;
            if (lo == hi) { // window holds one sample: use the nearest neighbours
                lo = Math.max(s, i - 1);
                hi = Math.min(e - 1, i + 1);
            }
            double dx = x[hi] - x[lo], dy = y[hi] - y[lo];
            if (dx == 0 && dy == 0) {
                out[i] = last; // stationary: keep the previous heading
                continue;
            }
            double h = Math.toDegrees(Math.atan2(dx, dy));
            last = (float) (h < 0 ? h + 360 : h);
            out[i] = last;
        }
        // a stationary start inherits the first heading found
        int first = s;
        while (first < e && Float.isNaN(out[first])) {
            first++;
        }
        for (int i = s; i < first && first < e; i++) {
            out[i] = out[first];
        }
        for (int i = s; i < e; i++) {
            if (Float.isNaN(out[i])) {
                out[i] = 0; // a line that never moves: heading undefined, north by convention
            }
        }
    }

    /**
     * The position of a sensor at offsets from the reference point: along = (sin h, cos h) and starboard =
     * (cos h, -sin h) in (east, north), h the heading clockwise from north.
     *
     * @param x          reference easting per row, m
     * @param y          reference northing per row, m
     * @param headingDeg heading per row, degrees clockwise from grid north
     * @param acrossM    offset to starboard, m
     * @param alongM     offset forward, m
     * @param sx         out: sensor easting per row, m
     * @param sy         out: sensor northing per row, m
     */
    public static void offset(double[] x, double[] y, float[] headingDeg, double acrossM, double alongM,
                              double[] sx, double[] sy) {
        for (int i = 0; i < x.length; i++) {
            double h = Math.toRadians(headingDeg[i]);
            double sh = Math.sin(h), ch = Math.cos(h);
            sx[i] = x[i] + alongM * sh + acrossM * ch;
            sy[i] = y[i] + alongM * ch - acrossM * sh;
        }
    }
}
