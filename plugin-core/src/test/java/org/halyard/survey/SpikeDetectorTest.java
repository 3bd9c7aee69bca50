package org.halyard.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Random;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.junit.jupiter.api.Test;

class SpikeDetectorTest {

    @Test
    void findsInjectedSpikesLeavesATargetAnomalyAndMeasuresNoise() {
        int n = 20000;
        double sigma = 0.02; // nT, white noise
        Random rnd = new Random(5);
        FieldDirection f = new FieldDirection(66, 1.5);
        Dipole target = Dipole.along(0, 1000, 1.5, 5, f); // 1.5 m below the sensor: a sharp anomaly
        double[] t = new double[n], x = new double[n], y = new double[n], v = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i * 0.1;
            y[i] = i * 0.2;
            v[i] = 49000 + target.totalField(0, y[i], 0, f) + sigma * rnd.nextGaussian();
        }
        int[] at = {1203, 7000, 15555};
        double[] amp = {3.0, -2.0, 5.0};
        double[] clean = v.clone();
        for (int k = 0; k < at.length; k++) {
            v[at[k]] += amp[k];
        }
        SurveyLines lines = new SurveyLines("s", new String[] {"L1"}, new int[] {0, n}, true, t, x, y, new float[n],
                new float[n], List.of(new SensorSpec("m", 0, 0)), new double[][] {v});
        byte[] flags = new byte[n];
        SpikeDetector.Result r = SpikeDetector.clean(lines, v, flags, 10);
        assertThat(r.spikeRows()).containsExactly(at);
        for (int k : at) {
            assertThat(flags[k] & SampleFlags.SPIKE).isNotZero();
            // repaired by interpolation of the neighbours: within a few noise sigmas of the clean value
            assertThat(Math.abs(v[k] - clean[k])).isLessThan(5 * sigma + 0.05);
        }
        // white noise: sigma(d4) = sigma sqrt(70) (sum of squared weights), so the estimate returns sigma
        assertThat(r.noiseNt()[0]).isBetween(0.95 * sigma, 1.05 * sigma);
    }
}
