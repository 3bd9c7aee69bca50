package org.halyard.render;

import org.halyard.grid.Grid;

/**
 * A histogram-equalised stretch: each value maps to the fraction of the grid's cells below it, so every
 * ramp colour covers about the same area. Brings out weak anomalies beside strong ones, at the price of
 * a non-linear colour bar (label it so).
 *
 * <p><b>Algorithm:</b> the mid-rank empirical distribution function of the non-blank cells
 * ({@link SampleQuantiles#fractionBelow}); Gonzalez and Woods, Digital Image Processing, 3rd ed., section
 * 3.3.1 (histogram equalisation as the CDF transform).
 *
 * <p><b>Thread safety:</b> immutable.
 */
public final class HistogramStretch implements Stretch {

    private final SampleQuantiles quantiles;

    private HistogramStretch(SampleQuantiles quantiles) {
        this.quantiles = quantiles;
    }

    /** The equalising stretch for the non-blank cells of {@code grid}. */
    public static HistogramStretch of(Grid grid) {
        return new HistogramStretch(SampleQuantiles.of(grid));
    }

    @Override
    public double position(double value) {
        return quantiles.fractionBelow(value);
    }

    @Override
    public double value(double t) {
        return quantiles.at(t);
    }

    @Override
    public String label() {
        return "histogram-equalised";
    }
}
