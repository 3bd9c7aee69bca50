package org.halyard.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.junit.jupiter.api.Test;

class StretchTest {

    private static Grid row(float... v) {
        return Grid.of(new GridGeometry(v.length, 1, 0, 0, 1, null), v);
    }

    @Test
    void linearMinMaxMapsEndsAndMiddle() {
        // Definition of a linear stretch: (v - low) / (high - low), clamped.
        LinearStretch s = LinearStretch.minMax(row(-20, 0, 60, Float.NaN));
        assertThat(s.position(-20)).isEqualTo(0.0);
        assertThat(s.position(60)).isEqualTo(1.0);
        assertThat(s.position(20)).isCloseTo(0.5, within(1e-12));
        assertThat(s.position(1000)).isEqualTo(1.0);
        assertThat(s.position(Double.NaN)).isNaN();
        assertThat(s.value(0.25)).isCloseTo(0.0, within(1e-12));
    }

    @Test
    void percentileLimitsIgnoreASpike() {
        // Nearest-rank percentile (Hyndman and Fan 1996, definition 1 family): 0..99 plus a spike of 1e6;
        // with 101 values the 98 % rank is round(0.98 * 100) = 98, value 98.
        float[] v = new float[101];
        for (int i = 0; i < 100; i++) {
            v[i] = i;
        }
        v[100] = 1e6f;
        LinearStretch s = LinearStretch.percentiles(row(v), 2, 98);
        assertThat(s.low()).isEqualTo(2.0);
        assertThat(s.high()).isEqualTo(98.0);
        assertThat(s.label()).isEqualTo("linear 2-98%");
    }

    @Test
    void symmetricStretchPutsZeroOnTheCentre() {
        LinearStretch s = LinearStretch.symmetric(row(-3, 1, 8, 2), 100);
        assertThat(s.low()).isEqualTo(-8.0);
        assertThat(s.high()).isEqualTo(8.0);
        assertThat(s.position(0)).isEqualTo(0.5);
    }

    @Test
    void flatGridGetsAUsableRange() {
        LinearStretch s = LinearStretch.minMax(row(5, 5, 5));
        assertThat(s.high()).isGreaterThan(s.low());
        assertThat(s.position(5)).isCloseTo(0.5, within(1e-12));
    }

    @Test
    void histogramEqualisationSpreadsASkewedFieldEvenly() {
        // Gonzalez and Woods, Digital Image Processing 3rd ed. 3.3.1: the CDF transform makes the output
        // uniform. Exponential values (seed 7): each quarter of the ramp gets a quarter of the cells,
        // within 1 % (continuous data have no ties). A linear stretch would crowd them at the low end.
        Random rnd = new Random(7);
        float[] v = new float[10_000];
        for (int i = 0; i < v.length; i++) {
            v[i] = (float) (-Math.log(1 - rnd.nextDouble()) * 50);
        }
        Grid g = row(v);
        HistogramStretch h = HistogramStretch.of(g);
        LinearStretch lin = LinearStretch.minMax(g);
        int[] eq = new int[4], li = new int[4];
        for (float x : v) {
            eq[Math.min(3, (int) (h.position(x) * 4))]++;
            li[Math.min(3, (int) (lin.position(x) * 4))]++;
        }
        for (int q = 0; q < 4; q++) {
            assertThat(eq[q]).isBetween(2400, 2600);
        }
        assertThat(li[0]).isGreaterThan(7000);
        assertThat(h.value(0.5)).isCloseTo(50 * Math.log(2), within(5.0)); // median of Exp(1/50): 50 ln 2
    }
}
