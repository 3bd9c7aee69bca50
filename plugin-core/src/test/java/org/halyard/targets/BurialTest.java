package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.junit.jupiter.api.Test;

class BurialTest {

    static final Grid SEABED = Grid.sample(new GridGeometry(10, 10, 0, 10, 1, null), (x, y) -> 20 + 0.1 * x);

    @Test
    void fromTheBathymetry() {
        // Definition: burial = sensor depth + depth below sensor - seabed depth (seabed 20.5 m at x = 5).
        Burial b = Burial.of(SEABED, 5, 5, 3.0, 18.0, Double.NaN);
        assertThat(b.metres()).isCloseTo(18 + 3 - 20.5, offset(1e-6));
        assertThat(b.basis()).isEqualTo("bathymetry");
    }

    @Test
    void fromTheAltitudeOutsideTheGridOrWithoutIt() {
        assertThat(Burial.of(SEABED, 50, 50, 3.0, 18.0, 2.2).metres()).isCloseTo(0.8, offset(1e-12));
        assertThat(Burial.of(null, 5, 5, 3.0, 18.0, 2.2).basis()).isEqualTo("altitude");
    }

    @Test
    void unknownIsEmptyWithAReason() {
        Burial b = Burial.of(null, 5, 5, 3.0, 18.0, Double.NaN);
        assertThat(b.metres()).isNaN();
        assertThat(b.basis()).contains("no bathymetry");
    }
}
