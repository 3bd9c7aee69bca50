package org.halyard.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

class TrackPositioningTest {

    @Test
    void sensorPositionsOnACircularTurn() {
        // A clockwise (starboard) turn of radius 50 m about (1000, 2000) at 0.2 m per sample.
        double r = 50, cx = 1000, cy = 2000, step = 0.2 / r;
        int n = 1200;
        double[] x = new double[n], y = new double[n], t = new double[n];
        for (int i = 0; i < n; i++) {
            double a = i * step; // polar angle measured clockwise from north about the centre
            x[i] = cx + r * Math.sin(a - Math.PI / 2);
            y[i] = cy + r * Math.cos(a - Math.PI / 2);
            t[i] = i * 0.1;
        }
        SurveyLines lines = new SurveyLines("circle", new String[] {"C"}, new int[] {0, n}, true, t, x, y,
                new float[n], new float[n], List.of(new SensorSpec("s", 0.75, -2.0)), new double[][] {new double[n]});
        double[] d = new double[n];
        float[] h = new float[n];
        TrackPositioning.compute(lines, 10, d, h);
        // distance: sum of chords 2 r sin(step/2) (geometry)
        assertThat(d[n - 1]).isCloseTo((n - 1) * 2 * r * Math.sin(step / 2), within(1e-6));
        double[] sx = new double[n], sy = new double[n];
        TrackPositioning.offset(x, y, h, 0.75, -2.0, sx, sy);
        for (int i = 50; i < n - 50; i++) {
            // exact heading of a clockwise circle: tangent, polar angle + 0 (moving east at the west point)
            double heading = Math.toDegrees(i * step);
            double diff = ((h[i] - heading) % 360 + 540) % 360 - 180;
            assertThat(diff).as("heading at %d", i).isCloseTo(0, within(1e-3)); // float storage, degrees
            // starboard faces the centre on a clockwise turn: radius r - 0.75 across, and 2 m behind
            // along the tangent, so distance to centre is hypot(r - 0.75, 2) (geometry)
            assertThat(Math.hypot(sx[i] - cx, sy[i] - cy)).isCloseTo(Math.hypot(r - 0.75, 2.0), within(1e-3));
        }
    }

    @Test
    void straightLineOffsetsFollowTheConvention() {
        // heading east (90 deg): along = (1, 0), starboard = (0, -1) (DOMAIN.md convention)
        int n = 200;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 0.2;
        }
        SurveyLines lines = new SurveyLines("east", new String[] {"E"}, new int[] {0, n}, true, x.clone(), x, y,
                new float[n], new float[n], List.of(new SensorSpec("s", 1, 0)), new double[][] {new double[n]});
        double[] d = new double[n];
        float[] h = new float[n];
        TrackPositioning.compute(lines, 10, d, h);
        double[] sx = new double[n], sy = new double[n];
        TrackPositioning.offset(x, y, h, 1.0, 3.0, sx, sy);
        assertThat(h[100]).isEqualTo(90f);
        assertThat(sx[100]).isCloseTo(x[100] + 3, within(1e-9));
        assertThat(sy[100]).isCloseTo(-1, within(1e-9));
    }
}
