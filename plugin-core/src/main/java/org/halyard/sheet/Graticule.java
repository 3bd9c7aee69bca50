package org.halyard.sheet;

import java.util.Locale;
import org.halyard.io.ProjectedCrs;

/**
 * Lines of latitude and longitude on the CRS's own datum, drawn over a grid-north-up map frame.
 *
 * <p><b>Algorithm:</b> the frame corners and edge midpoints are converted to geographic coordinates to
 * find the range; each parallel and meridian is sampled at {@link #SAMPLES} points in geographic
 * coordinates and projected, so the curvature of meridians in the projection is drawn. The interval is
 * the smallest of 1", 2", 5", 10", 15", 30", 1', 2', 5', 10', 15', 30', 1 degree that keeps lines at
 * least {@link #MIN_SPACING_MM} apart.
 *
 * <p><b>Accuracy:</b> chords between samples deviate from the true curve by far less than a line width at
 * sheet scales. <b>Limitations:</b> not for frames spanning the poles or the antimeridian.
 */
public final class Graticule {

    static final int SAMPLES = 48;
    static final double MIN_SPACING_MM = 40;
    private static final int[] STEPS_ARCSEC = {1, 2, 5, 10, 15, 30, 60, 120, 300, 600, 900, 1800, 3600};
    private static final int INK = 0x0E6E6E;
    private static final float LABEL_PT = 5.5f;

    private Graticule() {
    }

    /** Draws the graticule in {@code w} (call under a clip to the frame). */
    static void draw(SheetCanvas c, MapWindow w, ProjectedCrs crs) {
        double[][] probe = {{w.west(), w.south()}, {w.east(), w.south()}, {w.west(), w.north()},
                {w.east(), w.north()}, {w.centreX(), w.south()}, {w.centreX(), w.north()},
                {w.west(), w.centreY()}, {w.east(), w.centreY()}};
        double lonLo = 999, lonHi = -999, latLo = 999, latHi = -999;
        for (double[] p : probe) {
            double[] ll = crs.toLonLat(p[0], p[1]);
            lonLo = Math.min(lonLo, ll[0]);
            lonHi = Math.max(lonHi, ll[0]);
            latLo = Math.min(latLo, ll[1]);
            latHi = Math.max(latHi, ll[1]);
        }
        double padLon = (lonHi - lonLo) * 0.05, padLat = (latHi - latLo) * 0.05;
        lonLo -= padLon;
        lonHi += padLon;
        latLo -= padLat;
        latHi += padLat;
        double metresPerArcsecLat = 30.87;  // ~1852 m per arc minute of latitude (common practice)
        double minArcsec = MIN_SPACING_MM / 1000.0 * w.scaleDenominator() / metresPerArcsecLat;
        int step = STEPS_ARCSEC[STEPS_ARCSEC.length - 1];
        for (int s : STEPS_ARCSEC) {
            if (s >= minArcsec) {
                step = s;
                break;
            }
        }
        double d = step / 3600.0;
        c.begin("Graticule");
        c.stroke(INK, 0.4f, 3f, 2f);
        c.fill(INK);
        for (long k = (long) Math.ceil(latLo / d); k * d <= latHi; k++) {
            double lat = k * d;
            drawLine(c, w, crs, lonLo, lat, lonHi, lat, dms(lat, "N", "S"), true);
        }
        for (long k = (long) Math.ceil(lonLo / d); k * d <= lonHi; k++) {
            double lon = k * d;
            drawLine(c, w, crs, lon, latLo, lon, latHi, dms(lon, "E", "W"), false);
        }
        c.end();
    }

    private static void drawLine(SheetCanvas c, MapWindow w, ProjectedCrs crs, double lon0, double lat0,
                                 double lon1, double lat1, String label, boolean parallel) {
        double[] xs = new double[SAMPLES + 1];
        double[] ys = new double[SAMPLES + 1];
        for (int i = 0; i <= SAMPLES; i++) {
            double t = (double) i / SAMPLES;
            double[] p = crs.fromLonLat(lon0 + t * (lon1 - lon0), lat0 + t * (lat1 - lat0));
            xs[i] = w.pageX(p[0]);
            ys[i] = w.pageY(p[1]);
        }
        c.polyline(xs, ys, false);
        // Label where the line enters the frame: parallels at the left edge, meridians at the bottom.
        PageRect f = w.frame();
        for (int i = 0; i < SAMPLES; i++) {
            if (parallel && xs[i] <= f.x() && xs[i + 1] > f.x()) {
                double t = (f.x() - xs[i]) / (xs[i + 1] - xs[i]);
                double y = ys[i] + t * (ys[i + 1] - ys[i]);
                c.begin("GraticuleLabel");
                c.haloText(label, f.x() + 2, y + 1.5, LABEL_PT, false, 0, 0, INK);
                c.end();
            } else if (!parallel && ys[i] <= f.y() && ys[i + 1] > f.y()) {
                double t = (f.y() - ys[i]) / (ys[i + 1] - ys[i]);
                double x = xs[i] + t * (xs[i + 1] - xs[i]);
                c.begin("GraticuleLabel");
                c.haloText(label, x - 1.5, f.y() + 3, LABEL_PT, false, 0, 90, INK);
                c.end();
            }
        }
    }

    /** Degrees, minutes and seconds with a hemisphere letter, e.g. {@code 52°06'30"N}. */
    static String dms(double deg, String positive, String negative) {
        long totalSec = Math.round(Math.abs(deg) * 3600);
        return String.format(Locale.ROOT, "%d\u00b0%02d'%02d\"%s", totalSec / 3600, totalSec / 60 % 60,
                totalSec % 60, deg < 0 ? negative : positive);
    }
}
