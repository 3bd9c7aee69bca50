package org.halyard.spectral;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;

/**
 * Maps built from measured horizontal gradients of a harmonic field, as a transverse gradiometer gives.
 *
 * <p><b>Algorithm:</b> F(Tz) = -i (kx F(Tx) + ky F(Ty)) / k, z down (the Hilbert-transform pair of
 * Nabighian 1984, Geophysics 49(6) 780-786), each gradient grid prepared by {@link GridSpectrum}.
 *
 * <p><b>Limitations:</b> the two grids must share one geometry; the mean of Tz is not recoverable from
 * horizontal gradients and is taken as zero.
 */
public final class HarmonicGradients {

    private HarmonicGradients() {
    }

    /**
     * The vertical derivative (nT/m, z down: positive where the field grows downwards) from grids of the
     * east and north derivatives (nT/m) on the same geometry.
     */
    public static Grid verticalDerivative(Grid tx, Grid ty, Progress progress) {
        Progress p = Progress.orNone(progress);
        GridGeometry g = tx.geometry();
        if (!g.equals(ty.geometry())) {
            throw new IllegalArgumentException("east and north gradient grids must share one geometry");
        }
        float[] a = GridSpectrum.of(tx, p.slice(0, 25)).filterToArray(Responses.verticalFromEastGradient(), p.slice(25, 50));
        float[] b = GridSpectrum.of(ty, p.slice(50, 75)).filterToArray(Responses.verticalFromNorthGradient(), p.slice(75, 100));
        for (int i = 0; i < a.length; i++) {
            a[i] += b[i];
        }
        return Grid.wrap(g, a);
    }

    /** The analytic-signal amplitude sqrt(Tx^2 + Ty^2 + Tz^2), nT/m, with Tz from {@link #verticalDerivative}. */
    public static Grid analyticSignal(Grid tx, Grid ty, Progress progress) {
        Grid tz = verticalDerivative(tx, ty, progress);
        float[] out = new float[tx.geometry().size()];
        for (int i = 0; i < out.length; i++) {
            double x = tx.get(i), y = ty.get(i), z = tz.get(i);
            out[i] = (float) Math.sqrt(x * x + y * y + z * z);
        }
        return Grid.wrap(tx.geometry(), out);
    }
}
