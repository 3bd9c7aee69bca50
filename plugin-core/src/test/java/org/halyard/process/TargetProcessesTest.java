package org.halyard.process;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import java.util.Map;
import org.geotools.api.feature.simple.SimpleFeature;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.data.simple.SimpleFeatureIterator;
import org.geotools.data.util.DefaultProgressListener;
import org.geotools.feature.NameImpl;
import org.geotools.process.Processors;
import org.halyard.grid.GridGeometry;
import org.halyard.io.GeoTiffGrids;
import org.halyard.model.Dipole;
import org.halyard.targets.FieldGrids;
import org.halyard.targets.SyntheticSurvey;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;

/** The three target processes through the GeoTools process API, on closed-form fields (Blakely 1995). */
class TargetProcessesTest {

    static final GridGeometry GEO = new GridGeometry(120, 120, 500000, 5800060, 0.5, "EPSG:32631");
    static final Dipole D = Dipole.along(500020.3, 5800040.2, 20.5, 2, SyntheticSurvey.FIELD);
    static FieldGrids grids;
    static SyntheticSurvey survey;

    @BeforeAll
    static void fields() {
        survey = new SyntheticSurvey(List.of(D), List.of(SyntheticSurvey.line(500010, 5800005, 500055, 5800025, 21,
                0.5)), 17.5);
        grids = survey.grids(GEO, 0.05, 0.005, 4);
    }

    static List<SimpleFeature> run(String name, Map<String, Object> in, DefaultProgressListener l) {
        Map<String, Object> out = Processors.createProcess(new NameImpl("halyard", name)).execute(in, l);
        assertThat(l.isCompleted()).as(name + " completes its listener").isTrue();
        List<SimpleFeature> rows = new java.util.ArrayList<>();
        try (SimpleFeatureIterator it = ((SimpleFeatureCollection) out.get("result")).features()) {
            while (it.hasNext()) {
                rows.add(it.next());
            }
        }
        return rows;
    }

    @Test
    void peakPickingFindsTheDipole() {
        List<SimpleFeature> rows = run("PeakPicking", Map.of("data", GeoTiffGrids.toCoverage(grids.analyticSignal(), "as")),
                new DefaultProgressListener());
        // The closed-form analytic-signal maximum (Roest et al. 1992), found by a 2 cm search: for an inclined
        // induced dipole it lies a little off the source, so the picker is judged against it.
        double bx = 0, by = 0, best = 0;
        for (double x = D.x() - 1; x <= D.x() + 1; x += 0.02) {
            for (double y = D.y() - 1; y <= D.y() + 1; y += 0.02) {
                double[] g = survey.withGradient(x, y, 17.5);
                double a = Math.sqrt(g[1] * g[1] + g[2] * g[2] + g[3] * g[3]);
                if (a > best) {
                    best = a;
                    bx = x;
                    by = y;
                }
            }
        }
        org.locationtech.jts.geom.Coordinate truth = new org.locationtech.jts.geom.Coordinate(bx, by);
        double nearest = rows.stream().mapToDouble(f -> ((Geometry) f.getDefaultGeometry()).getCoordinate()
                .distance(truth)).min().orElseThrow();
        System.out.printf("analytic-signal peak %.3f m from the source; pick %.3f m from the peak%n",
                truth.distance(new org.locationtech.jts.geom.Coordinate(D.x(), D.y())), nearest);
        assertThat(nearest).isLessThan(0.05); // PeakPicker accuracy: a tenth of the 0.5 m cell (our claim)
    }

    @Test
    void eulerGivesTheDipoleDepth() {
        List<SimpleFeature> rows = run("EulerDeconvolution", Map.of(
                "total", GeoTiffGrids.toCoverage(grids.total(), "t"), "dx", GeoTiffGrids.toCoverage(grids.dx(), "dx"),
                "dy", GeoTiffGrids.toCoverage(grids.dy(), "dy"), "dz", GeoTiffGrids.toCoverage(grids.dz(), "dz")),
                new DefaultProgressListener());
        SimpleFeature near = rows.stream().filter(f -> ((Geometry) f.getDefaultGeometry()).getCoordinate()
                .distance(new org.locationtech.jts.geom.Coordinate(D.x(), D.y())) < 0.5).findFirst().orElseThrow();
        // Thompson 1982: SI 3 is exact for a dipole; 3.0 m under the grid level, within issue 5's 10%.
        assertThat((Double) near.getAttribute("depth_m")).isCloseTo(3.0, offset(0.3));
    }

    @Test
    void linearFeaturesFindTheCable() {
        List<SimpleFeature> rows = run("LinearFeatures", Map.of("data", GeoTiffGrids.toCoverage(grids.analyticSignal(), "as")),
                new DefaultProgressListener());
        assertThat(rows).hasSize(1);
        assertThat(rows.get(0).getDefaultGeometry()).isInstanceOf(LineString.class);
        double az = Math.toDegrees(Math.atan2(45, 20)); // the modelled cable's azimuth, from its end points
        assertThat((Double) rows.get(0).getAttribute("azimuth_deg")).isCloseTo(az, offset(2.0)); // issue 5
    }
}
