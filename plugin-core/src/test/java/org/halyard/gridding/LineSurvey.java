package org.halyard.gridding;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;

/**
 * A synthetic transverse-gradiometer survey over buried dipoles, for gridding tests: north-south lines,
 * a sensor pair across each line, samples at a fixed along-line step. The field is the exact dipole
 * total-field anomaly (Blakely 1995, eq. 4.13 projected on the field direction), so the truth between lines
 * is known everywhere.
 */
final class LineSurvey {

    /** Earth-field direction of a fictional mid-latitude site (inclination 66 degrees, declination 1.5). */
    static final FieldDirection FIELD = new FieldDirection(66, 1.5);

    final List<Dipole> sources = new ArrayList<>();
    final double x0, x1, y0, y1;

    /** Dipoles at random positions inside the box, depths 1.5 to 3.5 m below the sensors, fixed seed. */
    LineSurvey(double x0, double x1, double y0, double y1, int count, long seed) {
        this.x0 = x0;
        this.x1 = x1;
        this.y0 = y0;
        this.y1 = y1;
        Random rnd = new Random(seed);
        for (int i = 0; i < count; i++) {
            double x = x0 + (x1 - x0) * (0.15 + 0.7 * rnd.nextDouble());
            double y = y0 + (y1 - y0) * (0.15 + 0.7 * rnd.nextDouble());
            double depth = 1.5 + 2 * rnd.nextDouble();
            sources.add(Dipole.along(x, y, depth, 0.5 + 2 * rnd.nextDouble(), FIELD));
        }
    }

    /** Total-field anomaly at sensor level (z = 0), nT. */
    double field(double x, double y) {
        double t = 0;
        for (Dipole d : sources) {
            t += d.totalField(x, y, 0, FIELD);
        }
        return t;
    }

    /** Samples of one sensor track per line at {@code lineX[k]}: x, y, value. */
    double[][] tracks(double[] lineX, double step) {
        int per = (int) Math.floor((y1 - y0) / step) + 1;
        double[] x = new double[lineX.length * per], y = new double[x.length], v = new double[x.length];
        int k = 0;
        for (double lx : lineX) {
            for (int i = 0; i < per; i++, k++) {
                x[k] = lx;
                y[k] = y0 + i * step;
                v[k] = field(x[k], y[k]);
            }
        }
        return new double[][] {x, y, v};
    }

    /** Line positions from {@code x0} to {@code x1} every {@code spacing} metres. */
    double[] lines(double spacing) {
        int n = (int) Math.floor((x1 - x0) / spacing + 1e-9) + 1;
        double[] lx = new double[n];
        for (int i = 0; i < n; i++) {
            lx[i] = x0 + i * spacing;
        }
        return lx;
    }
}
