package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Optional;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * A pipe running north-south under east-west survey lines, the geometry surveys are planned for (lines
 * across the cables), with the sensors' altitude wandering along each line so that every line crosses the
 * pipe at its own height. The grid is made from the lines only: the closed-form field of a dense line of
 * dipoles ({@link SyntheticSurvey}, Blakely 1995 forward model) on each sensor track at that track's sensor
 * depth, linear between the tracks. The pipe's analytic-signal crest then changes by a factor of two and more
 * from line to line (a line source's analytic signal falls as 1/r^3), as on the demo survey.
 */
class CrossLinePipeTest {

    static final double SENSOR_DEPTH = 7.0;
    /** Pipe 2.5 m under the mean sensor level: 2 m altitude and 0.5 m burial, like the demo's pipeline. */
    static final double PIPE_BELOW_SENSOR = 2.5;
    static final double PIPE_X = 50;
    /** 90 kg/m of steel: about 0.9 A m2 per metre induced (the demo's truth.csv, moment_per_m_am2). */
    static final double MOMENT_PER_M = 0.9;
    static final double LINE_M = 3.0;
    static final double SENSOR_SEPARATION_M = 1.5;
    static final double WANDER_M = 0.4;
    static final double WANDER_PERIOD_S = 45;
    static final double SPEED_MPS = 2;
    /** Time from the start of one line to the start of the next (line plus turn), s. */
    static final double LINE_TIME_S = 80;
    static final GridGeometry GEO = new GridGeometry(200, 200, 0, 100, 0.5, "EPSG:32631");
    static final GeometryFactory GF = new GeometryFactory();

    static LineString pipe;
    static FieldGrids gridded;
    static TargetResult result;

    @BeforeAll
    static void survey() {
        pipe = GF.createLineString(new Coordinate[] {new Coordinate(PIPE_X, 95), new Coordinate(PIPE_X, 5)});
        SyntheticSurvey s = new SyntheticSurvey(List.of(), List.of(SyntheticSurvey.line(PIPE_X, 95, PIPE_X, 5,
                SENSOR_DEPTH + PIPE_BELOW_SENSOR, MOMENT_PER_M)), SENSOR_DEPTH);
        gridded = fromLines(s);
        result = TargetAnalysis.run(new TargetInputs(gridded, Optional.empty(), LineSamples.NONE, SyntheticSurvey.FIELD,
                49000, Optional.empty(), List.of()), TargetOptions.DEFAULT, Progress.NONE);
        result.notes().forEach(n -> System.out.println("cross-line pipe: note " + n));
        result.features().forEach(f -> System.out.printf("cross-line pipe: feature %d az %.2f len %.1f depth %.2f%n",
                f.id(), f.azimuthDeg(), f.lengthM(), f.depth()));
    }

    /** Sensor depth of line {@code k} at easting {@code x}, m, positive down: east on even lines, west on odd. */
    static double sensorDepth(int k, double x) {
        double along = k % 2 == 0 ? x : GEO.east() - x;
        double t = k * LINE_TIME_S + along / SPEED_MPS;
        // Altitude up means sensor depth down the water column less.
        return SENSOR_DEPTH - WANDER_M * Math.sin(2 * Math.PI * t / WANDER_PERIOD_S);
    }

    /** Northing of the track of line {@code k}, sensor {@code j} (0 port, 1 starboard), m. */
    static double trackY(int k, int j) {
        return k * LINE_M + (j - 0.5) * SENSOR_SEPARATION_M;
    }

    /**
     * T, Tx, Ty, Tz gridded from the tracks: exact on each track, linear in northing between tracks, plus
     * grid noise of 0.02 nT and 0.005 nT/m (as {@link BeadedCableTest}).
     */
    static FieldGrids fromLines(SyntheticSurvey s) {
        java.util.Random rnd = new java.util.Random(53);
        int lines = (int) Math.ceil(GEO.north() / LINE_M) + 1;
        int tracks = 2 * (lines + 1);
        double[] ty = new double[tracks];
        double[][][] v = new double[tracks][4][GEO.columns()];
        for (int k = -1; k < lines; k++) {
            for (int j = 0; j < 2; j++) {
                int n = 2 * (k + 1) + j;
                ty[n] = trackY(k, j);
                for (int c = 0; c < GEO.columns(); c++) {
                    double[] f = s.withGradient(GEO.x(c), ty[n], sensorDepth(k, GEO.x(c)));
                    for (int q = 0; q < 4; q++) {
                        v[n][q][c] = f[q];
                    }
                }
            }
        }
        float[][] out = new float[4][GEO.size()];
        for (int r = 0; r < GEO.rows(); r++) {
            double y = GEO.y(r);
            int n = 0;
            while (ty[n + 1] < y) {
                n++;
            }
            double t = (y - ty[n]) / (ty[n + 1] - ty[n]);
            for (int c = 0; c < GEO.columns(); c++) {
                for (int q = 0; q < 4; q++) {
                    out[q][GEO.index(c, r)] = (float) (v[n][q][c] + t * (v[n + 1][q][c] - v[n][q][c])
                            + rnd.nextGaussian() * (q == 0 ? 0.02 : 0.005));
                }
            }
        }
        return new FieldGrids(Grid.wrap(GEO, out[0]), Grid.wrap(GEO, out[1]), Grid.wrap(GEO, out[2]),
                Grid.wrap(GEO, out[3]));
    }

    @Test
    void theCrestChangesFromLineToLine() {
        // The fixture must carry the line-to-line change of the demo (analytic signal 7 to 40 nT/m along the
        // pipe): the crest on the tracks differs by a factor of 2 or more, or the test would not exercise it.
        Grid as = gridded.analyticSignal();
        double lo = Double.POSITIVE_INFINITY, hi = 0;
        for (int k = 5; k < 28; k++) {
            double v = as.valueAt(PIPE_X, trackY(k, 0));
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        System.out.printf("cross-line pipe: crest max/min on the tracks %.2f%n", hi / lo);
        assertThat(hi / lo).isGreaterThan(2.0);
    }

    @Test
    void thePipeIsOneFeatureAlongItsAzimuth() {
        List<LinearFeature> on = result.features().stream().filter(f -> f.line().getCentroid().distance(pipe) < 2)
                .toList();
        assertThat(on).hasSize(1); // issue 5: one linear feature
        double az = on.get(0).azimuthDeg();
        assertThat(Math.min(az, 180 - az)).isLessThanOrEqualTo(2.0); // issue 5: within 2 degrees of its azimuth (0)
        assertThat(on.get(0).lengthM()).isGreaterThan(0.8 * pipe.getLength()); // most of the modelled 90 m
        assertThat(result.features()).hasSize(1); // nothing else was modelled
        // Reid et al. 1990: SI 2 for a horizontal line source, 2.5 m under the mean sensor level; 20% for the
        // +-0.4 m (16%) altitude wander the grid does not know about.
        assertThat(on.get(0).depth()).isCloseTo(PIPE_BELOW_SENSOR, org.assertj.core.data.Offset.offset(0.5));
    }
}
