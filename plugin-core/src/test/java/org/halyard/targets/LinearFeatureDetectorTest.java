package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Random;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.util.GeometricShapeFactory;

/**
 * The ridge tracer on synthetic ridges: a Gaussian profile across a known centre line (the shape of an
 * analytic-signal ridge over a line source, to first order) plus Gaussian noise.
 */
class LinearFeatureDetectorTest {

    static final GridGeometry GEO = new GridGeometry(240, 200, 0, 100, 0.5, null);
    static final GeometryFactory GF = new GeometryFactory();

    static Grid ridge(LineString centre, double width, long seed, double gapFrom, double gapTo) {
        Random rnd = new Random(seed);
        return Grid.sample(GEO, (x, y) -> {
            var p = GF.createPoint(new Coordinate(x, y));
            double d = centre.distance(p);
            double along = new org.locationtech.jts.linearref.LengthIndexedLine(centre).project(p.getCoordinate());
            double a = along > gapFrom && along < gapTo ? 0 : Math.exp(-d * d / (width * width));
            return a + 0.01 * rnd.nextGaussian();
        });
    }

    static LineString arc() {
        // An arc of radius 150 m spanning 25 degrees: about 65 m long, 3.6 m of sagitta ("gently curved").
        GeometricShapeFactory f = new GeometricShapeFactory(GF);
        f.setCentre(new Coordinate(60, -100));
        f.setSize(300);
        f.setNumPoints(200);
        return f.createArc(Math.toRadians(77.5), Math.toRadians(25));
    }

    @Test
    void aGentlyCurvedRidgeIsOneFeatureThatFollowsIt() {
        LineString truth = arc();
        List<LinearFeature> f = LinearFeatureDetector.detect(ridge(truth, 1.5, 1, -1, -1), LinearFeatureOptions.DEFAULT,
                Progress.NONE);
        assertThat(f).hasSize(1);
        // Every vertex within one cell of the true centre line, and most of the length found.
        for (Coordinate c : f.get(0).line().getCoordinates()) {
            assertThat(truth.distance(GF.createPoint(c))).isLessThan(0.5);
        }
        assertThat(f.get(0).lengthM()).isGreaterThan(0.9 * truth.getLength());
    }

    @Test
    void aGapIsBridged() {
        LineString truth = GF.createLineString(new Coordinate[] {new Coordinate(10, 20), new Coordinate(100, 80)});
        List<LinearFeature> f = LinearFeatureDetector.detect(ridge(truth, 1.5, 2, 40, 45),
                LinearFeatureOptions.DEFAULT, Progress.NONE);
        assertThat(f).hasSize(1);
        assertThat(f.get(0).lengthM()).isGreaterThan(0.9 * truth.getLength());
    }

    @Test
    void roundPeaksAreNoFeature() {
        Random rnd = new Random(4);
        Grid g = Grid.sample(GEO, (x, y) -> {
            double s = 0;
            for (double cx = 10; cx < 120; cx += 15) {
                for (double cy = 10; cy < 100; cy += 15) {
                    double r2 = (x - cx) * (x - cx) + (y - cy) * (y - cy);
                    s += Math.pow(1 + r2 / 9, -2.5); // analytic-signal shape of a pole 3 m down (Roest et al. 1992)
                }
            }
            return s + 0.005 * rnd.nextGaussian();
        });
        assertThat(LinearFeatureDetector.detect(g, LinearFeatureOptions.DEFAULT, Progress.NONE)).isEmpty();
    }
}
