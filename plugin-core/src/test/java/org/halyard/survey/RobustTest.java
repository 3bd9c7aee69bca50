package org.halyard.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

class RobustTest {

    @Test
    void medianAgreesWithSorting() {
        // reference: the middle of the sorted array (definition of the median), odd and even sizes, ties, NaN
        Random r = new Random(9);
        for (int n = 1; n < 300; n++) {
            double[] a = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = i % 7 == 3 ? Double.NaN : Math.floor(r.nextGaussian() * 5);
            }
            double[] s = Arrays.stream(a).filter(v -> !Double.isNaN(v)).sorted().toArray();
            double expected = s.length == 0 ? Double.NaN
                    : (s.length & 1) == 1 ? s[s.length / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
            assertThat(Robust.median(a.clone())).as("n=%d", n).isEqualTo(expected);
        }
    }

    @Test
    void sigmaOfGaussianSample() {
        // MAD * 1.4826 estimates the standard deviation of a Gaussian (Hampel 1974)
        Random r = new Random(2);
        double[] a = new double[200000];
        for (int i = 0; i < a.length; i++) {
            a[i] = 3 + 2 * r.nextGaussian();
        }
        assertThat(Robust.sigma(a)).isBetween(1.98, 2.02);
    }
}
