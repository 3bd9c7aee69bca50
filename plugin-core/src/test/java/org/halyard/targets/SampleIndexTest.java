package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

class SampleIndexTest {

    @Test
    void agreesWithTheLinearScan() {
        Random rnd = new Random(9);
        int n = 20000;
        double[] x = new double[n], y = new double[n], z = new double[n], t = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 500000 + 300 * rnd.nextDouble();
            y[i] = 5700000 + 200 * rnd.nextDouble();
        }
        LineSamples s = LineSamples.withoutAltitude(x, y, z, t);
        SampleIndex idx = new SampleIndex(s, 6);
        for (int q = 0; q < 50; q++) {
            double px = 499990 + 320 * rnd.nextDouble(), py = 5699990 + 220 * rnd.nextDouble();
            double r = 1 + 10 * rnd.nextDouble();
            // The brute-force scan is the reference (same distance test, every sample).
            assertThat(idx.near(px, py, r)).containsExactly(s.near(px, py, r));
        }
        assertThat(new SampleIndex(LineSamples.NONE, 6).near(0, 0, 5)).isEmpty();
    }
}
