package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import java.util.Random;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.junit.jupiter.api.Test;

class PeakPickerTest {

    static final GridGeometry GEO = new GridGeometry(60, 50, 1000, 2000, 0.5, null);

    @Test
    void refinesAQuadraticPeakExactly() {
        // A three-point parabola through samples of a quadratic has its vertex at the quadratic's (algebra).
        double x0 = 1013.37, y0 = 1987.81;
        Grid g = Grid.sample(GEO, (x, y) -> Math.max(0, 50 - (x - x0) * (x - x0) - 2 * (y - y0) * (y - y0)));
        PeakPicker.Result r = PeakPicker.pick(g, PeakOptions.DEFAULT, Progress.NONE);
        assertThat(r.peaks()).hasSize(1);
        assertThat(r.peaks().get(0).x()).isCloseTo(x0, offset(1e-4)); // float grid rounding only
        assertThat(r.peaks().get(0).y()).isCloseTo(y0, offset(1e-4));
        assertThat(r.peaks().get(0).amplitude()).isCloseTo(50, offset(1e-3)); // the vertex value
    }

    @Test
    void minimumSeparationKeepsTheStronger() {
        // 2.5 m apart: still two maxima after the picker's one-cell smoothing.
        Grid g = Grid.sample(GEO, (x, y) -> bump(x, y, 1010, 1990, 5) + bump(x, y, 1012.5, 1990, 4));
        PeakOptions tight = new PeakOptions(5, 1, 0.5);
        assertThat(PeakPicker.pick(g, tight, Progress.NONE).peaks()).hasSize(2);
        PeakPicker.Result wide = PeakPicker.pick(g, new PeakOptions(5, 1, 3.0), Progress.NONE);
        assertThat(wide.peaks()).hasSize(1);
        assertThat(wide.peaks().get(0).x()).isCloseTo(1010, offset(0.25));
    }

    @Test
    void aFlatTopGivesOnePick() {
        Grid g = Grid.sample(GEO, (x, y) -> Math.hypot(x - 1015, y - 1985) < 2 ? 7 : 0);
        assertThat(PeakPicker.pick(g, PeakOptions.DEFAULT, Progress.NONE).peaks()).hasSize(1);
    }

    @Test
    void noiseAloneGivesNoPickAtFiveSigma() {
        Random rnd = new Random(3);
        GridGeometry geo = new GridGeometry(200, 200, 0, 100, 0.5, null);
        Grid g = Grid.sample(geo, (x, y) -> rnd.nextGaussian());
        PeakPicker.Result r = PeakPicker.pick(g, PeakOptions.DEFAULT, Progress.NONE);
        // Hampel 1974: 1.4826 MAD estimates a Gaussian sigma; with 40000 cells its standard error is about 0.4%.
        assertThat(r.noise().sigma()).isCloseTo(1.0, offset(0.02));
        // Gaussian tail: P(z > 5) = 2.9e-7, so 40000 cells expect 0.01 exceedances (common practice).
        assertThat(r.peaks()).isEmpty();
    }

    @Test
    void refusesAnAllBlankGrid() {
        assertThatThrownBy(() -> PeakPicker.pick(Grid.filled(GEO, Float.NaN), PeakOptions.DEFAULT, Progress.NONE))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("blank");
    }

    @Test
    void refusesBadOptions() {
        assertThatThrownBy(() -> new PeakOptions(0, 2, 1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new PeakOptions(5, 0, 1)).isInstanceOf(IllegalArgumentException.class);
    }

    static double bump(double x, double y, double cx, double cy, double a) {
        double r2 = (x - cx) * (x - cx) + (y - cy) * (y - cy);
        return a * Math.exp(-r2 / 0.5);
    }
}
