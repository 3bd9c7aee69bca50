package org.halyard.gridding;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.spectral.HarmonicGradients;

/**
 * The analytic signal from measured horizontal gradients: the east and north gradients of the line data
 * are gridded, the vertical gradient follows from the harmonic relation, and the three combine.
 *
 * <p><b>Algorithm:</b> Tx and Ty are gridded each by {@link SplineGridder} with the same options;
 * Tz comes from {@code F(Tz) = -i (kx F(Tx) + ky F(Ty)) / k} (DOMAIN.md; Nabighian 1984) through the one
 * wavenumber engine, {@link HarmonicGradients}; the amplitude is {@code sqrt(Tx^2 + Ty^2 + Tz^2)}
 * (Roest, Verhoef and Pilkington 1992, Geophysics 57(1) 116-125). Measured gradients keep short
 * wavelengths across lines that differentiating a gridded total field smooths away, so the two analytic
 * signals are worth comparing side by side.
 *
 * <p><b>Accuracy:</b> that of the gradient grids; Tz has no mean (it is not recoverable from horizontal
 * gradients) and carries the wavenumber engine's edge effects near blanks.
 *
 * <p><b>Limitations:</b> gradients must be in the map frame (east, north), not along and across the line.
 *
 * <p><b>Thread safety:</b> stateless; calls may run concurrently.
 *
 * @param tx        gridded east gradient, nT/m
 * @param ty        gridded north gradient, nT/m (towards northing, not rows)
 * @param amplitude analytic-signal amplitude, nT/m, non-negative
 */
public record MeasuredGradientAnalyticSignal(Grid tx, Grid ty, Grid amplitude) {

    /**
     * Grids the gradients and derives the amplitude (Tz itself: {@link HarmonicGradients#verticalDerivative}).
     *
     * @param gradients gradient samples in the map frame, nT/m
     * @param geometry  the output grid (row 0 north)
     * @param options   spline options for both gradient grids; null for {@link GriddingOptions#defaults()}
     * @param progress  0-100 and cancellation; null for none
     */
    public static MeasuredGradientAnalyticSignal compute(GradientSamples gradients, GridGeometry geometry,
                                                         GriddingOptions options, Progress progress) {
        Progress p = Progress.orNone(progress);
        Grid tx = SplineGridder.grid(gradients.x(), gradients.y(), gradients.gx(), geometry, options, p.slice(0, 40))
                .grid();
        Grid ty = SplineGridder.grid(gradients.x(), gradients.y(), gradients.gy(), geometry, options, p.slice(40, 80))
                .grid();
        return new MeasuredGradientAnalyticSignal(tx, ty, HarmonicGradients.analyticSignal(tx, ty, p.slice(80, 100)));
    }
}
