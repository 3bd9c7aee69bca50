package org.halyard.spectral;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.jtransforms.fft.FloatFFT_1D;

/**
 * The wavenumber spectrum of a grid, prepared once and filtered any number of times: the engine behind
 * every Halyard wavenumber filter.
 *
 * <p><b>Algorithm</b> (preparation as Blakely 1995, section 12.4, recommends):
 * <ol>
 *   <li>fit and remove a least-squares plane ({@link LinearTrend});</li>
 *   <li>fill blanks smoothly ({@link BlankFill});</li>
 *   <li>pad to at least {@code padFactor} times each side, to an even 2-3-5-7-smooth length
 *       ({@link FftSizes}); the pad holds the grid mirrored about its edges, blended between the two edges
 *       it joins (the transform is periodic) and tapered to the mean by a squared cosine;</li>
 *   <li>real 2-D FFT: a real transform of each row (JTransforms {@code FloatFFT_1D}, one instance per
 *       thread), then a complex transform of each of the {@code n/2 + 1} spectrum columns.</li>
 * </ol>
 * {@link #filter} multiplies by a {@link WavenumberResponse}, transforms back, crops, adds the plane as
 * the filter transforms it and re-blanks the cells that were blank.
 *
 * <p>FFT convention: forward {@code X(k) = sum x(n) exp(-2 pi i k n / N)}, inverse scaled by {@code 1/N}
 * (JTransforms, as NumPy). Wavenumbers: kx = 2 pi j / (Nx dx) towards east; because row 0 is north,
 * ky = -2 pi q / (Ny dy) for row frequency q (see {@link GridGeometry}). On the Nyquist row and column the
 * response is replaced by its Hermitian part, the mean of H at +k and -k, so outputs stay real.
 *
 * <p><b>Accuracy:</b> float arithmetic, about 1e-6 of the field's range from the transforms; edge effects
 * of the padding reach a few cells in; derivatives amplify noise as k^n.
 *
 * <p><b>Thread safety:</b> immutable once built; {@link #filter} may run from several threads. Each call
 * uses all cores through the common fork-join pool.
 */
public final class GridSpectrum {

    /** Minimum padding factor per side (DOMAIN.md: at least 1.5x). */
    public static final double MIN_PAD_FACTOR = 1.5;

    static {
        // Our own threads split rows and columns; JTransforms' pool would nest and its threads are not
        // daemons (a CLI could hang at exit: STACK.md).
        pl.edu.icm.jlargearrays.ConcurrencyUtils.setNumberOfThreads(1);
    }

    private final GridGeometry geometry;
    private final LinearTrend trend;
    private final boolean[] blank;
    private final int rows, cols;    // data size
    private final int nr, nc;        // padded size; spectrum rows are nc + 2 floats (nc/2 + 1 complex)
    private final float[] spectrum;

    private GridSpectrum(GridGeometry geometry, LinearTrend trend, boolean[] blank, int nr, int nc, float[] spectrum) {
        this.geometry = geometry;
        this.trend = trend;
        this.blank = blank;
        this.rows = geometry.rows();
        this.cols = geometry.columns();
        this.nr = nr;
        this.nc = nc;
        this.spectrum = spectrum;
    }

    /** Prepares the spectrum of {@code grid} with the minimum padding factor. */
    public static GridSpectrum of(Grid grid, Progress progress) {
        return of(grid, MIN_PAD_FACTOR, progress);
    }

