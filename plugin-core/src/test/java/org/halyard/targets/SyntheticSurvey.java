package org.halyard.targets;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.model.Dipole;
import org.halyard.model.DipoleLine;
import org.halyard.model.FieldDirection;

/**
 * Test fixture: a survey over a set of point dipoles (Blakely 1995 forward model, {@link Dipole}), as
 * grids sampled from the closed form at the sensor level and as line samples of a two-sensor array.
 * Derivatives are central differences of the closed form (step 1 cm), adequate to 1e-5 relative for
 * sources metres away (Taylor remainder of order h^2 / r^2).
 */
public final class SyntheticSurvey {

    public static final FieldDirection FIELD = new FieldDirection(66, 1.5);
    static final double STEP = 0.01;
    /** Sources farther than this from a point are left out of its sum, m (their field is below 1e-4 nT). */
    static final double CUTOFF = 40;

    final List<Dipole> sources;
    final List<DipoleLine> lines;
    final double sensorDepth;

    public SyntheticSurvey(List<Dipole> sources, double sensorDepth) {
        this(sources, List.of(), sensorDepth);
    }

    /** Point dipoles and lines of dipoles (cables, pipes; DOMAIN.md) under sensors at {@code sensorDepth}. */
    public SyntheticSurvey(List<Dipole> sources, List<DipoleLine> lines, double sensorDepth) {
        this.sources = List.copyOf(sources);
        this.lines = List.copyOf(lines);
        this.sensorDepth = sensorDepth;
    }

    double total(double x, double y, double z) {
        return total(x, y, z, near(x, y));
    }

    /** The sources within the cutoff of (x, y): chosen once per point so that differences stay smooth. */
    List<Dipole> near(double x, double y) {
        return sources.stream().filter(d -> Math.abs(d.x() - x) < CUTOFF && Math.abs(d.y() - y) < CUTOFF).toList();
    }

    double total(double x, double y, double z, List<Dipole> near) {
        double t = 0;
        for (DipoleLine l : lines) {
            t += l.totalField(x, y, z, FIELD);
        }
        for (Dipole d : near) {
            t += d.totalField(x, y, z, FIELD);
        }
        return t;
    }

    /** {T, Tx, Ty, Tz} at a point, nT and nT/m, z down. */
    public double[] withGradient(double x, double y, double z) {
        List<Dipole> n = near(x, y);
        return new double[] {total(x, y, z, n),
            (total(x + STEP, y, z, n) - total(x - STEP, y, z, n)) / (2 * STEP),
            (total(x, y + STEP, z, n) - total(x, y - STEP, z, n)) / (2 * STEP),
            (total(x, y, z + STEP, n) - total(x, y, z - STEP, n)) / (2 * STEP)};
    }

    /** Grids at the sensor level with Gaussian noise of {@code noiseT} nT and {@code noiseG} nT/m. */
    public FieldGrids grids(GridGeometry geo, double noiseT, double noiseG, long seed) {
        Random rnd = new Random(seed);
        float[][] v = new float[4][geo.size()];
        for (int r = 0; r < geo.rows(); r++) {
            for (int c = 0; c < geo.columns(); c++) {
                double[] g = withGradient(geo.x(c), geo.y(r), sensorDepth);
                int i = geo.index(c, r);
                for (int k = 0; k < 4; k++) {
                    v[k][i] = (float) (g[k] + rnd.nextGaussian() * (k == 0 ? noiseT : noiseG));
                }
            }
        }
        return new FieldGrids(Grid.wrap(geo, v[0]), Grid.wrap(geo, v[1]), Grid.wrap(geo, v[2]), Grid.wrap(geo, v[3]));
    }

    /**
     * North-south lines {@code lineSpacing} apart over [x0, x1] x [y0, y1], two sensors 1.5 m apart across
     * the track, 10 Hz at 2 m/s (0.2 m along), sensor depth wobbling by 0.1 m, noise {@code noiseT} nT,
     * altitude {@code altitude} m.
     */
    LineSamples lines(double x0, double x1, double y0, double y1, double lineSpacing, double noiseT,
                      double altitude, long seed) {
        Random rnd = new Random(seed);
        List<double[]> rows = new ArrayList<>();
        for (double lx = x0; lx <= x1; lx += lineSpacing) {
            for (double y = y0; y <= y1; y += 0.2) {
                double z = sensorDepth + 0.1 * Math.sin(y / 7.0);
                for (double off : new double[] {-0.75, 0.75}) {
                    double x = lx + off;
                    rows.add(new double[] {x, y, z, total(x, y, z) + rnd.nextGaussian() * noiseT,
                        altitude + sensorDepth - z});
                }
            }
        }
        double[][] cols = new double[5][rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            for (int k = 0; k < 5; k++) {
                cols[k][i] = rows.get(i)[k];
            }
        }
        return new LineSamples(cols[0], cols[1], cols[2], cols[3], cols[4]);
    }

    /** A straight cable or pipe of induced dipoles every 0.5 m (DOMAIN.md), as {@link DipoleLine}: below a
     *  third of the 3 m sensor distance, as its javadoc asks. */
    public static DipoleLine line(double xa, double ya, double xb, double yb, double depth, double momentPerMetre) {
        return new DipoleLine(new double[] {xa, ya, depth, xb, yb, depth}, momentPerMetre, FIELD, 0.5);
    }
}
