package org.halyard.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * The blank fill on strided rows: data and the caller's pad are left alone, every blank is filled, and
 * a hole in a plane is filled close to the plane (a plane is harmonic, so the ring fill plus Laplace
 * relaxation tends to it: discrete Laplace equation, e.g. Press et al., Numerical Recipes, 3rd ed., 20.5).
 */
class BlankFillTest {

    @Test
    void fillsEveryBlankNearThePlaneAndTouchesNothingElse() {
        int w = 40, h = 30, stride = 47;
        float[] v = new float[h * stride];
        Arrays.fill(v, 42f);
        boolean[] blank = new boolean[w * h];
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                boolean hole = r >= 10 && r < 16 && c >= 12 && c < 20;
                blank[r * w + c] = hole;
                v[r * stride + c] = hole ? Float.NaN : plane(c, r);
            }
        }
        assertThat(BlankFill.fill(v, w, h, stride, blank)).isEqualTo(48);
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < stride; c++) {
                float got = v[r * stride + c];
                if (c >= w) {
                    assertThat(got).isEqualTo(42f);
                } else if (blank[r * w + c]) {
                    // the plane rises 0.5 x 7 + 0.25 x 5 = 4.75 across the hole; within about a tenth of that
                    assertThat((double) got).isCloseTo(plane(c, r), org.assertj.core.data.Offset.offset(0.55));
                } else {
                    assertThat(got).isEqualTo(plane(c, r));
                }
            }
        }
    }

    @Test
    void refusesAnAllBlankGridAndIgnoresAGridWithoutBlanks() {
        float[] v = {1, 2, 3, 4};
        assertThat(BlankFill.fill(v, 2, 2, 2, new boolean[4])).isZero();
        assertThat(v).containsExactly(1, 2, 3, 4);
        float[] all = {Float.NaN, Float.NaN};
        assertThatThrownBy(() -> BlankFill.fill(all, 2, 1, 2, new boolean[] {true, true}))
                .hasMessageContaining("every cell");
    }

    private static float plane(int c, int r) {
        return 2 + 0.5f * c + 0.25f * r;
    }
}
