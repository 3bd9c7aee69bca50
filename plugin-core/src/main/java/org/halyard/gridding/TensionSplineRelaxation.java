package org.halyard.gridding;

import java.util.stream.IntStream;

/**
 * One level of the coarse-to-fine solve: successive over-relaxation of the continuous-curvature spline in
 * tension on a square lattice, with data constraints at nodes and free-edge conditions outside.
 *
 * <p><b>Algorithm:</b> on a lattice of unit spacing the interior equation {@code (1 - T) D4 u - T D2 u = 0}
 * (Smith and Wessel 1990, eq. 5; Briggs 1974, eq. 4 for T = 0) uses the 13-node biharmonic stencil
 * {@code 20 u0 - 8 (sides) + 2 (diagonals) + (two away)} and the 5-node Laplacian. Each free node moves
 * towards the value that satisfies its equation, by the factor {@link #OMEGA}. A node holding a sample
 * (offset {@code dx, dy} in lattice units) is set instead so that the first-order Taylor expansion of the
 * surface about the node, with central differences from its neighbours, passes through the sample. Two ghost rows
 * and columns outside each edge carry the free-edge conditions of Smith and Wessel (1990, eqs. 6-8): zero
 * curvature across the edge, zero normal derivative of {@code (1 - T) D2 u - T u}, and zero twist at the
 * corners, each written here as central differences.
 *
 * <p>Parallel ordering: rows are cut into strips of at least two rows; even strips are relaxed together,
 * then odd strips (block red-black). The 13-node stencil reaches two rows, so strips of one colour never
 * touch and the result does not depend on the number of threads.
 *
 * <p><b>Thread safety:</b> one instance per solve; it uses the common fork-join pool internally.
 */
final class TensionSplineRelaxation {

    /** Over-relaxation factor: from memory a common choice for this stencil; checked by the GMT comparison test. */
    static final double OMEGA = 1.4;
    /** Below this many nodes a level is relaxed on one thread: splitting costs more than it saves. */
    private static final int PARALLEL_NODES = 40_000;

    final int nx;
    final int ny;
    final int w;
    final double[] u;
    private final int[] slot;
    private double[] cv = new double[0];
    private double[] cdx = new double[0];
    private double[] cdy = new double[0];
    private final double a1, a2, a3, edge;

    TensionSplineRelaxation(int nx, int ny, double tension) {
        this.nx = nx;
        this.ny = ny;
        this.w = nx + 4;
        this.u = new double[w * (ny + 4)];
        this.slot = new int[u.length];
        double loose = 1 - tension;
        double denom = 20 * loose + 4 * tension;
        a1 = (8 * loose + tension) / denom;
        a2 = -2 * loose / denom;
        a3 = -loose / denom;
        edge = tension / loose;
    }

    /** Array index of node (i, j); i runs east, j south, both from 0. */
    int at(int i, int j) {
        return (i + 2) + (j + 2) * w;
    }

    /**
     * Sets the data constraints of this level: sample {@code s} at fractional node position
     * {@code (fi[s], fj[s])} in this level's lattice units. Where several samples share a nearest node the
     * closest one wins.
     *
     * @return the number of constrained nodes
     */
    int constrain(double[] fi, double[] fj, double[] value) {
        java.util.Arrays.fill(slot, -1);
        for (int s = 0; s < value.length; s++) {
            int i = clamp((int) Math.round(fi[s]), nx), j = clamp((int) Math.round(fj[s]), ny);
            int k = at(i, j);
            int prev = slot[k];
            if (prev < 0 || offset2(fi[s], fj[s], i, j) < offset2(fi[prev], fj[prev], i, j)) {
                slot[k] = s;
            }
        }
        int count = 0;
        for (int v : slot) {
            if (v >= 0) {
                count++;
            }
        }
        cv = new double[count];
        cdx = new double[count];
        cdy = new double[count];
        int c = 0;
        for (int k = 0; k < u.length; k++) {
            int s = slot[k];
            if (s >= 0) {
                int i = k % w - 2, j = k / w - 2;
                cv[c] = value[s];
                // Offsets beyond half a node (samples clamped at the lattice edge) would make the Taylor step unstable.
                cdx[c] = Math.max(-0.5, Math.min(0.5, fi[s] - i));
                cdy[c] = Math.max(-0.5, Math.min(0.5, fj[s] - j));
                slot[k] = c++;
            }
        }
        return count;
    }

    private static double offset2(double fi, double fj, int i, int j) {
        return (fi - i) * (fi - i) + (fj - j) * (fj - j);
    }

    private static int clamp(int v, int n) {
        return v < 0 ? 0 : v >= n ? n - 1 : v;
    }

