package org.halyard.survey;

/**
 * Transverse and along-line gradients of a sensor pair, rotated to map axes.
 *
 * <p><b>Algorithm:</b> the transverse gradient is {@code (T_stbd - T_port) / s} with {@code s} the across
 * separation, assigned to the midpoint; it is the central difference of the field across the track. The
 * along-line gradient is the least-squares slope of the mean reading against distance along the line
 * over {@code 2k+1} samples (k = {@value #HALF_WINDOW}). With heading h clockwise from north, along =
 * (sin h, cos h) and starboard = (cos h, -sin h) in (east, north), so
 * {@code gx = G_along sin h + G_trans cos h}, {@code gy = G_along cos h - G_trans sin h}.
 *
 * <p><b>Accuracy:</b> the central difference errs by {@code s^2/24 T'''} (Taylor expansion), about 10 % of
 * the gradient when s is a quarter of the source distance; the along-line slope by a similar term in the
 * window length.
 *
 * <p><b>Limitations:</b> the two sensors must share their along-track offset; on a turn the midpoint's
 * distance differs from the reference point's by the across offset times the curvature.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class PairGradient {

    /** Half-width of the along-line slope window, samples. */
    public static final int HALF_WINDOW = 2;

    private PairGradient() {
    }

    /**
     * Gradients of one pair.
     *
     * @param lines      the line index
     * @param port       the port sensor (smaller across offset) and its corrected values (nT) and positions
     * @param stbd       the starboard sensor
     * @param distanceM  distance along the line per row, m
     * @param headingDeg heading per row, degrees clockwise from grid north
     * @return midpoint positions (m), mean values (nT) and gradients (nT/m); NaN where a reading is missing
     */
    public static GradientPoints compute(SurveyLines lines, SensorTrack port, SensorTrack stbd, double[] distanceM,
                                         float[] headingDeg) {
        double sep = stbd.spec().acrossM() - port.spec().acrossM();
        if (!(sep > 0)) {
            throw new IllegalArgumentException("sensor pair " + port.spec().column() + "/" + stbd.spec().column()
                    + ": the starboard sensor must have the larger across offset (got separation " + sep + " m)");
        }
        if (Math.abs(stbd.spec().alongM() - port.spec().alongM()) > 1e-9) {
            throw new IllegalArgumentException("sensor pair " + port.spec().column() + "/" + stbd.spec().column()
                    + ": along offsets differ; a transverse gradient needs both sensors abreast");
        }
        int n = lines.size();
        // gx holds the transverse and gy the along gradient until the rotation at the end
        double[] x = new double[n], y = new double[n], m = new double[n], gx = new double[n], gy = new double[n];
        double[] vp = port.value(), vs = stbd.value();
        for (int i = 0; i < n; i++) {
            x[i] = 0.5 * (port.x()[i] + stbd.x()[i]);
            y[i] = 0.5 * (port.y()[i] + stbd.y()[i]);
            m[i] = 0.5 * (vp[i] + vs[i]);
            gx[i] = (vs[i] - vp[i]) / sep;
        }
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            for (int i = s; i < e; i++) {
                gy[i] = slope(distanceM, m, Math.max(s, i - HALF_WINDOW), Math.min(e - 1, i + HALF_WINDOW));
            }
        }
        for (int i = 0; i < n; i++) {
            double h = Math.toRadians(headingDeg[i]);
            double sh = Math.sin(h), ch = Math.cos(h);
            double gt = gx[i], ga = gy[i];
            gx[i] = ga * sh + gt * ch;
            gy[i] = ga * ch - gt * sh;
        }
        return new GradientPoints(port.spec().column() + "/" + stbd.spec().column(), x, y, m, gx, gy);
    }

    /** Least-squares slope of v against d over rows [a, b]; NaN if any value is missing or d is constant. */
    static double slope(double[] d, double[] v, int a, int b) {
        int n = b - a + 1;
        if (n < 2) {
            return Double.NaN;
        }
        double md = 0, mv = 0;
        for (int i = a; i <= b; i++) {
            md += d[i];
            mv += v[i];
        }
        md /= n;
        mv /= n;
        double sdd = 0, sdv = 0;
        for (int i = a; i <= b; i++) {
            double dd = d[i] - md;
            sdd += dd * dd;
            sdv += dd * (v[i] - mv);
        }
        return sdd > 0 ? sdv / sdd : Double.NaN;
    }
}
