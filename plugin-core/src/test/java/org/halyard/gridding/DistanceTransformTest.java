package org.halyard.gridding;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

class DistanceTransformTest {

    @Test
    void matchesBruteForceOnRandomMasks() {
        Random rnd = new Random(77);
        for (int[] size : new int[][] {{1, 1}, {7, 3}, {31, 17}, {64, 64}}) {
            int cols = size[0], rows = size[1];
            boolean[] m = new boolean[cols * rows];
            for (int k = 0; k < m.length; k++) {
                m[k] = rnd.nextDouble() < 0.03;
            }
            m[rnd.nextInt(m.length)] = true;
            float[] d = DistanceTransform.distances(m, cols, rows);
            for (int k = 0; k < m.length; k++) {
                double best = Double.POSITIVE_INFINITY;
                for (int j = 0; j < m.length; j++) {
                    if (m[j]) {
                        best = Math.min(best, Math.hypot(k % cols - j % cols, k / cols - j / cols));
                    }
                }
                // Exact Euclidean transform (Felzenszwalb and Huttenlocher 2012) against brute force.
                assertThat((double) d[k]).isCloseTo(best, org.assertj.core.data.Offset.offset(1e-5));
            }
        }
    }

    @Test
    void emptyMaskIsInfinitelyFar() {
        float[] d = DistanceTransform.distances(new boolean[12], 4, 3);
        for (float v : d) {
            assertThat(v).isEqualTo(Float.POSITIVE_INFINITY);
        }
    }
}