    /** One full sweep (ghosts, then both strip colours); returns the largest change of any node. */
    double sweep() {
        boundary();
        int strips = stripCount();
        if (strips <= 1) {
            return relaxRows(0, ny);
        }
        double m0 = colour(strips, 0), m1 = colour(strips, 1);
        return Math.max(m0, m1);
    }

    private int stripCount() {
        if ((long) nx * ny < PARALLEL_NODES) {
            return 1;
        }
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        int strips = 4 * threads;
        while (strips > 1 && ny / strips < 2) {
            strips /= 2;
        }
        return strips;
    }

    private double colour(int strips, int parity) {
        return IntStream.range(0, strips).filter(s -> s % 2 == parity).parallel()
                .mapToDouble(s -> relaxRows(s * ny / strips, (s + 1) * ny / strips))
                .max().orElse(0);
    }

    private double relaxRows(int j0, int j1) {
        double maxChange = 0;
        final double[] u = this.u;
        final int w = this.w, w2 = 2 * w;
        for (int j = j0; j < j1; j++) {
            int k = at(0, j);
            for (int i = 0; i < nx; i++, k++) {
                double change;
                int c = slot[k];
                if (c < 0) {
                    double sides = u[k - 1] + u[k + 1] + u[k - w] + u[k + w];
                    double diag = u[k - w - 1] + u[k - w + 1] + u[k + w - 1] + u[k + w + 1];
                    double far = u[k - 2] + u[k + 2] + u[k - w2] + u[k + w2];
                    change = OMEGA * (a1 * sides + a2 * diag + a3 * far - u[k]);
                } else {
                    change = taylor(k, c) - u[k];
                }
                u[k] += change;
                double a = Math.abs(change);
                if (a > maxChange) {
                    maxChange = a;
                }
            }
        }
        return maxChange;
    }

    /**
     * The node value whose first-order Taylor expansion, with central differences from the neighbours,
     * reaches the sample held by constraint {@code c}. First order on purpose: the neighbours' weights sum
     * to {@code |dx| + |dy| <= 1}, so coupled constraints never amplify each other during the sweeps; solving
     * the second-order expansion for the node divides by {@code 1 - dx^2 - dy^2} and diverged on dense data.
     */
    private double taylor(int k, int c) {
        double dx = cdx[c], dy = cdy[c];
        if (dx == 0 && dy == 0) {
            return cv[c];
        }
        return cv[c] - dx * (u[k + 1] - u[k - 1]) / 2 - dy * (u[k + w] - u[k - w]) / 2;
    }

    /** Fills the two ghost rows and columns from the free-edge conditions. */
    void boundary() {
        final double[] u = this.u;
        for (int j = 0; j < ny; j++) {
            int west = at(0, j), east = at(nx - 1, j);
            u[west - 1] = 2 * u[west] - u[west + 1];
            u[east + 1] = 2 * u[east] - u[east - 1];
        }
        for (int i = 0; i < nx; i++) {
            int north = at(i, 0), south = at(i, ny - 1);
            u[north - w] = 2 * u[north] - u[north + w];
            u[south + w] = 2 * u[south] - u[south - w];
        }
        corner(at(0, 0), -1, -w);
        corner(at(nx - 1, 0), 1, -w);
        corner(at(0, ny - 1), -1, w);
        corner(at(nx - 1, ny - 1), 1, w);
        for (int j = 0; j < ny; j++) {
            secondGhost(at(0, j), -1, w);
            secondGhost(at(nx - 1, j), 1, w);
        }
        for (int i = 0; i < nx; i++) {
            secondGhost(at(i, 0), -w, 1);
            secondGhost(at(i, ny - 1), w, 1);
        }
    }

    /** Zero twist at a corner node {@code k}: the ghost diagonal outside it, {@code out} and {@code up} outward steps. */
    private void corner(int k, int out, int up) {
        u[k + out + up] = u[k - out + up] + u[k + out - up] - u[k - out - up];
    }

    /**
     * Second ghost outside edge node {@code k} ({@code out} the outward step, {@code along} the step along
     * the edge): zero outward derivative of {@code (1 - T) D2 u - T u} by central differences.
     */
    private void secondGhost(int k, int out, int along) {
        double inner = u[k - out], ghost = u[k + out];
        double alongInner = u[k - out + along] - 2 * inner + u[k - out - along];
        double alongGhost = u[k + out + along] - 2 * ghost + u[k + out - along];
        u[k + 2 * out] = u[k - 2 * out] - 2 * inner + 2 * ghost + alongInner - alongGhost
                - edge * (inner - ghost);
    }
}
