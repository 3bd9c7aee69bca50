package org.halyard.gridding;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class CoarseningLayoutTest {

    @Test
    void awkwardSizesArePaddedToLatticesThatHalveDownToAFewNodes() {
        for (int[] s : new int[][] {{505, 571}, {4000, 4000}, {3200, 3200}, {97, 211}, {3, 3}, {1021, 17}}) {
            CoarseningLayout l = CoarseningLayout.of(s[0], s[1]);
            assertThat(l.columns()).isGreaterThanOrEqualTo(s[0]);
            assertThat(l.rows()).isGreaterThanOrEqualTo(s[1]);
            // Padding bound stated in CoarseningLayout.
            assertThat((double) l.columns() * l.rows()).isLessThanOrEqualTo(
                    Math.max(s[0] * (double) s[1] * 1.06, s[0] * (double) s[1] + 16.0 * (s[0] + s[1])));
            assertThat((l.columns() - 1) % l.stride(l.halvings())).isZero();
            assertThat((l.rows() - 1) % l.stride(l.halvings())).isZero();
            assertThat(l.padWest()).isBetween(0, l.columns() - s[0]);
            if (Math.min(s[0], s[1]) > 64) {
                // The point of the padding (STACK.md, Gridding): the coarsest level is small. With 6 % extra area
                // (3 % a side) one more halving is always affordable once a side exceeds about 1/0.03 = 33 nodes.
                assertThat(Math.min(l.columnsAt(l.halvings()), l.rowsAt(l.halvings()))).isLessThanOrEqualTo(35);
            }
        }
    }
}