    /**
     * Prepares the spectrum of {@code grid}.
     *
     * @param padFactor padded size over data size per side, at least {@value #MIN_PAD_FACTOR}
     * @throws IllegalArgumentException when the grid is entirely blank or the padded grid would not fit
     */
    public static GridSpectrum of(Grid grid, double padFactor, Progress progress) {
        if (!(padFactor >= MIN_PAD_FACTOR) || padFactor > 8) {
            throw new IllegalArgumentException("padding factor must be between 1.5 and 8, got " + padFactor);
        }
        Progress p = Progress.orNone(progress);
        GridGeometry g = grid.geometry();
        int h = g.rows(), w = g.columns();
        LinearTrend trend = LinearTrend.fit(grid);
        boolean[] blank = new boolean[w * h];
        int nBlank = 0;
        for (int i = 0; i < blank.length; i++) {
            if (Float.isNaN(grid.get(i))) {
                blank[i] = true;
                nBlank++;
            }
        }
        // Blanks are filled on a compact copy before the transform array exists, so the fill's workspace and
        // the transform array are never live together; a grid without blanks needs no copy at all.
        float[] filled = null;
        if (nBlank > 0) {
            filled = new float[w * h];
            for (int r = 0; r < h; r++) {
                detrendRow(grid, trend, blank, r, filled, r * w);
            }
            BlankFill.fill(filled, w, h);
        }
        int nr = FftSizes.smoothAtLeast((int) Math.ceil(h * padFactor));
        int nc = FftSizes.smoothAtLeast((int) Math.ceil(w * padFactor));
        long need = (long) nr * (nc + 2);
        if (need > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("grid of " + w + " x " + h + " is too large for the transform ("
                    + nc + " x " + nr + " padded)");
        }
        float[] s;
        try {
            s = new float[(int) need];
        } catch (OutOfMemoryError e) {
            throw new IllegalArgumentException("not enough memory for the transform of a " + w + " x " + h
                    + " grid: it needs about " + (need * 8 / (1 << 20)) + " MiB; raise -Xmx (HALYARD_JAVA_OPTS)");
        }
        int stride = nc + 2;
        for (int r = 0; r < h; r++) {
            if (filled != null) {
                System.arraycopy(filled, r * w, s, r * stride, w);
            } else {
                detrendRow(grid, trend, blank, r, s, r * stride);
            }
        }
        filled = null; // collectable during the transform, whatever the JIT knows of liveness
        PadExtension.extend(s, w, h, stride, nc, nr);
        p.report(10);
        p.checkCanceled();
        forward(s, nr, nc, p.slice(10, 100));
        p.report(100);
        return new GridSpectrum(g, trend, blank, nr, nc, s);
    }

    /** Row {@code r} of {@code grid} less the plane into {@code dst} from {@code off}; blank cells get NaN. */
    private static void detrendRow(Grid grid, LinearTrend trend, boolean[] blank, int r, float[] dst, int off) {
        GridGeometry g = grid.geometry();
        int w = g.columns();
        double y = g.y(r);
        for (int c = 0; c < w; c++) {
            dst[off + c] = blank[r * w + c] ? Float.NaN : grid.get(c, r) - (float) trend.at(g.x(c), y);
        }
    }

    /**
     * In-place real 2-D forward transform of the {@code nr x nc} array {@code s} stored with row stride
     * {@code nc + 2}: afterwards row q holds the {@code nc/2 + 1} complex coefficients
     * {@code X[q][j] = sum x[r][c] exp(-2 pi i (q r / nr + j c / nc))} as interleaved (re, im), the layout
     * and sign of NumPy's {@code rfft2}. {@code nc} must be even.
     */
    static void forward(float[] s, int nr, int nc, Progress p) {
        int stride = nc + 2;
        parallel(nr, r -> new FloatFFT_1D(nc), (fft, r) -> {
            int off = r * stride;
            fft.realForward(s, off);
            // unpack JTransforms' layout {Re0, Re(n/2), Re1, Im1, ...} to n/2 + 1 complex values
            s[off + nc] = s[off + 1];
            s[off + 1] = 0;
            s[off + nc + 1] = 0;
        });
        p.report(40);
        p.checkCanceled();
        int ncols = nc / 2 + 1;
        parallel(blocks(ncols), t -> new Columns(nr), (cols, b) -> {
            int k0 = b * Columns.BLOCK, n = Math.min(Columns.BLOCK, ncols - k0);
            cols.gather(s, stride, k0, n, nr);
            for (int j = 0; j < n; j++) {
                cols.fft.complexForward(cols.buf[j]);
            }
            cols.scatter(s, stride, k0, n, nr);
        });
        p.report(100);
    }

    private static int blocks(int ncols) {
        return (ncols + Columns.BLOCK - 1) / Columns.BLOCK;
    }

    /** The geometry of the source grid. */
    public GridGeometry geometry() {
        return geometry;
    }

    /** The plane removed before the transform (value in the grid's unit, gradients per metre). */
    public LinearTrend trend() {
        return trend;
    }

    /** Padded transform size, {@code {columns, rows}}. */
    public int[] paddedSize() {
        return new int[] {nc, nr};
    }

    /**
     * The grid filtered by {@code response}, on the source geometry, blanks where the source was blank.
     * The unit is the source unit as the response changes it (e.g. nT/m for a first derivative).
     */
    public Grid filter(WavenumberResponse response, Progress progress) {
        return Grid.wrap(geometry, filterToArray(response, progress));
    }

