package org.halyard.spectral;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.GridRows;
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
 *   <li>pad to at least {@code padFactor} times each side, to an even 2-3-5-smooth length
 *       ({@link FftSizes}); the pad holds the grid mirrored about its edges, blended between the two edges
 *       it joins (the transform is periodic) and tapered to the mean by a squared cosine;</li>
 *   <li>real 2-D FFT: a real transform of each row (JTransforms {@code FloatFFT_1D}, one instance per
 *       thread), then a complex transform of each of the {@code n/2 + 1} spectrum columns.</li>
 * </ol>
 * {@link #filter} multiplies by a {@link WavenumberResponse}, transforms back, crops, adds the plane as
 * the filter transforms it and re-blanks the cells that were blank.
 *
 * <p><b>Memory:</b> only the row transforms of the data rows are kept ({@code rows x (nc + 2)} floats).
 * The pad rows are linear combinations of data rows ({@link PadExtension}), so their row transforms are
 * made from the data rows' on the fly, column block by column block, just before the column transform;
 * each block is transformed, filtered and transformed back in one go, and only its data rows are kept.
 * The padded 2-D spectrum never exists whole. {@link #filterConsuming} works in the spectrum's own array,
 * so a one-off filter needs the one array and nothing of the grid's size besides.
 *
 * <p>FFT convention: forward {@code X(k) = sum x(n) exp(-2 pi i k n / N)}, inverse scaled by {@code 1/N}
 * (JTransforms, as NumPy). Wavenumbers: kx = 2 pi j / (Nx dx) towards east; because row 0 is north,
 * ky = -2 pi q / (Ny dy) for row frequency q (see {@link GridGeometry}). On the Nyquist row and column the
 * response is replaced by its Hermitian part, the mean of H at +k and -k, so outputs stay real.
 *
 * <p><b>Accuracy:</b> float arithmetic, about 1e-6 of the field's range from the transforms; edge effects
 * of the padding reach a few cells in; derivatives amplify noise as k^n.
 *
 * <p><b>Thread safety:</b> {@link #filter}, {@link #filterToArray} and {@link #filterRows} only read the
 * spectrum and may run from several threads; {@link #filterConsuming} takes the spectrum over and must be
 * the last call, made when no other is running. Each call uses all cores through the common fork-join
 * pool.
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
    private final boolean[] blank;   // null when no cell is blank
    private final int rows, cols;    // data size
    private final int nr, nc;        // padded size; stored rows are nc + 2 floats (nc/2 + 1 complex)
    private final PadExtension rowPad;
    private float[] rowSpectrum;     // the data rows' transforms; null once consumed

    private GridSpectrum(GridGeometry geometry, LinearTrend trend, boolean[] blank, int nr, int nc, float[] rowSpectrum) {
        this.geometry = geometry;
        this.trend = trend;
        this.blank = blank;
        this.rows = geometry.rows();
        this.cols = geometry.columns();
        this.nr = nr;
        this.nc = nc;
        this.rowPad = PadExtension.of(rows, nr);
        this.rowSpectrum = rowSpectrum;
    }

    /** Prepares the spectrum of {@code grid} with the minimum padding factor. */
    public static GridSpectrum of(GridRows grid, Progress progress) {
        return of(grid, MIN_PAD_FACTOR, progress);
    }

    /**
     * Prepares the spectrum of {@code grid} (values in any unit, nT for a total field; a projected CRS in
     * metres). The grid's rows are asked for once, straight into the transform array.
     *
     * @param padFactor padded size over data size per side, at least {@value #MIN_PAD_FACTOR}
     * @throws IllegalArgumentException when the grid is entirely blank or the transform would not fit
     */
    public static GridSpectrum of(GridRows grid, double padFactor, Progress progress) {
        if (!(padFactor >= MIN_PAD_FACTOR) || padFactor > 8) {
            throw new IllegalArgumentException("padding factor must be between 1.5 and 8, got " + padFactor);
        }
        Progress p = Progress.orNone(progress);
        GridGeometry g = grid.geometry();
        int h = g.rows(), w = g.columns();
        int nr = FftSizes.smoothAtLeast((int) Math.ceil(h * padFactor));
        int nc = FftSizes.smoothAtLeast((int) Math.ceil(w * padFactor));
        int stride = nc + 2;
        float[] s = allocate((long) h * stride, w, h, nc, nr);
        grid.copyRows(s, stride);
        p.report(5);
        p.checkCanceled();
        LinearTrend trend = LinearTrend.fit(g, s, stride);
        boolean[] blank = blanks(s, w, h, stride);
        if (blank != null) {
            for (int r = 0; r < h; r++) {
                detrendRow(g, trend, s, r, r * stride);
            }
            BlankFill.fill(s, w, h, stride, blank);
        }
        p.report(10);
        p.checkCanceled();
        PadExtension colPad = PadExtension.of(w, nc);
        AtomicInteger done = new AtomicInteger();
        parallel(h, r -> new FloatFFT_1D(nc), (fft, r) -> {
            if (blank == null) {
                detrendRow(g, trend, s, r, r * stride);
            }
            colPad.fill(s, r * stride);
            transformRow(fft, s, r * stride, nc);
            if ((done.incrementAndGet() & 255) == 0) {
                p.report(10 + 90.0 * done.get() / h);
            }
        });
        p.report(100);
        return new GridSpectrum(g, trend, blank, nr, nc, s);
    }

    private static float[] allocate(long need, int w, int h, int nc, int nr) {
        if (need > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("grid of " + w + " x " + h + " is too large for the transform ("
                    + nc + " x " + nr + " padded)");
        }
        try {
            return new float[(int) need];
        } catch (OutOfMemoryError e) {
            throw new IllegalArgumentException("not enough memory for the transform of a " + w + " x " + h
                    + " grid: it needs about " + (need * 4 / (1 << 20)) + " MiB; raise -Xmx (HALYARD_JAVA_OPTS)");
        }
    }

    /** The blank mask of the {@code w x h} cells at row stride {@code stride}, or null when none is blank. */
    private static boolean[] blanks(float[] s, int w, int h, int stride) {
        long nBlank = IntStream.range(0, h).parallel().mapToLong(r -> {
            int n = 0;
            for (int c = 0, off = r * stride; c < w; c++) {
                n += Float.isNaN(s[off + c]) ? 1 : 0;
            }
            return n;
        }).sum();
        if (nBlank == (long) w * h) {
            throw new IllegalArgumentException("every cell of the grid is blank");
        }
        if (nBlank == 0) {
            return null;
        }
        boolean[] blank = new boolean[w * h];
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                blank[r * w + c] = Float.isNaN(s[r * stride + c]);
            }
        }
        return blank;
    }

    /** Removes the plane from row {@code r}, which starts at {@code s[off]}; blank cells stay NaN. */
    private static void detrendRow(GridGeometry g, LinearTrend trend, float[] s, int r, int off) {
        double v0 = trend.at(g.x(0), g.y(r)), dv = trend.bx() * g.cellSize();
        for (int c = 0, w = g.columns(); c < w; c++) {
            s[off + c] -= (float) (v0 + c * dv);
        }
    }

    /**
     * Real forward transform of the {@code nc} values at {@code s[off]}, unpacked in place to
     * {@code nc/2 + 1} interleaved complex values ({@code nc + 2} floats).
     */
    private static void transformRow(FloatFFT_1D fft, float[] s, int off, int nc) {
        fft.realForward(s, off);
        // unpack JTransforms' layout {Re0, Re(n/2), Re1, Im1, ...} to n/2 + 1 complex values
        s[off + nc] = s[off + 1];
        s[off + 1] = 0;
        s[off + nc + 1] = 0;
    }

    /**
     * In-place real 2-D forward transform of the {@code nr x nc} array {@code s} stored with row stride
     * {@code nc + 2}: afterwards row q holds the {@code nc/2 + 1} complex coefficients
     * {@code X[q][j] = sum x[r][c] exp(-2 pi i (q r / nr + j c / nc))} as interleaved (re, im), the layout
     * and sign of NumPy's {@code rfft2}. {@code nc} must be even. The two steps are the ones
     * {@link #of} and {@link #filter} use; this whole transform serves the reference tests.
     */
    static void forward(float[] s, int nr, int nc, Progress p) {
        int stride = nc + 2;
        parallel(nr, r -> new FloatFFT_1D(nc), (fft, r) -> transformRow(fft, s, r * stride, nc));
        int ncols = nc / 2 + 1;
        parallel(blocks(ncols), t -> new Columns(nr), (block, b) -> {
            int k0 = b * Columns.BLOCK, n = Math.min(Columns.BLOCK, ncols - k0);
            block.gather(s, stride, k0, n, nr);
            for (int j = 0; j < n; j++) {
                block.fft.complexForward(block.buf[j]);
            }
            block.scatter(s, stride, k0, n, nr);
        });
        Progress.orNone(p).report(100);
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
     *
     * @throws IllegalStateException after {@link #filterConsuming}
     */
    public Grid filter(WavenumberResponse response, Progress progress) {
        return Grid.wrap(geometry, filterToArray(response, progress));
    }

    /** As {@link #filter} but the values only, row-major, row 0 north. */
    public float[] filterToArray(WavenumberResponse response, Progress progress) {
        float[] out = new float[rows * cols];
        filterRows(response, (r, values, off) -> System.arraycopy(values, off, out, r * cols, cols), progress);
        return out;
    }

    /** Receives the rows of a filtered grid, for consumers that reduce them as they come. */
    @FunctionalInterface
    public interface RowSink {
        /**
         * Row {@code r} (0 north) is {@code values[off .. off + columns)}, blanks {@code NaN}, unit as the
         * response makes it. Called from several threads, each row once; the array is reused afterwards.
         */
        void row(int r, float[] values, int off);
    }

    /**
     * As {@link #filter}, handing each row to {@code sink} instead of keeping the grid: a map combined from
     * several filters (analytic signal, tilt) then needs no grid per filter.
     */
    public void filterRows(WavenumberResponse response, RowSink sink, Progress progress) {
        float[] src = requireSpectrum();
        float[] work;
        try {
            work = new float[rows * (nc + 2)];
        } catch (OutOfMemoryError e) {
            throw new IllegalArgumentException("not enough memory to filter a " + cols + " x " + rows
                    + " grid; raise -Xmx (HALYARD_JAVA_OPTS)");
        }
        transformBack(response, src, work, sink, Progress.orNone(progress));
    }

    /**
     * As {@link #filter}, working in the spectrum's own array, which the result then occupies: nothing of
     * the grid's size is allocated. The spectrum cannot be used again.
     *
     * @throws IllegalStateException when the spectrum was consumed before
     */
    public Grid filterConsuming(WavenumberResponse response, Progress progress) {
        float[] s = requireSpectrum();
        rowSpectrum = null;
        transformBack(response, s, s, null, Progress.orNone(progress));
        for (int r = 0; r < rows; r++) {
            System.arraycopy(s, r * (nc + 2), s, r * cols, cols); // rows move forward: arraycopy allows the overlap
        }
        return Grid.wrapLeading(geometry, s);
    }

    private float[] requireSpectrum() {
        if (rowSpectrum == null) {
            throw new IllegalStateException("this spectrum was consumed by filterConsuming");
        }
        return rowSpectrum;
    }

    /**
     * Filters the row transforms in {@code src} into {@code dst} (the same array or another of its size):
     * per block of spectrum columns, the pad rows are made, the columns transformed, multiplied by the
     * response and transformed back; then each data row is transformed back, the plane (as filtered) added
     * and blanks restored, in the strided layout, and handed to {@code sink} when there is one.
     */
    private void transformBack(WavenumberResponse response, float[] src, float[] dst, RowSink sink, Progress p) {
        int stride = nc + 2;
        double dkx = 2 * Math.PI / (nc * geometry.cellSize());
        double dky = 2 * Math.PI / (nr * geometry.cellSize());
        AtomicInteger done = new AtomicInteger();
        int ncols = nc / 2 + 1;
        int nblocks = blocks(ncols);
        boolean radial = response.radial();
        parallel(nblocks, t -> new Columns(nr), (block, bi) -> {
            int k0 = bi * Columns.BLOCK, n = Math.min(Columns.BLOCK, ncols - k0);
            block.gather(src, stride, k0, n, rows);
            block.padRows(rowPad, rows, n);
            double[] h = block.h, hq = block.hq;
            for (int j = 0; j < n; j++) {
                int k = k0 + j;
                double kx = k * dkx;
                boolean nyqX = k == nc / 2;
                float[] b = block.buf[j];
                block.fft.complexForward(b);
                if (radial) {
                    // H(kx, ky) = H(kx, -ky): rows q and nr - q share one evaluation
                    for (int q = 0; q <= nr / 2; q++) {
                        responseAt(response, kx, -q * dky, nyqX, q == nr / 2, h, block.h2);
                        hq[2 * q] = h[0];
                        hq[2 * q + 1] = h[1];
                    }
                }
                for (int q = 0; q < nr; q++) {
                    double h0, h1;
                    if (radial) {
                        int m = q <= nr / 2 ? q : nr - q;
                        h0 = hq[2 * m];
                        h1 = hq[2 * m + 1];
                    } else {
                        int f = q <= nr / 2 ? q : q - nr;
                        double ky = -f * dky; // row index runs south
                        responseAt(response, kx, ky, nyqX, q == nr / 2, h, block.h2);
                        h0 = h[0];
                        h1 = h[1];
                    }
                    float re = b[2 * q], im = b[2 * q + 1];
                    b[2 * q] = (float) (re * h0 - im * h1);
                    b[2 * q + 1] = (float) (re * h1 + im * h0);
                }
                block.fft.complexInverse(b, true);
            }
            block.scatter(dst, stride, k0, n, rows);
            int d = done.incrementAndGet();
            if ((d & 7) == 0) {
                p.report(80.0 * d / nblocks);
            }
        });
        p.checkCanceled();
        LinearTrend t = response.onTrend(trend);
        parallel(rows, r -> new FloatFFT_1D(nc), (fft, r) -> {
            int off = r * stride;
            dst[off + 1] = dst[off + nc]; // repack the Nyquist real part for JTransforms
            fft.realInverse(dst, off, true);
            double v0 = t.at(geometry.x(0), geometry.y(r)), dv = t.bx() * geometry.cellSize();
            for (int c = 0; c < cols; c++) {
                dst[off + c] = blank != null && blank[r * cols + c] ? Float.NaN : (float) (dst[off + c] + (v0 + c * dv));
            }
            if (sink != null) {
                sink.row(r, dst, off);
            }
        });
        p.report(100);
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
        final double[] hq;   // a radial response for rows 0 .. nr/2 of one column

        Columns(int nr) {
            fft = new FloatFFT_1D(nr);
            buf = new float[BLOCK][2 * nr];
            hq = new double[2 * (nr / 2 + 1)];
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

        /** Rows {@code h} onwards of the first {@code n} columns from the data rows, as {@code pad} says. */
        void padRows(PadExtension pad, int h, int n) {
            for (int j = 0; j < n; j++) {
                float[] b = buf[j];
                for (int i = 0; i < pad.size(); i++) {
                    int q = 2 * (h + i), a = 2 * pad.near[i], z = 2 * pad.far[i];
                    double wa = pad.nearWeight[i], wz = pad.farWeight[i];
                    b[q] = (float) (wa * b[a] + wz * b[z]);
                    b[q + 1] = (float) (wa * b[a + 1] + wz * b[z + 1]);
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
