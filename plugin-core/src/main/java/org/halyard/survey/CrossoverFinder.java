package org.halyard.survey;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.CGAlgorithmsDD;

/**
 * Finds the intersections of traverse lines with tie lines and the field each line measured there.
 *
 * <p><b>Algorithm:</b> tie lines go into a {@link LineChunkIndex} (JTS STRtree); each run of a traverse
 * line queries it, and candidate segment pairs are tested with JTS's exact orientation predicate
 * ({@link CGAlgorithmsDD#orientationIndex}, double-double arithmetic). The intersection parameter gives
 * the time on each line by linear interpolation between its samples, and the value at that time by
 * linear interpolation in time. Intersections at a shared vertex are counted once (half-open segments).
 *
 * <p><b>Limitations:</b> collinear overlaps are not crossovers; crossings where either value is missing
 * are dropped. Crossovers use the array reference track and the mean of the sensors.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class CrossoverFinder {

    private CrossoverFinder() {
    }

    /**
     * All traverse/tie crossovers.
     *
     * @param lines  the line index, reference positions (m) and times
     * @param value  the value per row to compare, nT (e.g. the sensor mean)
     * @param isTie  per line, whether it is a tie line
     * @return the crossovers, in traverse-line order
     */
    public static List<Crossover> find(SurveyLines lines, double[] value, boolean[] isTie) {
        double[] x = lines.x(), y = lines.y(), t = lines.time();
        LineChunkIndex ties = new LineChunkIndex(lines, x, y, l -> isTie[l]);
        List<Crossover> out = new ArrayList<>();
        for (int l = 0; l < lines.lineCount(); l++) {
            if (isTie[l]) {
                continue;
            }
            final int line = l;
            int lineEnd = lines.end(l) - 1;
            LineChunkIndex.forEachChunk(lines, x, y, l, c -> ties.query(c.envelope(), tc -> {
                int tieEnd = lines.end(tc.line()) - 1;
                for (int i = c.from(); i < c.to(); i++) {
                    double ax0 = Math.min(x[i], x[i + 1]), ax1 = Math.max(x[i], x[i + 1]);
                    double ay0 = Math.min(y[i], y[i + 1]), ay1 = Math.max(y[i], y[i + 1]);
                    for (int j = tc.from(); j < tc.to(); j++) {
                        if (Math.max(x[j], x[j + 1]) < ax0 || Math.min(x[j], x[j + 1]) > ax1
                                || Math.max(y[j], y[j + 1]) < ay0 || Math.min(y[j], y[j + 1]) > ay1) {
                            continue;
                        }
                        double[] p = intersect(x, y, i, j);
                        if (p == null) {
                            continue;
                        }
                        double ta = p[0], tb = p[1];
                        if ((ta == 1 && i + 1 != lineEnd) || (tb == 1 && j + 1 != tieEnd)) {
                            continue; // counted at the next segment's start
                        }
                        double vtr = value[i] + ta * (value[i + 1] - value[i]);
                        double vti = value[j] + tb * (value[j + 1] - value[j]);
                        if (Double.isNaN(vtr) || Double.isNaN(vti)) {
                            continue;
                        }
                        out.add(new Crossover(line, tc.line(), x[i] + ta * (x[i + 1] - x[i]), y[i] + ta * (y[i + 1] - y[i]),
                                t[i] + ta * (t[i + 1] - t[i]), t[j] + tb * (t[j + 1] - t[j]), vtr, vti));
                    }
                }
            }));
        }
        return out;
    }

    /**
     * Parameters {ta, tb} in [0, 1] of the intersection of segments (i, i+1) and (j, j+1), or null when
     * they do not cross (or are collinear).
     */
    static double[] intersect(double[] x, double[] y, int i, int j) {
        double ax = x[i], ay = y[i], bx = x[i + 1], by = y[i + 1];
        double cx = x[j], cy = y[j], dx = x[j + 1], dy = y[j + 1];
        int o1 = CGAlgorithmsDD.orientationIndex(ax, ay, bx, by, cx, cy);
        int o2 = CGAlgorithmsDD.orientationIndex(ax, ay, bx, by, dx, dy);
        if (o1 * o2 > 0 || (o1 == 0 && o2 == 0)) {
            return null;
        }
        int o3 = CGAlgorithmsDD.orientationIndex(cx, cy, dx, dy, ax, ay);
        int o4 = CGAlgorithmsDD.orientationIndex(cx, cy, dx, dy, bx, by);
        if (o3 * o4 > 0) {
            return null;
        }
        double rx = bx - ax, ry = by - ay, sx = dx - cx, sy = dy - cy;
        double den = rx * sy - ry * sx;
        if (den == 0) {
            return null;
        }
        double qx = cx - ax, qy = cy - ay;
        double ta = clamp((qx * sy - qy * sx) / den);
        double tb = clamp((qx * ry - qy * rx) / den);
        // the exact predicates decide crossing; snap the rounded parameters to the ends they decided
        if (o3 == 0) {
            ta = 0;
        } else if (o4 == 0) {
            ta = 1;
        }
        if (o1 == 0) {
            tb = 0;
        } else if (o2 == 0) {
            tb = 1;
        }
        return new double[] {ta, tb};
    }

    private static double clamp(double v) {
        return v < 0 ? 0 : v > 1 ? 1 : v;
    }
}
