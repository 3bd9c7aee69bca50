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
            case VERTICAL_DERIVATIVE -> settings.order() == 1 ? tz(p) : single(Responses.verticalDerivative(settings.order()), p);
            case DX -> tx(p);
            case DY -> ty(p);
            case TOTAL_HORIZONTAL_GRADIENT -> Grid.wrap(g, combined(Combination.HORIZONTAL_NORM, p));
            case ANALYTIC_SIGNAL -> Grid.wrap(g, combined(Combination.NORM, p));
            case TILT -> Grid.wrap(g, combined(Combination.TILT, p));
            case TILT_HORIZONTAL_DERIVATIVE -> Grid.wrap(g, HorizontalGradient.centralDifferenceNorm(combined(Combination.TILT, p), g));
        };
    }

    /** Maps made of the first derivatives: h2 = Tx^2 + Ty^2 (float), then the map from h2 and Tz. */
    private enum Combination {
        HORIZONTAL_NORM, NORM, TILT;

        static float first(float tx) {
            return (float) ((double) tx * tx);
        }

        static float add(float h2, float ty) {
            return (float) (h2 + (double) ty * ty);
        }

        float finish(float h2, float tz) {
            return switch (this) {
                case HORIZONTAL_NORM -> (float) Math.sqrt(h2);
                case NORM -> (float) Math.sqrt(h2 + (double) tz * tz);
                case TILT -> (float) Math.toDegrees(Math.atan2(tz, Math.sqrt(h2)));
            };
        }

        boolean needsTz() {
            return this != HORIZONTAL_NORM;
        }
    }

    /**
     * A combined map. A reusable bank keeps Tx, Ty and Tz for the maps that follow; a single-use bank sums
     * the squares of Tx and Ty row by row as the filters deliver them and lets Tz, the last, consume the
     * spectrum, so it holds one grid besides the spectrum instead of four. Both do the same arithmetic.
     */
    private float[] combined(Combination how, Progress p) {
        int n = grid.geometry().size();
        float[] out = new float[n];
        if (!once) {
            Grid a = tx(p.slice(0, 40)), b = ty(p.slice(40, 70));
            Grid c = how.needsTz() ? tz(p.slice(70, 100)) : null;
            for (int i = 0; i < n; i++) {
                out[i] = how.finish(Combination.add(Combination.first(a.get(i)), b.get(i)), c == null ? 0 : c.get(i));
            }
            return out;
        }
        int w = grid.geometry().columns();
        GridSpectrum s = spectrum(p.slice(0, 25));
        s.filterRows(Responses.dx(), (r, v, off) -> {
            for (int c = 0; c < w; c++) {
                out[r * w + c] = Combination.first(v[off + c]);
            }
        }, p.slice(25, 50));
        if (!how.needsTz()) {
            Grid b = s.filterConsuming(Responses.dy(), p.slice(50, 100));
            for (int i = 0; i < n; i++) {
                out[i] = how.finish(Combination.add(out[i], b.get(i)), 0);
            }
            return out;
        }
        s.filterRows(Responses.dy(), (r, v, off) -> {
            for (int c = 0; c < w; c++) {
                out[r * w + c] = Combination.add(out[r * w + c], v[off + c]);
            }
        }, p.slice(50, 75));
        Grid c = s.filterConsuming(Responses.verticalDerivative(1), p.slice(75, 100));
        for (int i = 0; i < n; i++) {
            out[i] = how.finish(out[i], c.get(i));
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

    // In a single-use bank a derivative is the only transform back: it consumes the spectrum.

    private Grid tx(Progress p) {
        if (tx == null) {
            tx = derivative(Responses.dx(), p);
        }
        return tx;
    }

    private Grid ty(Progress p) {
        if (ty == null) {
            ty = derivative(Responses.dy(), p);
        }
        return ty;
    }

    private Grid tz(Progress p) {
        if (tz == null) {
            tz = derivative(Responses.verticalDerivative(1), p);
        }
        return tz;
    }

    private Grid derivative(WavenumberResponse r, Progress p) {
        GridSpectrum s = spectrum(p.slice(0, 50));
        return once ? s.filterConsuming(r, p.slice(50, 100)) : s.filter(r, p.slice(50, 100));
    }

    private org.halyard.model.FieldDirection requireField() {
        if (settings.field() == null) {
            throw new IllegalArgumentException("reduction to the pole needs the field direction: give "
                    + "--inclination and --declination (degrees)");
        }
        return settings.field();
    }
}
