package org.halyard.gridding;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import org.halyard.grid.GridGeometry;
import org.junit.jupiter.api.Test;

class BlockReductionTest {

    final GridGeometry g = new GridGeometry(2, 1, 0, 1, 1, null);

    @Test
    void medianKeepsTheMedianSampleAndMeanAveragesPerCell() {
        double[] x = {0.1, 0.2, 0.3, 0.4, 1.5, 1.6, 7.0, 0.5};
        double[] y = {0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, Double.NaN};
        double[] v = {5, 100, 1, 3, 10, 20, 0, 0};
        ReducedSamples med = BlockReduction.reduce(x, y, v, g, BlockStatistic.MEDIAN);
        // Lower median of {1, 3, 5, 100} is 3, held by the sample at x = 0.4 (definition of the median).
        assertThat(med.value()).containsExactly(3, 10);
        assertThat(med.x()).containsExactly(0.4, 1.5);
        assertThat(med.nonFinite()).isEqualTo(1);
        assertThat(med.outside()).isEqualTo(1);
        ReducedSamples mean = BlockReduction.reduce(x, y, v, g, BlockStatistic.MEAN);
        assertThat(mean.value()).containsExactly(27.25, 15);
        assertThat(mean.x()[0]).isCloseTo(0.25, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(mean.cell()).containsExactly(0, 1);
    }

    @Test
    void selectFindsEveryRank() {
        double[] key = {9, 2, 7, 2, 5, 1, 8, 3, 3, 6};
        double[] sorted = key.clone();
        Arrays.sort(sorted);
        for (int rank = 0; rank < key.length; rank++) {
            int[] idx = {0, 1, 2, 3, 4, 5, 6, 7, 8, 9};
            assertThat(key[BlockReduction.select(idx, 0, idx.length - 1, rank, key)]).isEqualTo(sorted[rank]);
        }
    }
}
