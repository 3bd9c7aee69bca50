package org.halyard.render;

/**
 * Maps a grid value (in the grid's unit: nT, nT/m, degrees, metres) to a ramp position in [0, 1].
 *
 * <p>Implementations: {@link LinearStretch} and {@link HistogramStretch}. A {@code NaN} value (a blank)
 * maps to {@code NaN}, which the ramps draw transparent. Implementations are immutable.
 */
public interface Stretch {

    /** The ramp position of {@code value}, clamped to [0, 1]; {@code NaN} for a blank. */
    double position(double value);

    /** The value at ramp position {@code t} in [0, 1] (for colour-bar labels), in the grid's unit. */
    double value(double t);

    /** A short label for menus and legends, such as "linear 2-98%". */
    String label();
}