    /** As {@link #filter} but the values only, row-major, row 0 north. */
    public float[] filterToArray(WavenumberResponse response, Progress progress) {
        Progress p = Progress.orNone(progress);
        int stride = nc + 2;
        float[] work;
        try {
            work = new float[rows * stride];
        } catch (OutOfMemoryError e) {
            throw new IllegalArgumentException("not enough memory to filter a " + cols + " x " + rows
                    + " grid; raise -Xmx (HALYARD_JAVA_OPTS)");
        }
        double dkx = 2 * Math.PI / (nc * geometry.cellSize());
        double dky = 2 * Math.PI / (nr * geometry.cellSize());
        AtomicInteger done = new AtomicInteger();
        int ncols = nc / 2 + 1;
        int nblocks = blocks(ncols);
        parallel(nblocks, t -> new Columns(nr), (block, bi) -> {
            int k0 = bi * Columns.BLOCK, n = Math.min(Columns.BLOCK, ncols - k0);
            block.gather(spectrum, stride, k0, n, nr);
            double[] h = block.h;
            for (int j = 0; j < n; j++) {
                int k = k0 + j;
                double kx = k * dkx;
                boolean nyqX = k == nc / 2;
                float[] b = block.buf[j];
                for (int q = 0; q < nr; q++) {
                    int f = q <= nr / 2 ? q : q - nr;
                    double ky = -f * dky; // row index runs south
                    responseAt(response, kx, ky, nyqX, q == nr / 2, h, block.h2);
                    float re = b[2 * q], im = b[2 * q + 1];
                    b[2 * q] = (float) (re * h[0] - im * h[1]);
                    b[2 * q + 1] = (float) (re * h[1] + im * h[0]);
                }
                block.fft.complexInverse(b, true);
            }
            block.scatter(work, stride, k0, n, rows);
            int d = done.incrementAndGet();
            if ((d & 7) == 0) {
                p.report(80.0 * d / nblocks);
            }
        });
        p.checkCanceled();
        float[] out = new float[rows * cols];
        LinearTrend t = response.onTrend(trend);
        parallel(rows, r -> new FloatFFT_1D(nc), (fft, r) -> {
            int off = r * stride;
            work[off + 1] = work[off + nc]; // repack the Nyquist real part for JTransforms
            fft.realInverse(work, off, true);
            double y = geometry.y(r);
            for (int c = 0; c < cols; c++) {
                int i = r * cols + c;
                out[i] = blank[i] ? Float.NaN : (float) (work[off + c] + t.at(geometry.x(c), y));
            }
        });
        p.report(100);
        return out;
    }

    private static void responseAt(WavenumberResponse response, double kx, double ky, boolean nyqX, boolean nyqY,
                                   double[] h, double[] h2) {
        response.at(kx, ky, Math.sqrt(kx * kx + ky * ky), h);
        if (nyqX || nyqY) {
            // Hermitian part: average with the alias at the opposite Nyquist sign.
            double kx2 = nyqX ? -kx : kx, ky2 = nyqY ? -ky : ky;
            response.at(kx2, ky2, Math.sqrt(kx2 * kx2 + ky2 * ky2), h2);
            h[0] = (h[0] + h2[0]) / 2;
            h[1] = (h[1] + h2[1]) / 2;
        }
    }

    /**
     * Per-thread workspace for a block of spectrum columns: {@value #BLOCK} complex columns are read and
     * written together, so each cache line fetched along a row serves the whole block.
     */
    private static final class Columns {
        static final int BLOCK = 8;
        final FloatFFT_1D fft;
        final float[][] buf;
        final double[] h = new double[2];
        final double[] h2 = new double[2];

        Columns(int nr) {
            fft = new FloatFFT_1D(nr);
            buf = new float[BLOCK][2 * nr];
        }

        void gather(float[] s, int stride, int k0, int n, int nrows) {
            for (int q = 0; q < nrows; q++) {
                int off = q * stride + 2 * k0;
                for (int j = 0; j < n; j++) {
                    buf[j][2 * q] = s[off + 2 * j];
                    buf[j][2 * q + 1] = s[off + 2 * j + 1];
                }
            }
        }

        void scatter(float[] s, int stride, int k0, int n, int nrows) {
            for (int q = 0; q < nrows; q++) {
                int off = q * stride + 2 * k0;
                for (int j = 0; j < n; j++) {
                    s[off + 2 * j] = buf[j][2 * q];
                    s[off + 2 * j + 1] = buf[j][2 * q + 1];
                }
            }
        }
    }

    private interface Work<T> {
        void run(T workspace, int index);
    }

    /** Runs {@code work} for indices 0..n-1 split over the cores, one workspace per thread. */
    private static <T> void parallel(int n, java.util.function.IntFunction<T> workspace, Work<T> work) {
        int threads = Math.max(1, Math.min(Runtime.getRuntime().availableProcessors(), n / 8 + 1));
        IntStream.range(0, threads).parallel().forEach(t -> {
            T ws = workspace.apply(t);
            for (int i = t; i < n; i += threads) {
                work.run(ws, i);
            }
        });
    }
}
