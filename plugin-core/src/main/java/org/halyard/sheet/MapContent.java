package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;

/**
 * What a map frame shows, bottom to top: rasters, then vector lines, then targets.
 *
 * @param rasters gridded layers, the first drawn lowest
 * @param vectors line layers
 * @param targets target marks
 */
public record MapContent(List<RasterLayer> rasters, List<VectorLayer> vectors, List<TargetMark> targets) {

    public MapContent {
        rasters = List.copyOf(rasters);
        vectors = List.copyOf(vectors);
        targets = List.copyOf(targets);
    }

    /** Names of all layers, as the title block lists them. */
    public List<String> layerNames() {
        List<String> n = new ArrayList<>();
        rasters.forEach(r -> n.add(r.name() + " (" + r.unit() + ")"));
        vectors.forEach(v -> n.add(v.name()));
        if (!targets.isEmpty()) {
            n.add("Targets (" + targets.size() + ")");
        }
        return n;
    }

    /**
     * The ground box holding every layer, {@code {xmin, ymin, xmax, ymax}} in metres.
     *
     * @throws IllegalArgumentException when there is nothing to map
     */
    public double[] extent() {
        double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                Double.NEGATIVE_INFINITY};
        for (RasterLayer r : rasters) {
            var g = r.grid().geometry();
            grow(b, g.west(), g.south());
            grow(b, g.east(), g.north());
        }
        for (VectorLayer v : vectors) {
            for (Polyline p : v.lines()) {
                double[] xs = p.x(), ys = p.y();
                for (int i = 0; i < xs.length; i++) {
                    grow(b, xs[i], ys[i]);
                }
            }
        }
        targets.forEach(t -> grow(b, t.x(), t.y()));
        if (!(b[2] >= b[0])) {
            throw new IllegalArgumentException("nothing to map: give at least one grid, vector layer or target");
        }
        return b;
    }

    private static void grow(double[] b, double x, double y) {
        b[0] = Math.min(b[0], x);
        b[1] = Math.min(b[1], y);
        b[2] = Math.max(b[2], x);
        b[3] = Math.max(b[3], y);
    }
}
