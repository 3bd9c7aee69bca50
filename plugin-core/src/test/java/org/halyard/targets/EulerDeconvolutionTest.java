package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.halyard.grid.GridGeometry;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.junit.jupiter.api.Test;

class EulerDeconvolutionTest {

    static final GridGeometry GEO = new GridGeometry(80, 80, 0, 40, 0.5, null);

    @Test
    void exactForAnIsolatedDipoleWithStructuralIndexThree() {
        // Thompson 1982 eq. 1: a dipole field is homogeneous of degree -3, so N = 3 recovers its position.
        Dipole d = new Dipole(20.3, 19.6, 13.0, 0.4, -1.1, 2.0); // remanent direction, 3.0 m under the grid
        SyntheticSurvey s = new SyntheticSurvey(List.of(d), 10.0);
        FieldGrids g = s.grids(GEO, 0, 0, 1);
        EulerSolution e = EulerDeconvolution.solve(g, 20, 20, EulerOptions.DISCRETE).orElseThrow();
        assertThat(e.depth()).isCloseTo(3.0, offset(0.03)); // 1%: finite-difference derivatives of the fixture
        assertThat(e.x()).isCloseTo(20.3, offset(0.03));
        assertThat(e.y()).isCloseTo(19.6, offset(0.03));
    }

    @Test
    void recoversAConstantBackground() {
        Dipole d = Dipole.along(20, 20, 13.5, 2, new FieldDirection(66, 1.5));
        SyntheticSurvey s = new SyntheticSurvey(List.of(d), 10.0);
        FieldGrids g = s.grids(GEO, 0, 0, 1);
        FieldGrids shifted = new FieldGrids(offsetBy(g.total(), 5), g.dx(), g.dy(), g.dz());
        EulerSolution e = EulerDeconvolution.solve(shifted, 20, 20, EulerOptions.DISCRETE).orElseThrow();
        assertThat(e.background()).isCloseTo(5, offset(0.05)); // Reid et al. 1990 eq. 2: B is the regional level
        assertThat(e.depth()).isCloseTo(3.5, offset(0.035));
    }

    @Test
    void lineSourceAcrossItsStrikeWithIndexTwo() {
        // An infinite horizontal line of dipoles is homogeneous of degree -2 (Reid et al. 1990, table 1: N = 2).
        SyntheticSurvey s = new SyntheticSurvey(List.of(), List.of(SyntheticSurvey.line(20, -60, 20, 100, 13.0, 0.5)), 10.0);
        FieldGrids g = s.grids(GEO, 0, 0, 1);
        EulerSolution e = EulerDeconvolution.solveAcross(g, 20.5, 20, 0, EulerOptions.LINEAR).orElseThrow();
        assertThat(e.depth()).isCloseTo(3.0, offset(0.06)); // 2%: a line of discrete dipoles 0.5 m apart
        assertThat(e.x()).isCloseTo(20, offset(0.05));
    }

    @Test
    void wrongIndexScalesTheDepth() {
        // Reid et al. 1990: too low a structural index gives too shallow a source.
        Dipole d = Dipole.along(20, 20, 13.0, 2, new FieldDirection(66, 1.5));
        FieldGrids g = new SyntheticSurvey(List.of(d), 10.0).grids(GEO, 0, 0, 1);
        double d3 = EulerDeconvolution.solve(g, 20, 20, EulerOptions.DISCRETE).orElseThrow().depth();
        EulerOptions loose = new EulerOptions(2, List.of(6.0), 1.0, 0.5);
        double d2 = EulerDeconvolution.solve(g, 20, 20, loose).orElseThrow().depth();
        assertThat(d2).isLessThan(d3 * 0.9);
    }

    @Test
    void refusesIndexZero() {
        assertThatThrownBy(() -> EulerOptions.DISCRETE.withStructuralIndex(0))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("structural index");
    }

    static org.halyard.grid.Grid offsetBy(org.halyard.grid.Grid g, float v) {
        float[] a = g.toArray();
        for (int i = 0; i < a.length; i++) {
            a[i] += v;
        }
        return g.withValues(a);
    }
}
