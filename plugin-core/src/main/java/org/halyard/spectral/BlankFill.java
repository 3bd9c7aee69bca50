package org.halyard.spectral;

/**
 * Fills the blanks of a grid smoothly before a transform, so that blanks do not ring through the spectrum.
 *
 * <p><b>Algorithm:</b> blanks next to data take the mean of their filled neighbours, ring by ring inwards
 * (a breadth-first front), then a few sweeps of Laplace relaxation over the filled cells smooth the
 * steps the rings leave. The filled values exist only inside the engine; results are re-blanked.
 *
 * <p><b>Memory:</b> the work lists hold the blank cells only (four ints or floats each) plus a flag per
 * cell, and the grid is filled where it lies, rows at any stride: a 4096 x 4096 grid with a sixth of it
 * blank needs about 60 MB besides the grid.
 *
 * <p><b>Limitations:</b> the fill is a smooth guess, not data: anomalies near large gaps are unreliable.
 */
final class BlankFill {

    /** Relaxation sweeps after the ring fill (enough to smooth ring steps; the result is re-blanked). */
    private static final int RELAXATION_SWEEPS = 20;

    private final float[] v;
    private final int w, h, stride;

    private BlankFill(float[] v, int w, int h, int stride) {
        this.v = v;
        this.w = w;
        this.h = h;
        this.stride = stride;
    }

    /**
     * Fills the {@code NaN} cells of the {@code w x h} grid whose row {@code r} starts at
     * {@code v[r * stride]}, in place; other cells of {@code v} are left alone.
     *
     * @param blank the blank mask, row-major {@code w x h}: true where {@code v} holds NaN
     * @return the number of cells filled
     * @throws IllegalArgumentException when every cell is blank
     */
    static int fill(float[] v, int w, int h, int stride, boolean[] blank) {
        return new BlankFill(v, w, h, stride).fill(blank);
    }

    private int fill(boolean[] blank) {
        int nBlank = 0;
        for (boolean b : blank) {
            nBlank += b ? 1 : 0;
        }
        if (nBlank == 0) {
            return 0;
        }
        if (nBlank == blank.length) {
            throw new IllegalArgumentException("every cell of the grid is blank");
        }
        int[] cells = new int[nBlank];   // strided indices of the blank cells, ascending
        int[] front = new int[nBlank], next = new int[nBlank];
        float[] ring = new float[nBlank];
        boolean[] queued = new boolean[blank.length];
        int n = 0, nFront = 0;
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                if (blank[r * w + c]) {
                    int i = r * stride + c;
                    cells[n++] = i;
                    if (hasValidNeighbour(i)) {
                        front[nFront++] = i;
                        queued[r * w + c] = true;
                    }
                }
            }
        }
        while (nFront > 0) {
            for (int j = 0; j < nFront; j++) {
                ring[j] = neighbourMean(front[j]);
            }
            for (int j = 0; j < nFront; j++) {
                v[front[j]] = ring[j];
            }
            int nNext = 0;
            for (int j = 0; j < nFront; j++) {
                int i = front[j];
                int r = i / stride, c = i % stride;
                for (int d = 0; d < 4; d++) {
                    int rr = r + (d == 0 ? -1 : d == 1 ? 1 : 0), cc = c + (d == 2 ? -1 : d == 3 ? 1 : 0);
                    if (rr < 0 || cc < 0 || rr >= h || cc >= w) {
                        continue;
                    }
                    int k = rr * stride + cc;
                    if (Float.isNaN(v[k]) && !queued[rr * w + cc]) {
                        queued[rr * w + cc] = true;
                        next[nNext++] = k;
                    }
                }
            }
            int[] t = front;
            front = next;
            next = t;
            nFront = nNext;
        }
        for (int s = 0; s < RELAXATION_SWEEPS; s++) {
            for (int i : cells) {
                v[i] = neighbourMean(i);
            }
        }
        return nBlank;
    }

    private boolean hasValidNeighbour(int i) {
        int r = i / stride, c = i % stride;
        return (r > 0 && !Float.isNaN(v[i - stride])) || (r < h - 1 && !Float.isNaN(v[i + stride]))
                || (c > 0 && !Float.isNaN(v[i - 1])) || (c < w - 1 && !Float.isNaN(v[i + 1]));
    }

    private float neighbourMean(int i) {
        int r = i / stride, c = i % stride;
        double s = 0;
        int n = 0;
        if (r > 0 && !Float.isNaN(v[i - stride])) {
            s += v[i - stride];
            n++;
        }
        if (r < h - 1 && !Float.isNaN(v[i + stride])) {
            s += v[i + stride];
            n++;
        }
        if (c > 0 && !Float.isNaN(v[i - 1])) {
            s += v[i - 1];
            n++;
        }
        if (c < w - 1 && !Float.isNaN(v[i + 1])) {
            s += v[i + 1];
            n++;
        }
        return n == 0 ? Float.NaN : (float) (s / n);
    }
}
