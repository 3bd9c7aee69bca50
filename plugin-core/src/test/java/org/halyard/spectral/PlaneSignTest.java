package org.halyard.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.junit.jupiter.api.Test;

/**
 * Sign conventions on a tilted plane T = 10 + 0.3 (x - x0) - 0.2 (y - y0): dx is the east slope, dy the
 * north slope, whatever the row order (GeoTIFF row 0 is north; DOMAIN.md). Exact arithmetic, since a
 * plane is harmonic and is handled analytically by the engine.
 */
class PlaneSignTest {

    @Test
    void derivativesOfATiltedPlaneHaveTheRightSigns() {
        GridGeometry g = new GridGeometry(37, 23, 1000, 2000, 2, "EPSG:32631");
        Grid plane = Grid.sample(g, (x, y) -> 10 + 0.3 * (x - 1000) - 0.2 * (y - 2000));
        FilterBank bank = new FilterBank(plane, FilterSettings.defaults());
        Grid dx = bank.apply(FilterOperation.DX, Progress.NONE);
        Grid dy = bank.apply(FilterOperation.DY, Progress.NONE);
        Grid dz = bank.apply(FilterOperation.VERTICAL_DERIVATIVE, Progress.NONE);
        Grid up = bank.apply(FilterOperation.UPWARD, Progress.NONE);
        for (int i = 0; i < g.size(); i++) {
            assertThat((double) dx.get(i)).isCloseTo(0.3, within(1e-4));
            assertThat((double) dy.get(i)).isCloseTo(-0.2, within(1e-4));
            assertThat((double) dz.get(i)).isCloseTo(0.0, within(1e-4));
            assertThat((double) up.get(i)).isCloseTo(plane.get(i), within(1e-3));
        }
    }

    @Test
    void northDerivativeOfABumpIsNegativeNorthOfItAndPositiveSouth() {
        // A Gaussian bump: north of its centre the field decreases northwards, so dT/dy < 0 there.
        GridGeometry g = new GridGeometry(64, 64, -0.5, 63.5, 1, "EPSG:32631");
        Grid bump = Grid.sample(g, (x, y) -> Math.exp(-((x - 32) * (x - 32) + (y - 32) * (y - 32)) / 20));
        Grid dy = new FilterBank(bump, FilterSettings.defaults()).apply(FilterOperation.DY, Progress.NONE);
        int north = (int) Math.round(g.row(36)), south = (int) Math.round(g.row(28)), col = (int) Math.round(g.column(32));
        // Closed form: d/dy exp(-(y-32)^2/20) at y = 36 is -2 (4) / 20 exp(-16/20) = -0.18, +0.18 at y = 28
        assertThat((double) dy.get(col, north)).isCloseTo(-0.4 * Math.exp(-0.8), within(0.01));
        assertThat((double) dy.get(col, south)).isCloseTo(0.4 * Math.exp(-0.8), within(0.01));
    }
}
