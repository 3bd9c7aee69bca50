package org.halyard.survey;

import java.util.Arrays;

/**
 * Douglas-Peucker simplification of a polyline held in plain arrays (Douglas and Peucker 1973, The
 * Canadian Cartographer 10(2) 112-122): keeps the rows needed so that no dropped point is further than the
 * tolerance from the simplified line. Works on index ranges with an explicit stack, so a line of millions
 * of samples needs no coordinate objects (JTS's simplifier would need one per sample).
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class TrackSimplifier {

    private TrackSimplifier() {
    }

    /**
     * The rows of [from, to) to keep, ascending, first and last always kept.
     *
     * @param x    easting per row, m
     * @param y    northing per row, m
     * @param tolM tolerance, m (0 keeps every row)
     */
    static int[] keep(double[] x, double[] y, int from, int to, double tolM) {
        int n = to - from;
        if (n <= 2 || tolM <= 0) {
            int[] all = new int[n];
            for (int i = 0; i < n; i++) {
                all[i] = from + i;
            }
            return all;
        }
        boolean[] kept = new boolean[n];
        kept[0] = true;
        kept[n - 1] = true;
        int[] stack = new int[64];
        int sp = 0;
        stack[sp++] = from;
        stack[sp++] = to - 1;
        double tol2 = tolM * tolM;
        while (sp > 0) {
            int b = stack[--sp], a = stack[--sp];
            double ax = x[a], ay = y[a], dx = x[b] - ax, dy = y[b] - ay, len2 = dx * dx + dy * dy;
            double worst = -1;
            int at = -1;
            for (int i = a + 1; i < b; i++) {
                double px = x[i] - ax, py = y[i] - ay, d2;
                if (len2 == 0) {
                    d2 = px * px + py * py;
                } else {
                    double u = Math.max(0, Math.min(1, (px * dx + py * dy) / len2));
                    double qx = px - u * dx, qy = py - u * dy;
                    d2 = qx * qx + qy * qy;
                }
                if (d2 > worst) {
                    worst = d2;
                    at = i;
                }
            }
            if (worst > tol2) {
                kept[at - from] = true;
                if (sp + 4 > stack.length) {
                    stack = Arrays.copyOf(stack, stack.length * 2);
                }
                stack[sp++] = a;
                stack[sp++] = at;
                stack[sp++] = at;
                stack[sp++] = b;
            }
        }
        int m = 0;
        for (boolean k : kept) {
            if (k) {
                m++;
            }
        }
        int[] out = new int[m];
        for (int i = 0, j = 0; i < n; i++) {
            if (kept[i]) {
                out[j++] = from + i;
            }
        }
        return out;
    }
}
