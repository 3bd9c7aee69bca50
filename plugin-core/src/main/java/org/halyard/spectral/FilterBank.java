package org.halyard.spectral;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;

/**
 * Runs any {@link FilterOperation} on one grid, transforming the grid once and keeping the first
 * derivatives that several maps share (analytic signal, horizontal gradient, tilt).
 *
 * <p>Definitions (x east, y north, z down, T in nT):
 * <ul>
 *   <li>Tx, Ty: {@code i kx}, {@code i ky} in the wavenumber domain; Tz: {@code k} (first vertical
 *       derivative, positive where the field increases downwards) (Blakely 1995, ch. 12);</li>
 *   <li>total horizontal gradient {@code sqrt(Tx^2 + Ty^2)}, nT/m;</li>
 *   <li>analytic signal {@code sqrt(Tx^2 + Ty^2 + Tz^2)}, nT/m (Roest, Verhoef and Pilkington 1992);</li>
 *   <li>tilt {@code atan2(Tz, sqrt(Tx^2 + Ty^2))} in degrees, -90 to 90 (Miller and Singh 1994);</li>
 *   <li>horizontal derivative of the tilt: central differences of the tilt grid, degrees/m
 *       (Verduzco et al. 2004, The Leading Edge 23(2)).</li>
 * </ul>
 *
 * <p><b>Thread safety:</b> not thread-safe (lazy caches); use one bank per thread.
 */
public final class FilterBank {

    private final Grid grid;
    private final FilterSettings settings;
    private GridSpectrum spectrum;
    private float[] tx, ty, tz;

    /** A bank over {@code grid} (values in nT, projected CRS in metres). */
    public FilterBank(Grid grid, FilterSettings settings) {
        this.grid = grid;
        this.settings = settings;
    }

    /** Runs {@code op}; the result's unit is {@link FilterOperation#unit()}. */
    public Grid apply(FilterOperation op, Progress progress) {
        Progress p = Progress.orNone(progress);
        GridGeometry g = grid.geometry();
        return switch (op) {
            case REDUCE_TO_POLE -> single(Responses.reductionToPole(requireField(), settings.magnetisationOrField(),
                    settings.stabilisingInclinationDeg()), p);
            case UPWARD -> single(Responses.upward(settings.heightM()), p);
            case DOWNWARD -> single(Responses.downward(settings.heightM(), settings.damping()), p);
            case VERTICAL_DERIVATIVE -> settings.order() == 1 ? Grid.of(g, tz(p)) : single(Responses.verticalDerivative(settings.order()), p);
            case DX -> Grid.of(g, tx(p));
            case DY -> Grid.of(g, ty(p));
            case TOTAL_HORIZONTAL_GRADIENT -> Grid.wrap(g, combine(tx(p.slice(0, 50)), ty(p.slice(50, 100)), null, Combination.NORM));
            case ANALYTIC_SIGNAL -> Grid.wrap(g, combine(tx(p.slice(0, 40)), ty(p.slice(40, 70)), tz(p.slice(70, 100)), Combination.NORM));
            case TILT -> Grid.wrap(g, tilt(p));
            case TILT_HORIZONTAL_DERIVATIVE -> Grid.wrap(g, HorizontalGradient.centralDifferenceNorm(tilt(p), g));
        };
    }

    private float[] tilt(Progress p) {
        return combine(tx(p.slice(0, 40)), ty(p.slice(40, 70)), tz(p.slice(70, 100)), Combination.TILT);
    }

    private enum Combination { NORM, TILT }

    private static float[] combine(float[] a, float[] b, float[] c, Combination how) {
        float[] out = new float[a.length];
        for (int i = 0; i < a.length; i++) {
            double h2 = (double) a[i] * a[i] + (double) b[i] * b[i];
            out[i] = switch (how) {
                case NORM -> (float) Math.sqrt(h2 + (c == null ? 0 : (double) c[i] * c[i]));
                case TILT -> (float) Math.toDegrees(Math.atan2(c[i], Math.sqrt(h2)));
            };
        }
        return out;
    }

    private Grid single(WavenumberResponse r, Progress p) {
        return spectrum(p.slice(0, 50)).filter(r, p.slice(50, 100));
    }

    private GridSpectrum spectrum(Progress p) {
        if (spectrum == null) {
            spectrum = GridSpectrum.of(grid, settings.padFactor(), p);
        }
        p.report(100);
        return spectrum;
    }

    private float[] tx(Progress p) {
        if (tx == null) {
            tx = spectrum(p.slice(0, 50)).filterToArray(Responses.dx(), p.slice(50, 100));
        }
        return tx;
    }

    private float[] ty(Progress p) {
        if (ty == null) {
            ty = spectrum(p.slice(0, 50)).filterToArray(Responses.dy(), p.slice(50, 100));
        }
        return ty;
    }

    private float[] tz(Progress p) {
        if (tz == null) {
            tz = spectrum(p.slice(0, 50)).filterToArray(Responses.verticalDerivative(1), p.slice(50, 100));
        }
        return tz;
    }

    private org.halyard.model.FieldDirection requireField() {
        if (settings.field() == null) {
            throw new IllegalArgumentException("reduction to the pole needs the field direction: give "
                    + "--inclination and --declination (degrees)");
        }
        return settings.field();
    }
}
