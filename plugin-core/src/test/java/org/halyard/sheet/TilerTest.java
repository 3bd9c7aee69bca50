package org.halyard.sheet;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Area and corridor tiling: coverage and overlap checked point by point. */
class TilerTest {

    @Test
    void areaSheetsCoverEveryPointAndOverlapAsAsked() {
        double[] ext = {1000, 2000, 1950, 2610};
        List<SheetFootprint> s = AreaTiler.tile(ext, 300, 200, 0.1);
        // Fewest sheets n with n w - (n - 1) o >= extent: 950 m wide, w 300, o 30 -> 4; 610 m, w 200, o 20 -> 4.
        assertThat(s).hasSize(16);
        assertThat(s.get(0).number()).isEqualTo(1);
        // Numbered from the north-west corner, west to east first.
        assertThat(s.get(0).north()).isGreaterThan(s.get(4).north());
        assertThat(s.get(1).west()).isGreaterThan(s.get(0).west());
        assertThat(s.get(0).east() - s.get(1).west()).isCloseTo(30, within(1e-9));
        for (double x = ext[0]; x <= ext[2]; x += 7.3) {
            for (double y = ext[1]; y <= ext[3]; y += 5.1) {
                double px = x, py = y;
                assertThat(s).anyMatch(f -> px >= f.west() && px <= f.east() && py >= f.south() && py <= f.north());
            }
        }
    }

    @Test
    void smallAreaGivesOneCentredSheet() {
        List<SheetFootprint> s = AreaTiler.tile(new double[] {0, 0, 100, 50}, 300, 200, 0.1);
        assertThat(s).hasSize(1);
        assertThat(s.get(0).centreX()).isCloseTo(50, within(1e-9));
        assertThat(s.get(0).centreY()).isCloseTo(25, within(1e-9));
    }

    @Test
    void corridorSheetsCoverTheRouteBuffer() {
        Polyline route = new Polyline(new double[] {0, 800, 1200, 1300, 2500},
                new double[] {0, 300, 900, 1500, 1600});
        double hw = 25;
        List<SheetFootprint> s = CorridorTiler.tile(route, hw, 300, 200, 0.1);
        assertThat(s.size()).isGreaterThan(3);
        // Every point of the route, and the corridor square of half-width hw around it, lies on one sheet.
        for (double[] p : CorridorTiler.resample(route, 2.0)) {
            assertThat(s).anyMatch(f -> p[0] - hw >= f.west() - 1e-6 && p[0] + hw <= f.east() + 1e-6
                    && p[1] - hw >= f.south() - 1e-6 && p[1] + hw <= f.north() + 1e-6);
        }
        for (int i = 1; i < s.size(); i++) {
            SheetFootprint a = s.get(i - 1), b = s.get(i);
            boolean overlap = a.west() < b.east() && b.west() < a.east() && a.south() < b.north() && b.south() < a.north();
            assertThat(overlap).as("sheets %d and %d overlap", i, i + 1).isTrue();
        }
    }

    @Test
    void corridorWiderThanTheSheetIsRefused() {
        Polyline route = new Polyline(new double[] {0, 100}, new double[] {0, 0});
        assertThatThrownBy(() -> CorridorTiler.tile(route, 120, 300, 200, 0.1))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("smaller scale");
    }

    @Test
    void fittedScaleIsTheLargestStandardOneThatFits() {
        // 400 m on 300 mm of frame: 1:1000 gives 400 mm (too big), 1:2000 gives 200 mm (fits).
        double frame = 300 * 72 / 25.4;
        assertThat(StandardScales.fit(400, 100, frame, frame)).isEqualTo(2000);
        assertThat(StandardScales.fit(290, 100, frame, frame)).isEqualTo(1000);
        assertThat(StandardScales.parse("1:2500")).isEqualTo(2500);
        assertThat(StandardScales.parse("fit")).isZero();
    }
}
