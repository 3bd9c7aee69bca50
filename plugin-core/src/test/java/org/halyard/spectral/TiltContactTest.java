package org.halyard.spectral;

import static org.assertj.core.api.Assertions.assertThat;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.model.FieldDirection;
import org.halyard.model.Prism;
import org.junit.jupiter.api.Test;

/**
 * Tilt angle over a vertical contact: for vertical field and magnetisation the +45 and -45 degree contours
 * lie one depth either side of the edge, so their spacing is twice the depth to the top (Salem et al.
 * 2007, The Leading Edge 26(12) 1502-1505). The contact is a prism far wider and deeper than the grid
 * (Bhattacharyya 1964 forward model).
 */
class TiltContactTest {

    @Test
    void plusMinus45DegreeContourSpacingIsTwiceTheDepth() {
        double depth = 5;
        // West face at x = 0; the prism runs 4 km east, 8 km north-south, from 5 m to 2 km deep.
        Prism contact = Prism.induced(0, 4000, -4000, 4000, depth, 2000, 0.01, 50000, FieldDirection.POLE);
        GridGeometry g = new GridGeometry(240, 240, -120, 120, 1, "EPSG:32631");
        Grid obs = Grid.sample(g, (x, y) -> contact.totalField(x, y, 0, FieldDirection.POLE));
        Grid tilt = new FilterBank(obs, FilterSettings.defaults()).apply(FilterOperation.TILT, Progress.NONE);
        int row = (int) Math.round(g.row(0.5));
        double xPlus = crossing(tilt, g, row, 45), xMinus = crossing(tilt, g, row, -45);
        assertThat(Math.abs(xPlus - xMinus)).isBetween(2 * depth * 0.9, 2 * depth * 1.1);
        // The zero contour marks the edge (Miller and Singh 1994).
        assertThat(crossing(tilt, g, row, 0)).isBetween(-1.0, 1.0);
    }

    /** Easting where the tilt profile along {@code row} crosses {@code level}, nearest the centre. */
    private static double crossing(Grid tilt, GridGeometry g, int row, double level) {
        double best = Double.NaN;
        for (int c = 40; c < g.columns() - 41; c++) {
            double a = tilt.get(c, row) - level, b = tilt.get(c + 1, row) - level;
            if (a == 0 || a * b < 0) {
                double x = g.x(c) + (g.x(c + 1) - g.x(c)) * a / (a - b);
                if (Double.isNaN(best) || Math.abs(x) < Math.abs(best)) {
                    best = x;
                }
            }
        }
        assertThat(best).as("tilt crosses " + level).isNotNaN();
        return best;
    }
}
