package org.halyard.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * The path of the array's reference point over a survey: parallel lines, then tie lines at right angles,
 * sampled at a fixed rate, with a smooth sideways wander and the time spent in the turns.
 *
 * <p><b>Algorithm:</b> survey lines run alternately along +u and -u (azimuth {@code line_azimuth_deg} and its
 * reverse), {@code line_spacing_m} apart to starboard of the first; tie lines run alternately along +v and
 * -v every {@code tie_spacing_m}. Each is straight plus a sideways wander w(s) = A (sin(2 pi s / 61 + p1)
 * + 0.5 sin(2 pi s / 23 + p2)) / 1.5 with random phases per line; the heading follows the wandering
 * track. A turn from one line's end to the next line's start, a distance D apart, takes
 * (pi R + |D - 2 R|) / speed: a half circle of the turn radius plus the straight leg that makes up the
 * difference (a fair time budget for both racetrack and "bulb" turns). Times are whole milliseconds.
 *
 * <p>Conventions: x easting, y northing, metres; heading degrees clockwise from north; time ms after start.
 */
final class TowPath {

    /** Names of the lines, in survey order; survey lines {@code L001...}, tie lines {@code T01...}. */
    final List<String> lineNames = new ArrayList<>();
    /** Names of the tie lines. */
    final List<String> tieNames = new ArrayList<>();
    final int[] line;
    final long[] timeMs;
    final double[] x;
    final double[] y;
    final double[] heading;
    final int size;

    private TowPath(int n) {
        line = new int[n];
        timeMs = new long[n];
        x = new double[n];
        y = new double[n];
        heading = new double[n];
        size = n;
    }

    private record Segment(String name, double e0, double n0, double de, double dn, double length, boolean tie) { }

    /** Plans and samples the whole survey of {@code s} with phases drawn from {@code rng}. */
    static TowPath plan(Scenario s, Random rng) {
        Scenario.Area a = s.area();
        double az = Math.toRadians(a.lineAzimuthDeg());
        double ue = Math.sin(az), un = Math.cos(az);     // along the first line
        double ve = Math.cos(az), vn = -Math.sin(az);    // to its starboard
        double oe = s.origin()[0], on = s.origin()[1];
        List<Segment> segs = new ArrayList<>();
        int nLines = (int) Math.floor(a.widthM() / a.lineSpacingM() + 1e-9) + 1;
        for (int k = 0; k < nLines; k++) {
            double v = k * a.lineSpacingM();
            boolean fwd = k % 2 == 0;
            double u0 = fwd ? -a.runInM() : a.lengthM() + a.runInM();
            double sign = fwd ? 1 : -1;
            segs.add(new Segment(String.format("L%03d", k + 1), oe + u0 * ue + v * ve, on + u0 * un + v * vn,
                    sign * ue, sign * un, a.lengthM() + 2 * a.runInM(), false));
        }
        if (a.tieSpacingM() > 0) {
            int nTies = (int) Math.floor(a.lengthM() / a.tieSpacingM() + 1e-9) + 1;
            for (int j = 0; j < nTies; j++) {
                double u = j * a.tieSpacingM();
                boolean back = j % 2 == 0; // the last survey line ended far from v = 0 whenever nLines > 1
                double v0 = back ? a.widthM() + a.runInM() : -a.runInM();
                double sign = back ? -1 : 1;
                segs.add(new Segment(String.format("T%02d", j + 1), oe + u * ue + v0 * ve, on + u * un + v0 * vn,
                        sign * ve, sign * vn, a.widthM() + 2 * a.runInM(), true));
            }
        }
        double ds = a.speedMps() / a.sampleHz();
        long dtMs = Math.round(1000 / a.sampleHz());
        int total = 0;
        int[] counts = new int[segs.size()];
        for (int i = 0; i < segs.size(); i++) {
            counts[i] = (int) Math.floor(segs.get(i).length() / ds + 1e-9) + 1;
            total += counts[i];
        }
        TowPath p = new TowPath(total);
        long t = 0;
        int idx = 0;
        double lastE = Double.NaN, lastN = Double.NaN;
        for (int i = 0; i < segs.size(); i++) {
            Segment g = segs.get(i);
            p.lineNames.add(g.name());
            if (g.tie()) {
                p.tieNames.add(g.name());
            }
            if (i > 0) {
                double d = Math.hypot(g.e0() - lastE, g.n0() - lastN);
                double turn = Math.PI * a.turnRadiusM() + Math.abs(d - 2 * a.turnRadiusM());
                t += (long) Math.ceil(turn / a.speedMps() * 1000 / dtMs) * dtMs;
            }
            double p1 = rng.nextDouble() * 2 * Math.PI, p2 = rng.nextDouble() * 2 * Math.PI;
            double re = g.dn(), rn = -g.de(); // starboard of the segment
            for (int k = 0; k < counts[i]; k++, idx++) {
                double sAlong = k * ds;
                double w = a.wanderM() * (Math.sin(2 * Math.PI * sAlong / 61 + p1)
                        + 0.5 * Math.sin(2 * Math.PI * sAlong / 23 + p2)) / 1.5;
                double dw = a.wanderM() * (2 * Math.PI / 61 * Math.cos(2 * Math.PI * sAlong / 61 + p1)
                        + 0.5 * 2 * Math.PI / 23 * Math.cos(2 * Math.PI * sAlong / 23 + p2)) / 1.5;
                p.line[idx] = i;
                p.timeMs[idx] = t;
                p.x[idx] = g.e0() + sAlong * g.de() + w * re;
                p.y[idx] = g.n0() + sAlong * g.dn() + w * rn;
                double te = g.de() + dw * re, tn = g.dn() + dw * rn;
                double h = Math.toDegrees(Math.atan2(te, tn));
                p.heading[idx] = h < 0 ? h + 360 : h;
                t += dtMs;
            }
            t -= dtMs;
            lastE = p.x[idx - 1];
            lastN = p.y[idx - 1];
        }
        return p;
    }

    /** Duration from the first to the last sample, ms. */
    long durationMs() {
        return timeMs[size - 1] - timeMs[0];
    }
}
