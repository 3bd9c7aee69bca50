package org.halyard.survey;

import java.util.ArrayList;
import java.util.List;

/**
 * Builds straight survey lines over a known field for the tests: sensor readings are the field at each
 * sensor's exact position (heading known analytically), plus what the test adds.
 */
final class SyntheticLines {

    interface Field {
        double at(double x, double y, double t);
    }

    record Spec(String id, double x0, double y0, double x1, double y1) {
    }

    private SyntheticLines() {
    }

    /**
     * Lines sampled every {@code dt} s at {@code speed} m/s, run one after another from {@code t0}, with a
     * 60 s turn between lines. Sensors at the given across offsets (along 0).
     */
    static SurveyLines build(List<Spec> specs, double speed, double dt, double t0, double[] across, Field f,
                             double[] lineOffsetNt) {
        List<double[]> cols = new ArrayList<>();
        int n = 0;
        int[] counts = new int[specs.size()];
        for (int l = 0; l < specs.size(); l++) {
            Spec s = specs.get(l);
            double len = Math.hypot(s.x1 - s.x0, s.y1 - s.y0);
            counts[l] = (int) Math.floor(len / (speed * dt)) + 1;
            n += counts[l];
        }
        double[] t = new double[n], x = new double[n], y = new double[n];
        float[] alt = new float[n], dep = new float[n];
        double[][] v = new double[across.length][n];
        int[] start = new int[specs.size() + 1];
        String[] ids = new String[specs.size()];
        int r = 0;
        double tt = t0;
        for (int l = 0; l < specs.size(); l++) {
            Spec s = specs.get(l);
            ids[l] = s.id;
            start[l] = r;
            double len = Math.hypot(s.x1 - s.x0, s.y1 - s.y0);
            double ux = (s.x1 - s.x0) / len, uy = (s.y1 - s.y0) / len;
            // starboard = (cos h, -sin h) with (sin h, cos h) = (ux, uy)
            double stx = uy, sty = -ux;
            for (int k = 0; k < counts[l]; k++, r++) {
                double d = k * speed * dt;
                x[r] = s.x0 + ux * d;
                y[r] = s.y0 + uy * d;
                t[r] = tt;
                alt[r] = 2.0f;
                dep[r] = 20.0f;
                for (int q = 0; q < across.length; q++) {
                    v[q][r] = f.at(x[r] + across[q] * stx, y[r] + across[q] * sty, tt)
                            + (lineOffsetNt != null ? lineOffsetNt[l] : 0);
                }
                tt += dt;
            }
            tt += 60;
        }
        start[specs.size()] = n;
        List<SensorSpec> sensors = new ArrayList<>();
        for (int q = 0; q < across.length; q++) {
            sensors.add(new SensorSpec("mag" + q, across[q], 0));
        }
        return new SurveyLines("synthetic.csv", ids, start, true, t, x, y, alt, dep, sensors, v);
    }

    /** Traverse lines north-south every {@code spacing} m over [0, w] (alternating direction) and tie lines east-west. */
    static List<Spec> grid(double w, double h, double spacing, double[] tieY) {
        List<Spec> s = new ArrayList<>();
        int k = 0;
        for (double x = 0; x <= w + 1e-9; x += spacing, k++) {
            s.add((k & 1) == 0 ? new Spec(String.format("L%03d", k), x, -5, x, h + 5)
                    : new Spec(String.format("L%03d", k), x, h + 5, x, -5));
        }
        for (int j = 0; j < tieY.length; j++) {
            s.add(new Spec("T" + (j + 1), -5, tieY[j], w + 5, tieY[j]));
        }
        return s;
    }
}
