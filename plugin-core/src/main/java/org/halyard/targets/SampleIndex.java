package org.halyard.targets;

import java.util.Arrays;

/**
 * A bucket index over the horizontal positions of {@link LineSamples}, for the many "samples near this
 * pick" queries of a survey with millions of readings.
 *
 * <p><b>Algorithm:</b> samples sorted by square bucket (counting sort); a query scans the buckets its
 * circle touches. Cost per query proportional to the samples in those buckets.
 *
 * <p><b>Thread safety:</b> immutable after construction.
 */
public final class SampleIndex {

    private final LineSamples samples;
    private final double bucket;
    private final double x0, y0;
    private final int nx, ny;
    /** Sample indices ordered by bucket; bucket b holds {@code order[start[b] .. start[b+1])}. */
    private final int[] order;
    private final int[] start;

    /**
     * Indexes {@code samples} with square buckets of {@code bucketM} metres (about the query radius).
     */
    public SampleIndex(LineSamples samples, double bucketM) {
        if (!(bucketM > 0)) {
            throw new IllegalArgumentException("sample index bucket must be positive metres, got " + bucketM);
        }
        this.samples = samples;
        this.bucket = bucketM;
        double[] x = samples.x(), y = samples.y();
        double minX = Arrays.stream(x).min().orElse(0), maxX = Arrays.stream(x).max().orElse(0);
        double minY = Arrays.stream(y).min().orElse(0), maxY = Arrays.stream(y).max().orElse(0);
        x0 = minX;
        y0 = minY;
        nx = (int) Math.min(1 << 15, Math.floor((maxX - minX) / bucketM) + 1);
        ny = (int) Math.min(1 << 15, Math.floor((maxY - minY) / bucketM) + 1);
        int[] key = new int[x.length];
        start = new int[nx * ny + 1];
        for (int i = 0; i < x.length; i++) {
            key[i] = bucketOf(x[i], y[i]);
            start[key[i] + 1]++;
        }
        for (int b = 0; b < nx * ny; b++) {
            start[b + 1] += start[b];
        }
        order = new int[x.length];
        int[] fill = Arrays.copyOf(start, start.length);
        for (int i = 0; i < x.length; i++) {
            order[fill[key[i]]++] = i;
        }
    }

    /** The samples indexed. */
    public LineSamples samples() {
        return samples;
    }

    private int bucketOf(double x, double y) {
        int bx = (int) Math.max(0, Math.min(nx - 1, Math.floor((x - x0) / bucket)));
        int by = (int) Math.max(0, Math.min(ny - 1, Math.floor((y - y0) / bucket)));
        return by * nx + bx;
    }

    /** Indices of the samples within {@code radius} metres (horizontally) of (px, py), ascending. */
    public int[] near(double px, double py, double radius) {
        if (samples.size() == 0) {
            return new int[0];
        }
        int bx0 = (int) Math.max(0, Math.floor((px - radius - x0) / bucket));
        int bx1 = (int) Math.min(nx - 1, Math.floor((px + radius - x0) / bucket));
        int by0 = (int) Math.max(0, Math.floor((py - radius - y0) / bucket));
        int by1 = (int) Math.min(ny - 1, Math.floor((py + radius - y0) / bucket));
        double r2 = radius * radius;
        double[] x = samples.x(), y = samples.y();
        int[] out = new int[64];
        int n = 0;
        for (int by = by0; by <= by1; by++) {
            for (int bx = bx0; bx <= bx1; bx++) {
                int b = by * nx + bx;
                for (int k = start[b]; k < start[b + 1]; k++) {
                    int i = order[k];
                    double dx = x[i] - px, dy = y[i] - py;
                    if (dx * dx + dy * dy <= r2) {
                        if (n == out.length) {
                            out = Arrays.copyOf(out, 2 * n);
                        }
                        out[n++] = i;
                    }
                }
            }
        }
        int[] r = Arrays.copyOf(out, n);
        Arrays.sort(r);
        return r;
    }
}
