package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;

/**
 * Tiles a rectangular survey area into overlapping sheets of one ground size.
 *
 * <p><b>Algorithm:</b> along each axis the fewest sheets {@code n} with
 * {@code n w - (n - 1) o >= extent} (w sheet width, o overlap), the block of sheets centred on the area.
 * Sheets are numbered row by row from the north-west corner, west to east, north to south (common
 * practice for series indexes).
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class AreaTiler {

    private AreaTiler() {
    }

    /**
     * Footprints covering {@code extent}.
     *
     * @param extent          {@code {xmin, ymin, xmax, ymax}}, metres
     * @param sheetWidth      ground width one sheet shows, metres
     * @param sheetHeight     ground height one sheet shows, metres
     * @param overlapFraction overlap between neighbours as a fraction of the sheet side, 0 to 0.5
     */
    public static List<SheetFootprint> tile(double[] extent, double sheetWidth, double sheetHeight,
                                            double overlapFraction) {
        if (!(overlapFraction >= 0 && overlapFraction <= 0.5)) {
            throw new IllegalArgumentException("sheet overlap must be 0 to 0.5 of a sheet, got " + overlapFraction);
        }
        double[] xs = starts(extent[0], extent[2], sheetWidth, overlapFraction * sheetWidth);
        double[] ys = starts(extent[1], extent[3], sheetHeight, overlapFraction * sheetHeight);
        List<SheetFootprint> out = new ArrayList<>();
        for (int r = ys.length - 1; r >= 0; r--) {
            for (double x : xs) {
                out.add(new SheetFootprint(out.size() + 1, x, ys[r], x + sheetWidth, ys[r] + sheetHeight));
            }
        }
        return out;
    }

    /** Left (or bottom) edges of the sheets along one axis. */
    static double[] starts(double lo, double hi, double size, double overlap) {
        double span = Math.max(hi - lo, 0);
        int n = span <= size ? 1 : (int) Math.ceil((span - overlap) / (size - overlap) - 1e-9);
        double covered = n * size - (n - 1) * overlap;
        double first = lo - (covered - span) / 2;
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            s[i] = first + i * (size - overlap);
        }
        return s;
    }
}
