package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;

/**
 * Tiles a corridor along a route line into overlapping sheets, numbered from the route's start.
 *
 * <p><b>Algorithm:</b> the route is resampled every 1/100 of the smaller sheet side. From the first
 * uncovered sample, the run of samples is extended while their bounding box, grown by the corridor
 * half-width, still fits one sheet; the sheet is centred on that grown box. The next sheet starts
 * {@code overlap} metres of route before the end of the previous one. Sheets stay grid north up, so a
 * route at 45 degrees needs more sheets than one along an axis.
 *
 * <p><b>Limitations:</b> the corridor is covered where the route's own sheets reach; a route doubling back
 * on itself gets sheets for each pass.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class CorridorTiler {

    private CorridorTiler() {
    }

    /**
     * Footprints covering the corridor of {@code halfWidth} metres either side of {@code route}.
     *
     * @param route           route line, metres in the sheet CRS
     * @param halfWidth       corridor half-width, metres, positive
     * @param sheetWidth      ground width one sheet shows, metres
     * @param sheetHeight     ground height one sheet shows, metres
     * @param overlapFraction overlap along the route as a fraction of the smaller sheet side, 0 to 0.5
     */
    public static List<SheetFootprint> tile(Polyline route, double halfWidth, double sheetWidth,
                                            double sheetHeight, double overlapFraction) {
        double side = Math.min(sheetWidth, sheetHeight);
        if (!(halfWidth > 0) || 2 * halfWidth >= side) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "corridor half-width %.1f m must be positive and under half the sheet side (%.1f m):"
                            + " choose a smaller scale", halfWidth, side / 2));
        }
        if (!(overlapFraction >= 0 && overlapFraction <= 0.5)) {
            throw new IllegalArgumentException("sheet overlap must be 0 to 0.5 of a sheet, got " + overlapFraction);
        }
        double step = side / 100;
        double[][] pts = resample(route, step);
        int back = (int) Math.round(overlapFraction * side / step);
        List<SheetFootprint> out = new ArrayList<>();
        int i = 0;
        while (true) {
            double[] box = {pts[i][0], pts[i][1], pts[i][0], pts[i][1]};
            int j = i;
            while (j + 1 < pts.length && fits(box, pts[j + 1], halfWidth, sheetWidth, sheetHeight)) {
                j++;
                box = grow(box, pts[j]);
            }
            double cx = (box[0] + box[2]) / 2, cy = (box[1] + box[3]) / 2;
            out.add(new SheetFootprint(out.size() + 1, cx - sheetWidth / 2, cy - sheetHeight / 2,
                    cx + sheetWidth / 2, cy + sheetHeight / 2));
            if (j == pts.length - 1) {
                return out;
            }
            i = Math.max(i + 1, j - back);
        }
    }

    private static boolean fits(double[] box, double[] p, double hw, double w, double h) {
        double[] g = grow(box, p);
        return g[2] - g[0] + 2 * hw <= w && g[3] - g[1] + 2 * hw <= h;
    }

    private static double[] grow(double[] b, double[] p) {
        return new double[] {Math.min(b[0], p[0]), Math.min(b[1], p[1]), Math.max(b[2], p[0]),
                Math.max(b[3], p[1])};
    }

    /** Points along the route every {@code step} metres or closer, including every vertex. */
    static double[][] resample(Polyline route, double step) {
        double[] x = route.x(), y = route.y();
        List<double[]> pts = new ArrayList<>();
        pts.add(new double[] {x[0], y[0]});
        for (int k = 1; k < x.length; k++) {
            double len = Math.hypot(x[k] - x[k - 1], y[k] - y[k - 1]);
            int n = Math.max(1, (int) Math.ceil(len / step));
            for (int s = 1; s <= n; s++) {
                double t = (double) s / n;
                pts.add(new double[] {x[k - 1] + t * (x[k] - x[k - 1]), y[k - 1] + t * (y[k] - y[k - 1])});
            }
        }
        return pts.toArray(new double[0][]);
    }
}
