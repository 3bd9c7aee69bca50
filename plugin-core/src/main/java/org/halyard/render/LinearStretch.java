package org.halyard.render;

import org.halyard.grid.Grid;

/**
 * A linear stretch: {@code low} maps to 0, {@code high} to 1, values beyond are clamped.
 *
 * @param low   value drawn with the first ramp colour, in the grid's unit
 * @param high  value drawn with the last ramp colour, in the grid's unit; greater than {@code low}
 * @param label how the limits were chosen, for legends
 */
public record LinearStretch(double low, double high, String label) implements Stretch {

    public LinearStretch {
        if (!(high > low) || Double.isInfinite(low) || Double.isInfinite(high)) {
            throw new IllegalArgumentException("stretch limits must be finite with high > low, got "
                    + low + " .. " + high);
        }
    }

    /** Minimum to maximum of the non-blank cells; a flat or blank grid gets a unit-wide range. */
    public static LinearStretch minMax(Grid grid) {
        double[] r = grid.range();
        return widen(r[0], r[1], "linear min-max");
    }

    /**
     * Between two percentiles of the non-blank cells, for example 2 and 98, so that a few spikes do not
     * flatten the picture. Percentiles by {@link SampleQuantiles} (nearest rank).
     */
    public static LinearStretch percentiles(Grid grid, double lowPercent, double highPercent) {
        SampleQuantiles q = SampleQuantiles.of(grid);
        return widen(q.at(lowPercent / 100), q.at(highPercent / 100),
                String.format(java.util.Locale.ROOT, "linear %.0f-%.0f%%", lowPercent, highPercent));
    }

    /**
     * Symmetric about zero, {@code -m .. +m} with {@code m} the {@code percent} percentile of |value|,
     * so that zero lands on the centre of a diverging ramp.
     */
    public static LinearStretch symmetric(Grid grid, double percent) {
        float[] v = grid.toArray();
        for (int i = 0; i < v.length; i++) {
            v[i] = Math.abs(v[i]);
        }
        double m = SampleQuantiles.of(v).at(percent / 100);
        return widen(-m, m, String.format(java.util.Locale.ROOT, "symmetric %.0f%%", percent));
    }

    private static LinearStretch widen(double lo, double hi, String label) {
        if (Double.isNaN(lo) || Double.isNaN(hi)) {
            return new LinearStretch(0, 1, label);
        }
        if (!(hi > lo)) {
            double half = Math.max(0.5, Math.abs(lo) * 1e-6);
            return new LinearStretch(lo - half, hi + half, label);
        }
        return new LinearStretch(lo, hi, label);
    }

    @Override
    public double position(double value) {
        if (Double.isNaN(value)) {
            return Double.NaN;
        }
        return Math.max(0, Math.min(1, (value - low) / (high - low)));
    }

    @Override
    public double value(double t) {
        return low + t * (high - low);
    }
}
