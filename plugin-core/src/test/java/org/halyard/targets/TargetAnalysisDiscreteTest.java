package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Discrete targets end to end: induced and remanent dipoles at known places (Blakely 1995 forward model),
 * a two-sensor survey (1.5 m apart, lines 3 m apart, 10 Hz), grids sampled from the closed form.
 * Acceptance figures are those of issue 5.
 */
class TargetAnalysisDiscreteTest {

    static final double SENSOR_DEPTH = 17.5;
    static final double SEABED = 20.0;
    static final double FIELD_NT = 49000;

    static List<Dipole> truth;
    static boolean[] induced;
    static double[] peakAs;
    static TargetResult result;

    @BeforeAll
    static void survey() {
        Random rnd = new Random(5);
        truth = new ArrayList<>();
        List<Boolean> ind = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            for (int j = 0; j < 6; j++) {
                double x = 12 + 19 * i + rnd.nextDouble() * 4, y = 12 + 19 * j + rnd.nextDouble() * 4;
                double burial = rnd.nextDouble() * 1.5;
                double moment = Math.exp(Math.log(0.05) + rnd.nextDouble() * Math.log(400));
                boolean isInduced = (i + j) % 2 == 0;
                FieldDirection dir = isInduced ? SyntheticSurvey.FIELD
                        : new FieldDirection(-60 + 120 * rnd.nextDouble(), 360 * rnd.nextDouble());
                truth.add(Dipole.along(x, y, SEABED + burial, moment, dir));
                ind.add(isInduced);
            }
        }
        induced = new boolean[truth.size()];
        for (int i = 0; i < induced.length; i++) {
            induced[i] = ind.get(i);
        }
        SyntheticSurvey s = new SyntheticSurvey(truth, SENSOR_DEPTH);
        GridGeometry geo = new GridGeometry(260, 260, 0, 130, 0.5, "EPSG:32631");
        FieldGrids grids = s.grids(geo, 0.1, 0.03, 11);
        peakAs = new double[truth.size()];
        for (int k = 0; k < truth.size(); k++) {
            Dipole d = truth.get(k);
            double best = 0;
            for (double dx = -1.5; dx <= 1.5; dx += 0.1) {
                for (double dy = -1.5; dy <= 1.5; dy += 0.1) {
                    double[] g = s.withGradient(d.x() + dx, d.y() + dy, SENSOR_DEPTH);
                    best = Math.max(best, Math.sqrt(g[1] * g[1] + g[2] * g[2] + g[3] * g[3]));
                }
            }
            peakAs[k] = best;
        }
        LineSamples lines = s.lines(1.5, 130, 0, 130, 3, 0.1, SEABED - SENSOR_DEPTH, 12);
        Grid bathy = Grid.filled(geo, (float) SEABED);
        result = TargetAnalysis.run(new TargetInputs(grids, Optional.empty(), lines, SyntheticSurvey.FIELD, FIELD_NT,
                Optional.of(bathy), List.of()), TargetOptions.DEFAULT, Progress.NONE);
    }

    /** The discrete target nearest the dipole within 1 m, if any. */
    static Optional<Target> found(Dipole d) {
        return result.targets().stream().filter(t -> t.targetClass() == TargetClass.DISCRETE)
                .filter(t -> Math.hypot(t.x() - d.x(), t.y() - d.y()) <= 1.0)
                .min((a, b) -> Double.compare(Math.hypot(a.x() - d.x(), a.y() - d.y()),
                        Math.hypot(b.x() - d.x(), b.y() - d.y())));
    }

    static List<Integer> eligible() {
        List<Integer> e = new ArrayList<>();
        for (int k = 0; k < truth.size(); k++) {
            if (peakAs[k] > 5 * result.noise().sigma() + result.noise().background()) {
                e.add(k);
            }
        }
        return e;
    }

    @Test
    void recallsTargetsAboveFiveTimesTheNoise() {
        List<Integer> e = eligible();
        long hits = e.stream().filter(k -> found(truth.get(k)).isPresent()).count();
        System.out.printf("recall %d / %d eligible (of %d), %d picks, noise %.4g nT/m%n", hits, e.size(), truth.size(),
                result.targets().size(), result.noise().sigma());
        e.stream().filter(k -> found(truth.get(k)).isEmpty())
                .forEach(k -> System.out.printf("missed %s, peak analytic signal %.3f nT/m%n", truth.get(k), peakAs[k]));
        assertThat(e.size()).isGreaterThan(20); // the fixture must exercise the test (design of the fixture)
        assertThat((double) hits / e.size()).isGreaterThanOrEqualTo(0.95); // issue 5 acceptance
    }

    @Test
    void horizontalAndDepthErrors() {
        List<Double> horiz = new ArrayList<>(), eulerRel = new ArrayList<>(), fitRel = new ArrayList<>();
        for (int k : eligible()) {
            Dipole d = truth.get(k);
            Optional<Target> t = found(d);
            if (t.isEmpty()) {
                continue;
            }
            horiz.add(Math.hypot(t.get().x() - d.x(), t.get().y() - d.y()));
            double trueDepth = d.z() - SENSOR_DEPTH;
            t.get().euler().ifPresent(e -> eulerRel.add(Math.abs(e.depth() - trueDepth) / trueDepth));
            t.get().fit().ifPresent(f -> fitRel.add(Math.abs(f.dipole().z() - d.z()) / trueDepth));
        }
        double mh = median(horiz), me = median(eulerRel), mf = median(fitRel);
        System.out.printf("median horizontal error %.3f m (n=%d); median Euler SI3 depth error %.1f%% (n=%d);"
                + " median fit depth error %.1f%% (n=%d)%n", mh, horiz.size(), 100 * me, eulerRel.size(), 100 * mf,
                fitRel.size());
        assertThat(mh).isLessThanOrEqualTo(0.3); // issue 5 acceptance
        assertThat(me).isLessThanOrEqualTo(0.10); // issue 5 acceptance, Euler SI 3 (Reid et al. 1990)
        assertThat(eulerRel.size()).isGreaterThanOrEqualTo(horiz.size() * 8 / 10); // most picks get a solution
    }

    @Test
    void momentOfIsolatedInducedDipoles() {
        List<Double> rel = new ArrayList<>();
        for (int k : eligible()) {
            Dipole d = truth.get(k);
            // Moments are claimed for picks at 20x the grid noise and more: below that the 0.1 nT line noise
            // of the fixture is a fifth of the anomaly or more and the fit may settle a metre off (design of
            // the fixture; the 5x-noise population is the recall test's).
            if (!induced[k] || peakAs[k] < 20 * result.noise().sigma() + result.noise().background()) {
                continue;
            }
            Optional<Target> t = found(d);
            assertThat(t).as("induced dipole %d found", k).isPresent();
            assertThat(t.get().fit()).as("dipole %d fitted", k).isPresent();
            rel.add(Math.abs(t.get().momentAm2() - d.moment()) / d.moment());
        }
        System.out.printf("moment error: median %.1f%%, max %.1f%% (n=%d)%n", 100 * median(rel),
                100 * rel.stream().mapToDouble(Double::doubleValue).max().orElse(0), rel.size());
        assertThat(rel).allSatisfy(r -> assertThat(r).isLessThanOrEqualTo(0.20)); // issue 5 acceptance
    }

    @Test
    void burialFromTheBathymetry() {
        for (int k : eligible()) {
            Dipole d = truth.get(k);
            found(d).filter(t -> t.fit().isPresent()).ifPresent(t -> {
                assertThat(t.burial().basis()).isEqualTo("bathymetry");
                // Definition (Burial): sensor depth + depth below sensor - seabed; within three standard errors of
                // the fitted depth plus the 0.1 m sensor-depth wobble of the fixture.
                double tol = 3 * t.fit().get().sigmaZ() + 0.1;
                assertThat(t.burial().metres()).isCloseTo(d.z() - SEABED, org.assertj.core.data.Offset.offset(tol));
            });
        }
    }

    static double median(List<Double> v) {
        double[] a = v.stream().mapToDouble(Double::doubleValue).toArray();
        return a.length == 0 ? Double.NaN : NoiseEstimate.median(Arrays.copyOf(a, a.length));
    }
}
