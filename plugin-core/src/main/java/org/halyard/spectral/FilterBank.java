package org.halyard.spectral;

import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.GridRows;
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
 * <p><b>Memory:</b> a bank made by {@link #once} runs one operation and lets its last transform back
 * work in the spectrum's own array ({@link GridSpectrum#filterConsuming}), so a single filter of an
 * {@code n x n} grid needs one array of about {@code 1.5 n^2} floats and nothing else of the grid's size.
 *
 * <p><b>Thread safety:</b> not thread-safe (lazy caches); use one bank per thread.
 */
public final class FilterBank {

    private final GridRows grid;
    private final FilterSettings settings;
    private final boolean once;
    private boolean applied;
    private GridSpectrum spectrum;
    private Grid tx, ty, tz;

    /** A bank over {@code grid} (values in nT, projected CRS in metres) for any number of operations. */
    public FilterBank(Grid grid, FilterSettings settings) {
        this(grid, settings, false);
    }

    private FilterBank(GridRows grid, FilterSettings settings, boolean once) {
        this.grid = grid;
        this.settings = settings;
        this.once = once;
    }

    /**
     * A bank for a single {@link #apply} over rows that are read once, such as a file read straight into
     * the transform (values in nT, projected CRS in metres).
     */
    public static FilterBank once(GridRows source, FilterSettings settings) {
        return new FilterBank(source, settings, true);
    }

    /**
     * Runs {@code op}; the result's unit is {@link FilterOperation#unit()}.
     *
     * @throws IllegalStateException when a bank made by {@link #once} is applied a second time
     */
    public Grid apply(FilterOperation op, Progress progress) {
        if (once && applied) {
            throw new IllegalStateException("a single-use filter bank was applied twice");
        }
        applied = true;
        Progress p = Progress.orNone(progress);
        GridGeometry g = grid.geometry();
        return switch (op) {
            case REDUCE_TO_POLE -> single(Responses.reductionToPole(requireField(), settings.magnetisationOrField(),
                    settings.stabilisingInclinationDeg()), p);
            case UPWARD -> single(Responses.upward(settings.heightM()), p);
            case DOWNWARD -> single(Responses.downward(settings.heightM(), settings.damping()), p);
            case VERTICAL_DERIVATIVE -> settings.order() == 1 ? tz(p, true) : single(Responses.verticalDerivative(settings.order()), p);
            case DX -> tx(p, true);
            case DY -> ty(p, true);
            case TOTAL_HORIZONTAL_GRADIENT -> Grid.wrap(g, combine(tx(p.slice(0, 50), false), ty(p.slice(50, 100), true), null, Combination.NORM));
            case ANALYTIC_SIGNAL -> Grid.wrap(g, combine(tx(p.slice(0, 40), false), ty(p.slice(40, 70), false), tz(p.slice(70, 100), true), Combination.NORM));
            case TILT -> Grid.wrap(g, tilt(p));
            case TILT_HORIZONTAL_DERIVATIVE -> Grid.wrap(g, HorizontalGradient.centralDifferenceNorm(tilt(p), g));
        };
    }

    private float[] tilt(Progress p) {
        return combine(tx(p.slice(0, 40), false), ty(p.slice(40, 70), false), tz(p.slice(70, 100), true), Combination.TILT);
    }

    private enum Combination { NORM, TILT }

    private static float[] combine(Grid a, Grid b, Grid c, Combination how) {
        float[] out = new float[a.geometry().size()];
        for (int i = 0; i < out.length; i++) {
            double ai = a.get(i), bi = b.get(i), ci = c == null ? 0 : c.get(i);
            double h2 = ai * ai + bi * bi;
            out[i] = switch (how) {
                case NORM -> (float) Math.sqrt(h2 + ci * ci);
                case TILT -> (float) Math.toDegrees(Math.atan2(ci, Math.sqrt(h2)));
            };
        }
        return out;
    }

    private Grid single(WavenumberResponse r, Progress p) {
        GridSpectrum s = spectrum(p.slice(0, 50));
        return once ? s.filterConsuming(r, p.slice(50, 100)) : s.filter(r, p.slice(50, 100));
    }

    private GridSpectrum spectrum(Progress p) {
        if (spectrum == null) {
            spectrum = GridSpectrum.of(grid, settings.padFactor(), p);
        }
        p.report(100);
        return spectrum;
    }

    // The last transform of a single-use bank consumes the spectrum: its result lives in the spectrum's array.

    private Grid tx(Progress p, boolean last) {
        if (tx == null) {
            tx = derivative(Responses.dx(), p, last);
        }
        return tx;
    }

    private Grid ty(Progress p, boolean last) {
        if (ty == null) {
            ty = derivative(Responses.dy(), p, last);
        }
        return ty;
    }

    private Grid tz(Progress p, boolean last) {
        if (tz == null) {
            tz = derivative(Responses.verticalDerivative(1), p, last);
        }
        return tz;
    }

    private Grid derivative(WavenumberResponse r, Progress p, boolean last) {
        GridSpectrum s = spectrum(p.slice(0, 50));
        return once && last ? s.filterConsuming(r, p.slice(50, 100)) : s.filter(r, p.slice(50, 100));
    }

    private org.halyard.model.FieldDirection requireField() {
        if (settings.field() == null) {
            throw new IllegalArgumentException("reduction to the pole needs the field direction: give "
                    + "--inclination and --declination (degrees)");
        }
        return settings.field();
    }
}
