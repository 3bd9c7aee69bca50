package org.halyard.gridding;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.CancellationException;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.junit.jupiter.api.Test;

class SplineGridderTest {

    static final double CELL = 0.5;

    @Test
    void samplesAtCellCentresAreReproducedWithinTheLimit() {
        LineSurvey s = new LineSurvey(0, 40, 0, 30, 6, 3);
        GridGeometry g = new GridGeometry(81, 61, -0.25, 30.25, CELL, null);
        Random rnd = new Random(11);
        int n = 600;
        double[] x = new double[n], y = new double[n], v = new double[n];
        int[] cell = new int[n];
        for (int i = 0; i < n; i++) {
            int c = rnd.nextInt(g.columns()), r = rnd.nextInt(g.rows());
            cell[i] = g.index(c, r);
            x[i] = g.x(c);
            y[i] = g.y(r);
            v[i] = s.field(x[i], y[i]);
        }
        GriddingResult res = SplineGridder.grid(x, y, v, g, GriddingOptions.defaults()
                .withBlankDistance(Double.POSITIVE_INFINITY).withStatistic(BlockStatistic.MEAN), null);
        for (int i = 0; i < n; i++) {
            // A node holding a sample is set to it (Smith and Wessel 1990: data are honoured at their nodes);
            // a shared cell holds the mean of its samples, so compare against that.
            double mean = 0;
            int m = 0;
            for (int j = 0; j < n; j++) {
                if (cell[j] == cell[i]) {
                    mean += v[j];
                    m++;
                }
            }
            assertThat((double) res.grid().get(cell[i])).isCloseTo(mean / m,
                    org.assertj.core.data.Offset.offset(res.convergenceLimit() + 1e-6 * Math.abs(mean / m)));
        }
        assertThat(res.converged()).isTrue();
        assertThat(res.lastChange()).isLessThanOrEqualTo(res.convergenceLimit());
        // The same data with one sweep a level cannot settle: the result says how far from settled it is.
        GriddingResult capped = SplineGridder.grid(x, y, v, g, GriddingOptions.defaults()
                .withBlankDistance(Double.POSITIVE_INFINITY).withMaxSweeps(1), null);
        assertThat(capped.converged()).isFalse();
        assertThat(capped.lastChange()).isGreaterThan(capped.convergenceLimit());
    }

    @Test
    void offNodeSamplesAreHonouredByTheFirstOrderExpansion() {
        LineSurvey s = new LineSurvey(0, 40, 0, 30, 6, 5);
        double[][] t = s.tracks(new double[] {2.37, 6.81, 11.13, 15.6, 20.02, 24.44, 28.9, 33.3, 37.71}, 0.53);
        GridGeometry g = SplineGridder.geometryFor(t[0], t[1], CELL, null);
        GriddingResult res = SplineGridder.grid(t[0], t[1], t[2], g,
                GriddingOptions.defaults().withBlankDistance(Double.POSITIVE_INFINITY), null);
        Grid grid = res.grid();
        double worst = 0;
        for (int i = 0; i < t[0].length; i++) {
            double fc = g.column(t[0][i]), fr = g.row(t[1][i]);
            int c = (int) Math.round(fc), r = (int) Math.round(fr);
            if (c < 1 || r < 1 || c > g.columns() - 2 || r > g.rows() - 2) {
                continue;
            }
            double dx = fc - c, dy = fr - r;
            double e = grid.get(c + 1, r), w = grid.get(c - 1, r), so = grid.get(c, r + 1), no = grid.get(c, r - 1);
            // First-order Taylor expansion about the node (the data constraint of TensionSplineRelaxation).
            double atSample = grid.get(c, r) + dx * (e - w) / 2 + dy * (so - no) / 2;
            worst = Math.max(worst, Math.abs(atSample - t[2][i]));
        }
        // Converged to the limit; float32 storage of values up to ~60 nT adds ~1e-5 per node.
        assertThat(worst).isLessThanOrEqualTo(4 * res.convergenceLimit() + 1e-4);
    }

