package org.halyard.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.junit.jupiter.api.Test;

class HillshadeTest {

    private static final GridGeometry G = new GridGeometry(9, 9, 1000, 5000, 2, "EPSG:32631");

    @Test
    void aSlopeFacingTheSunIsBrighterThanOneFacingAway() {
        // z rises to the east, so the slope faces west: lit from the west (270) it must be brighter than lit
        // from the east (90). Azimuth is clockwise from north (SunPosition).
        Grid eastRising = Grid.sample(G, (x, y) -> 0.5 * x);
        double west = centre(eastRising, new SunPosition(270, 40));
        double east = centre(eastRising, new SunPosition(90, 40));
        assertThat(west).isGreaterThan(east + 0.3);

        // z rises to the north, so the slope faces south (row 0 is north: a sign slip would swap these)
        Grid northRising = Grid.sample(G, (x, y) -> 0.5 * y);
        assertThat(centre(northRising, new SunPosition(180, 40)))
                .isGreaterThan(centre(northRising, new SunPosition(0, 40)) + 0.3);
    }

    @Test
    void planeShadeEqualsLambertsCosine() {
        // Lambert's cosine law with the plane's exact normal (Horn 1981 differences are exact on a plane):
        // z = 0.5 y has normal (0, -0.5, 1)/sqrt(1.25); the sun at azimuth 180, elevation 45 is
        // (0, -cos 45, sin 45); the dot product is (0.5 cos 45 + sin 45)/sqrt(1.25).
        Grid northRising = Grid.sample(G, (x, y) -> 0.5 * y);
        double expected = (0.5 * Math.cos(Math.PI / 4) + Math.sin(Math.PI / 4)) / Math.sqrt(1.25);
        assertThat(centre(northRising, new SunPosition(180, 45))).isCloseTo(expected, within(1e-6));
        // flat ground: shade is sin(elevation) whatever the azimuth (same law)
        Grid flat = Grid.filled(G, 3f);
        assertThat(centre(flat, new SunPosition(123, 30))).isCloseTo(0.5, within(1e-9));
    }

    @Test
    void zFactorSteepensTheRelief() {
        // Exaggerating relief turns a lit slope further towards or away from the sun: facing away gets darker.
        Grid eastRising = Grid.sample(G, (x, y) -> 0.1 * x);
        double[] sun = new SunPosition(90, 40).towardsSun();
        assertThat(Hillshade.shadeAt(eastRising, 4, 4, 1, sun, 5))
                .isLessThan(Hillshade.shadeAt(eastRising, 4, 4, 1, sun, 1));
    }

    @Test
    void blankCellsStayBlankAndNeighboursStayFinite() {
        float[] v = Grid.sample(G, (x, y) -> x + y).toArray();
        v[G.index(4, 4)] = Float.NaN;
        float[] s = Hillshade.shade(Grid.of(G, v), SunPosition.NORTH_WEST, 1);
        assertThat(s[G.index(4, 4)]).isNaN();
        assertThat(s[G.index(5, 4)]).isBetween(0f, 1f);
        assertThat(s[G.index(0, 0)]).isBetween(0f, 1f);
    }

    private static double centre(Grid g, SunPosition sun) {
        return Hillshade.shade(g, sun, 1)[g.geometry().index(4, 4)];
    }
}
