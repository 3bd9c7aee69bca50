package org.halyard.survey;

import java.util.Arrays;
import org.locationtech.jts.geom.Envelope;

/**
 * Distance from each traverse line to its neighbour on the starboard side, and the share of the area
 * between lines where it exceeds a limit.
 *
 * <p><b>Algorithm:</b> probes every {@code stepM} metres along each traverse line look, within a search
 * radius of {@value #REACH} times the limit, for the nearest segment of another traverse line that lies to
 * starboard (positive across-track component); the distance is the local spacing. The strip between a line
 * and its starboard neighbour has area sum(spacing * step), and the part where the spacing exceeds the limit
 * is the sum over those probes: their ratio is the fraction of the surveyed area under-sampled.
 * Neighbours come from {@link LineChunkIndex} (JTS STRtree).
 *
 * <p><b>Limitations:</b> probes with no neighbour within reach (the survey edge, or a hole wider than the
 * reach) are left out of the fraction and counted separately.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class LineSpacing {

    /** Search radius in multiples of the spacing limit. */
    static final double REACH = 2;

    /**
     * Spacing per line.
     *
     * @param medianM        per line, median spacing to starboard, m (NaN when never within reach)
     * @param overLimit      per line, fraction of its starboard strip where spacing exceeds the limit
     * @param areaOverLimit  over all traverse lines, fraction of the strip area where spacing exceeds the limit
     * @param unmatchedM     length of traverse line with no neighbour within reach, m
     */
    public record Result(double[] medianM, double[] overLimit, double areaOverLimit, double unmatchedM) {
    }

    private LineSpacing() {
    }

    /**
     * @param lines      the lines (reference positions, m)
     * @param distanceM  distance along the line per row, m
     * @param headingDeg heading per row, degrees clockwise from north
     * @param isTie      per line, whether it is a tie line (excluded)
     * @param limitM     the spacing limit, m (&gt; 0)
     * @param stepM      probe interval along the lines, m (&gt; 0)
     */
    public static Result compute(SurveyLines lines, double[] distanceM, float[] headingDeg, boolean[] isTie,
                                 double limitM, double stepM) {
        double[] x = lines.x(), y = lines.y();
        LineChunkIndex index = new LineChunkIndex(lines, x, y, l -> !isTie[l]);
        int nl = lines.lineCount();
        double[] median = new double[nl], over = new double[nl];
        Arrays.fill(median, Double.NaN);
        Arrays.fill(over, Double.NaN);
        double reach = REACH * limitM;
        double areaAll = 0, areaOver = 0, unmatched = 0;
        double[] best = new double[1];
        for (int l = 0; l < nl; l++) {
            if (isTie[l]) {
                continue;
            }
            int s = lines.start(l), e = lines.end(l);
            double[] found = new double[Math.max(1, (int) ((distanceM[Math.max(s, e - 1)] - distanceM[s]) / stepM) + 2)];
            int nf = 0;
            double la = 0, lo = 0;
            double next = distanceM[s];
            for (int i = s; i < e; i++) {
                if (distanceM[i] < next) {
                    continue;
                }
                next = distanceM[i] + stepM;
                double h = Math.toRadians(headingDeg[i]);
                double stx = Math.cos(h), sty = -Math.sin(h);
                double px = x[i], py = y[i];
                best[0] = Double.POSITIVE_INFINITY;
                int self = l;
                index.query(new Envelope(px - reach, px + reach, py - reach, py + reach), c -> {
                    if (c.line() == self || c.envelope().distance(new Envelope(px, px, py, py)) >= best[0]) {
                        return; // cannot beat the nearest found so far
                    }
                    for (int j = c.from(); j < c.to(); j++) {
                        double d = starboardDistance(px, py, stx, sty, x[j], y[j], x[j + 1], y[j + 1]);
                        if (d < best[0]) {
                            best[0] = d;
                        }
                    }
                });
                if (best[0] <= reach) {
                    if (nf == found.length) {
                        found = Arrays.copyOf(found, nf * 2);
                    }
                    found[nf++] = best[0];
                    la += best[0];
                    if (best[0] > limitM) {
                        lo += best[0];
                    }
                } else {
                    unmatched += stepM;
                }
            }
            if (nf > 0) {
                median[l] = Robust.median(Arrays.copyOf(found, nf));
                over[l] = la > 0 ? lo / la : 0;
                areaAll += la;
                areaOver += lo;
            }
        }
        return new Result(median, over, areaAll > 0 ? areaOver / areaAll : Double.NaN, unmatched);
    }

    /** Distance from p to segment ab when the nearest point lies to starboard (unit vector st), else infinity. */
    private static double starboardDistance(double px, double py, double stx, double sty, double ax, double ay,
                                            double bx, double by) {
        double vx = bx - ax, vy = by - ay;
        double len2 = vx * vx + vy * vy;
        double u = len2 > 0 ? ((px - ax) * vx + (py - ay) * vy) / len2 : 0;
        u = u < 0 ? 0 : u > 1 ? 1 : u;
        double qx = ax + u * vx - px, qy = ay + u * vy - py;
        double d = Math.sqrt(qx * qx + qy * qy);
        // starboard: the offset's across component dominates (within 45 degrees of the starboard normal)
        double across = qx * stx + qy * sty;
        return across > 0 && across >= 0.7071 * d ? d : Double.POSITIVE_INFINITY;
    }
}