    @Test
    void tiltedPlaneIsReproducedEverywhere() {
        // Without tension a plane has zero curvature and zero Laplacian: it solves the minimum-curvature
        // equation and its free-edge conditions exactly (Briggs 1974, eqs. 4-6), so the grid must be that plane.
        // (With tension the edge condition asks for zero normal slope, so planes bend away from data.)
        Random rnd = new Random(2);
        int n = 300;
        double[] x = new double[n], y = new double[n], v = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 100 + 30 * rnd.nextDouble();
            y[i] = 500 + 20 * rnd.nextDouble();
            v[i] = 3.5 + 0.8 * (x[i] - 100) - 1.3 * (y[i] - 500);
        }
        GridGeometry g = SplineGridder.geometryFor(x, y, CELL, null);
        Grid grid = SplineGridder.grid(x, y, v, g, GriddingOptions.defaults().withTension(0)
                .withBlankDistance(Double.POSITIVE_INFINITY), null).grid();
        for (int r = 0; r < g.rows(); r++) {
            for (int c = 0; c < g.columns(); c++) {
                double expect = 3.5 + 0.8 * (g.x(c) - 100) - 1.3 * (g.y(r) - 500);
                assertThat((double) grid.get(c, r)).isCloseTo(expect, org.assertj.core.data.Offset.offset(1e-3));
            }
        }
    }

    @Test
    void cellsFartherThanTheBlankingDistanceAreBlankAndOthersAreNot() {
        LineSurvey s = new LineSurvey(0, 30, 0, 30, 4, 9);
        double[][] t = s.tracks(new double[] {1.1, 4.2, 12.7, 13.9, 27.3}, 0.4);
        GridGeometry g = SplineGridder.geometryFor(t[0], t[1], CELL, null);
        double blank = 1.6;
        Grid grid = SplineGridder.grid(t[0], t[1], t[2], g, GriddingOptions.defaults().withBlankDistance(blank), null)
                .grid();
        List<int[]> dataCells = new ArrayList<>();
        for (int i = 0; i < t[0].length; i++) {
            dataCells.add(new int[] {(int) ((t[0][i] - g.west()) / CELL), (int) ((g.north() - t[1][i]) / CELL)});
        }
        for (int r = 0; r < g.rows(); r++) {
            for (int c = 0; c < g.columns(); c++) {
                double best = Double.POSITIVE_INFINITY;
                for (int[] d : dataCells) {
                    best = Math.min(best, Math.hypot(d[0] - c, d[1] - r) * CELL);
                }
                // Brute-force distance between cell centres, the rule stated in SplineGridder.
                assertThat(Float.isNaN(grid.get(c, r))).as("cell %d,%d at %.3f m", c, r, best).isEqualTo(best > blank);
            }
        }
    }

    @Test
    void automaticBlankingKeepsTheGapsBetweenLines() {
        LineSurvey s = new LineSurvey(0, 40, 0, 40, 4, 13);
        double[][] t = s.tracks(s.lines(5), 0.2);
        GridGeometry g = new GridGeometry(120, 120, -10, 50, CELL, null);
        GriddingResult res = SplineGridder.grid(t[0], t[1], t[2], g, null, null);
        // Rule stated in SplineGridder: 1.5 x half-gap = 0.75 x 5 m line spacing, to within a cell.
        assertThat(res.blankDistance()).isBetween(3.75 - CELL, 3.75 + CELL);
        for (int r = 0; r < g.rows(); r++) {
            for (int c = 0; c < g.columns(); c++) {
                boolean inside = g.x(c) >= 0 && g.x(c) <= 40 && g.y(r) >= 0 && g.y(r) <= 40;
                if (inside) {
                    assertThat(Float.isNaN(res.grid().get(c, r))).as("cell %d,%d inside the survey", c, r).isFalse();
                }
            }
        }
        assertThat(Float.isNaN(res.grid().get(0, 0))).as("corner 10 m outside the survey").isTrue();
    }

    @Test
    void nonFiniteSamplesAreSkippedAndCounted() {
        double[] x = {0, 10, 0, 10, 5, Double.NaN, 3};
        double[] y = {0, 0, 10, 10, 5, 2, 3};
        double[] v = {1, 2, 3, 4, 5, 6, Double.NaN};
        GridGeometry g = SplineGridder.geometryFor(x, y, 1, null);
        GriddingResult res = SplineGridder.grid(x, y, v, g, null, null);
        assertThat(res.nonFinite()).isEqualTo(2);
        assertThat(res.samplesUsed()).isEqualTo(5);
    }

    @Test
    void badInputGetsOneLineMessages() {
        double[] three = {0, 1, 2};
        GridGeometry g = new GridGeometry(10, 10, 0, 10, 1, null);
        assertThatThrownBy(() -> SplineGridder.grid(new double[] {1, 2}, new double[] {1, 2}, new double[] {1, 2}, g,
                null, null)).isInstanceOf(IllegalArgumentException.class).hasMessageContaining("at least 3 samples");
        assertThatThrownBy(() -> SplineGridder.grid(new double[] {4, 4, 4}, new double[] {5, 5, 5}, three, g, null, null))
                .hasMessageContaining("one position");
        assertThatThrownBy(() -> SplineGridder.geometryFor(new double[] {1, Double.NaN, 3, Double.NaN},
                new double[] {1, 2, Double.NaN, 4}, 1, null)).hasMessageContaining("skipped for NaN");
        assertThatThrownBy(() -> SplineGridder.geometryFor(three, three, 5, null))
                .hasMessageContaining("too large for the data extent");
        GridGeometry huge = new GridGeometry(40_000, 40_000, 0, 40_000, 1, null);
        assertThatThrownBy(() -> SplineGridder.grid(new double[] {1, 5, 9}, new double[] {1, 9, 4}, three, huge,
                null, null)).hasMessageMatching("a grid of 40000 x 40000 cells .* needs about \\d+ MB of memory.*");
    }

    @Test
    void progressRunsToOneHundredAndCancelStops() {
        LineSurvey s = new LineSurvey(0, 40, 0, 40, 4, 1);
        double[][] t = s.tracks(s.lines(3), 0.3);
        GridGeometry g = SplineGridder.geometryFor(t[0], t[1], CELL, null);
        List<Double> seen = new ArrayList<>();
        SplineGridder.grid(t[0], t[1], t[2], g, null, new Progress() {
            @Override
            public void report(double percent) {
                seen.add(percent);
            }

            @Override
            public boolean isCanceled() {
                return false;
            }
        });
        assertThat(seen).isSorted();
        assertThat(seen.get(seen.size() - 1)).isEqualTo(100.0);
        assertThatThrownBy(() -> SplineGridder.grid(t[0], t[1], t[2], g, null, new Progress() {
            @Override
            public void report(double percent) {
            }

            @Override
            public boolean isCanceled() {
                return true;
            }
        })).isInstanceOf(CancellationException.class);
    }

    /**
     * The 3200 x 3200 size class once crashed GMT surface (STACK.md, GMT issue 7132). Few samples and a
     * loose limit keep it cheap for CI: it checks that the lattice, padding and crop hold at that size.
     */
    @Test
    void sizeClass3200Works() {
        GridGeometry g = new GridGeometry(3200, 3200, 0, 1600, CELL, null);
        Random rnd = new Random(3200);
        int n = 400;
        double[] x = new double[n], y = new double[n], v = new double[n];
        int[] cell = new int[n];
        for (int i = 0; i < n; i++) {
            int c = rnd.nextInt(3200), r = rnd.nextInt(3200);
            cell[i] = g.index(c, r);
            x[i] = g.x(c);
            y[i] = g.y(r);
            v[i] = 10 * Math.sin(x[i] / 200) * Math.cos(y[i] / 300);
        }
        GriddingResult res = SplineGridder.grid(x, y, v, g, GriddingOptions.defaults().withConvergenceLimit(0.05)
                .withMaxSweeps(15).withBlankDistance(Double.POSITIVE_INFINITY), null);
        assertThat(res.grid().validCount()).isEqualTo(3200 * 3200);
        for (int i = 0; i < n; i++) {
            // Nodes holding a sample are set to it at every sweep (TensionSplineRelaxation), whatever the limit.
            assertThat((double) res.grid().get(cell[i])).isCloseTo(v[i], org.assertj.core.data.Offset.offset(1e-5));
        }
    }
}
