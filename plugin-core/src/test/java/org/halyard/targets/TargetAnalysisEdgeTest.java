package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.model.Dipole;
import org.junit.jupiter.api.Test;

class TargetAnalysisEdgeTest {

    static final GridGeometry GEO = new GridGeometry(60, 60, 0, 30, 0.5, "EPSG:32631");

    static FieldGrids noise(long seed) {
        Random r = new Random(seed);
        return new FieldGrids(Grid.sample(GEO, (x, y) -> 0.1 * r.nextGaussian()),
                Grid.sample(GEO, (x, y) -> 0.01 * r.nextGaussian()), Grid.sample(GEO, (x, y) -> 0.01 * r.nextGaussian()),
                Grid.sample(GEO, (x, y) -> 0.01 * r.nextGaussian()));
    }

    @Test
    void noPeaksGivesEmptyResultsAndANote() {
        TargetResult r = TargetAnalysis.run(new TargetInputs(noise(1), Optional.empty(), LineSamples.NONE,
                SyntheticSurvey.FIELD, 49000, Optional.empty(), List.of()), TargetOptions.DEFAULT, Progress.NONE);
        assertThat(r.targets()).isEmpty();
        assertThat(r.features()).isEmpty();
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).startsWith("no peaks"));
    }

    @Test
    void withoutBathymetryOrAltitudeBurialIsEmptyAndSaid() {
        SyntheticSurvey s = new SyntheticSurvey(List.of(Dipole.along(15, 15, 20.5, 3, SyntheticSurvey.FIELD)), 17.5);
        TargetResult r = TargetAnalysis.run(new TargetInputs(s.grids(GEO, 0.1, 0.01, 2), Optional.empty(),
                LineSamples.NONE, SyntheticSurvey.FIELD, 49000, Optional.empty(), List.of()), TargetOptions.DEFAULT,
                Progress.NONE);
        assertThat(r.targets()).hasSize(1);
        Target t = r.targets().get(0);
        assertThat(t.burial().metres()).isNaN();
        assertThat(t.depthMethod()).isEqualTo("euler-si3"); // no line samples: no dipole fit
        assertThat(t.mass()).isEmpty();
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).contains("burial left empty"));
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).contains("no dipole fits"));
    }

    @Test
    void cancellationStops() {
        Progress cancelled = new Progress() {
            @Override
            public void report(double percent) {
            }

            @Override
            public boolean isCanceled() {
                return true;
            }
        };
        assertThatThrownBy(() -> TargetAnalysis.run(new TargetInputs(noise(3), Optional.empty(), LineSamples.NONE,
                SyntheticSurvey.FIELD, 49000, Optional.empty(), List.of()), TargetOptions.DEFAULT, cancelled))
                .isInstanceOf(java.util.concurrent.CancellationException.class);
    }

    @Test
    void refusesMismatchedGrids() {
        Grid other = Grid.filled(new GridGeometry(10, 10, 0, 30, 0.5, null), 0);
        Grid g = Grid.filled(GEO, 0);
        assertThatThrownBy(() -> new FieldGrids(g, other, g, g)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("geometry");
    }
}
