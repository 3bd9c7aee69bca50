package org.halyard.spectral;

/**
 * Fills the blanks of a grid smoothly before a transform, so that blanks do not ring through the spectrum.
 *
 * <p><b>Algorithm:</b> blanks next to data take the mean of their filled neighbours, ring by ring inwards
 * (a breadth-first front), then a few sweeps of Laplace relaxation over the filled cells smooth the
 * steps the rings leave. The filled values exist only inside the engine; results are re-blanked.
 *
 * <p><b>Limitations:</b> the fill is a smooth guess, not data: anomalies near large gaps are unreliable.
 */
final class BlankFill {

    /** Relaxation sweeps after the ring fill (enough to smooth ring steps; the result is re-blanked). */
    private static final int RELAXATION_SWEEPS = 20;

    private BlankFill() {
    }

    /**
     * Fills the {@code NaN} cells of the row-major array {@code v} (width {@code w}) in place.
     *
     * @return the number of cells filled
     * @throws IllegalArgumentException when every cell is blank
     */
    static int fill(float[] v, int w, int h) {
        boolean[] blank = new boolean[v.length];
        int[] front = new int[v.length];
        int nFront = 0, nBlank = 0;
        for (int i = 0; i < v.length; i++) {
            if (Float.isNaN(v[i])) {
                blank[i] = true;
                nBlank++;
            }
        }
        if (nBlank == 0) {
            return 0;
        }
        if (nBlank == v.length) {
            throw new IllegalArgumentException("every cell of the grid is blank");
        }
        for (int i = 0; i < v.length; i++) {
            if (blank[i] && hasValidNeighbour(v, w, h, i)) {
                front[nFront++] = i;
            }
        }
        boolean[] queued = new boolean[v.length];
        for (int j = 0; j < nFront; j++) {
            queued[front[j]] = true;
        }
        int[] next = new int[v.length];
        float[] ring = new float[v.length];
        while (nFront > 0) {
            for (int j = 0; j < nFront; j++) {
                ring[j] = neighbourMean(v, w, h, front[j]);
            }
            int nNext = 0;
            for (int j = 0; j < nFront; j++) {
                v[front[j]] = ring[j];
            }
            for (int j = 0; j < nFront; j++) {
                int i = front[j];
                int r = i / w, c = i % w;
                for (int d = 0; d < 4; d++) {
                    int rr = r + (d == 0 ? -1 : d == 1 ? 1 : 0), cc = c + (d == 2 ? -1 : d == 3 ? 1 : 0);
                    if (rr < 0 || cc < 0 || rr >= h || cc >= w) {
                        continue;
                    }
                    int n = rr * w + cc;
                    if (Float.isNaN(v[n]) && !queued[n]) {
                        queued[n] = true;
                        next[nNext++] = n;
                    }
                }
            }
            int[] t = front;
            front = next;
            next = t;
            nFront = nNext;
        }
        for (int s = 0; s < RELAXATION_SWEEPS; s++) {
            for (int i = 0; i < v.length; i++) {
                if (blank[i]) {
                    v[i] = neighbourMean(v, w, h, i);
                }
            }
        }
        return nBlank;
    }

    private static boolean hasValidNeighbour(float[] v, int w, int h, int i) {
        int r = i / w, c = i % w;
        return (r > 0 && !Float.isNaN(v[i - w])) || (r < h - 1 && !Float.isNaN(v[i + w]))
                || (c > 0 && !Float.isNaN(v[i - 1])) || (c < w - 1 && !Float.isNaN(v[i + 1]));
    }

    private static float neighbourMean(float[] v, int w, int h, int i) {
        int r = i / w, c = i % w;
        double s = 0;
        int n = 0;
        if (r > 0 && !Float.isNaN(v[i - w])) {
            s += v[i - w];
            n++;
        }
        if (r < h - 1 && !Float.isNaN(v[i + w])) {
            s += v[i + w];
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
