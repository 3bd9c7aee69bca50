package org.halyard.targets;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.simplify.DouglasPeuckerSimplifier;

/**
 * Finds straight or gently curved ridges of the analytic signal tens of metres long: cables, pipelines,
 * chains.
 *
 * <p><b>Algorithm</b> (our own composition of standard steps):
 * <ol>
 * <li>smoothing: a Gaussian of {@code smoothingM} ({@link GaussianSmoother}), then one of
 *     {@code strikeSmoothingM} along the local strike ({@link StrikeSmoother});</li>
 * <li>ridge cells by the Hessian test of {@link RidgeCells}, above {@code background + k sigma};</li>
 * <li>linking: 8-connected ridge cells whose directions differ by at most {@code maxTurnDeg} form one piece
 *     (union-find);</li>
 * <li>merging: pieces whose principal axes agree, whose facing ends are within {@code maxGapM} (or the
 *     shorter piece's length) and lie on each other's axis (within {@code labelDistanceM}) are joined,
 *     repeatedly, bridging gaps left by noise or by an object lying on the line;</li>
 * <li>a piece is a feature when it spans at least {@code minLengthM} along its axis and its cells' ridge
 *     directions follow the axis within {@code maxDeviationDeg} on average (this rejects the radial
 *     pattern around compact peaks);</li>
 * <li>the polyline is the mean position of the ridge cells in bins of {@code vertexSpacingM} along the
 *     axis, simplified by Douglas-Peucker (JTS) with a tolerance of one cell.</li>
 * </ol>
 *
 * <p><b>Accuracy:</b> on a straight noise-free ridge the azimuth is found to a few tenths of a degree
 * (the fit averages hundreds of cells); the position to a fraction of a cell.
 *
 * <p><b>Limitations:</b> a feature curving by more than about 60 degrees over its length is split or
 * dropped (the binning runs along one axis); crossing features are found as separate pieces.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class LinearFeatureDetector {

    /** Side of the tiles of the local level, m: several times a cable's ridge width. */
    static final double BACKGROUND_TILE_M = 20;

    /**
     * Window (standard deviation) over which the Hessian is averaged to find the ridge strike, m: about a
     * ridge's width, so that the crest's negative curvature across outweighs the beads' along it.
     */
    static final double ORIENTATION_M = 2;

    /** Smallest piece considered for merging, cells along its axis. */
    static final int MIN_PIECE_CELLS = 3;

    private LinearFeatureDetector() {
    }

    /**
     * The linear features of an analytic-signal grid (nT/m; x east, y north, row 0 north), depth unknown
     * and no asset yet.
     *
     * @param progress reports 0 to 100 and is checked for cancellation between steps
     */
    public static List<LinearFeature> detect(Grid analyticSignal, LinearFeatureOptions o, Progress progress) {
        return detect(analyticSignal, NoiseEstimate.of(analyticSignal), o, progress);
    }

    /**
     * As {@link #detect(Grid, LinearFeatureOptions, Progress)} with the grid's noise estimate already made.
     *
     * @param noise {@link NoiseEstimate#of} of {@code analyticSignal}, nT/m
     */
    public static List<LinearFeature> detect(Grid analyticSignal, NoiseEstimate noise, LinearFeatureOptions o,
                                             Progress progress) {
        Grid smooth = StrikeSmoother.smooth(GaussianSmoother.smooth(analyticSignal, o.smoothingM()),
                o.strikeSmoothingM(), ORIENTATION_M);
        LocalBackground level = LocalBackground.of(smooth, BACKGROUND_TILE_M, noise.background());
        RidgeCells ridges = RidgeCells.find(smooth, level, o.thresholdFactor() * noise.sigma(), o);
        progress.report(40);
        progress.checkCanceled();
        List<RidgePiece> pieces = merge(link(ridges, o), ridges, o);
        progress.report(80);
        progress.checkCanceled();
        GeometryFactory gf = new GeometryFactory();
        List<LinearFeature> out = new ArrayList<>();
        double cosDev = Math.cos(Math.toRadians(o.maxDeviationDeg()));
        for (RidgePiece p : pieces) {
            if (p.length() >= o.minLengthM() && p.alignment >= cosDev) {
                out.add(new LinearFeature(out.size() + 1, polyline(p, ridges, o, gf),
                        medianValue(p, analyticSignal), Double.NaN, Optional.empty()));
            }
        }
        progress.report(100);
        return out;
    }

    /** Pieces of 8-connected ridge cells with compatible directions. */
    static List<RidgePiece> link(RidgeCells ridges, LinearFeatureOptions o) {
        GridGeometry geo = ridges.grid().geometry();
        int[] parent = new int[geo.size()];
        Arrays.setAll(parent, i -> i);
        double maxTurn = Math.toRadians(o.maxTurnDeg());
        for (int r = 0; r < geo.rows(); r++) {
            for (int c = 0; c < geo.columns(); c++) {
                int i = geo.index(c, r);
                if (!ridges.isRidge(i)) {
                    continue;
                }
                // Forward half of the 8-neighbourhood: each pair is seen once.
                int[][] fwd = {{1, 0}, {-1, 1}, {0, 1}, {1, 1}};
                for (int[] d : fwd) {
                    int cc = c + d[0], rr = r + d[1];
                    if (cc < 0 || cc >= geo.columns() || rr >= geo.rows()) {
                        continue;
                    }
                    int j = geo.index(cc, rr);
                    if (ridges.isRidge(j) && turn(ridges.direction(i), ridges.direction(j)) <= maxTurn) {
                        parent[find(parent, i)] = find(parent, j);
                    }
                }
            }
        }
        java.util.Map<Integer, List<Integer>> groups = new java.util.HashMap<>();
        for (int i = 0; i < parent.length; i++) {
            if (ridges.isRidge(i)) {
                groups.computeIfAbsent(find(parent, i), k -> new ArrayList<>()).add(i);
            }
        }
        List<RidgePiece> pieces = new ArrayList<>();
        for (List<Integer> g : groups.values()) {
            if (g.size() >= MIN_PIECE_CELLS) {
                RidgePiece p = new RidgePiece(g.stream().mapToInt(Integer::intValue).toArray(), ridges);
                if (p.length() >= MIN_PIECE_CELLS * geo.cellSize()) {
                    pieces.add(p);
                }
            }
        }
        return pieces;
    }

    /** Joins collinear pieces until none continues another, longest first. */
    static List<RidgePiece> merge(List<RidgePiece> pieces, RidgeCells ridges, LinearFeatureOptions o) {
        List<RidgePiece> work = new ArrayList<>(pieces);
        boolean merged = true;
        while (merged) {
            merged = false;
            work.sort(Comparator.comparingDouble(RidgePiece::length).reversed());
            outer:
            for (int a = 0; a < work.size(); a++) {
                for (int b = a + 1; b < work.size(); b++) {
                    if (work.get(a).continues(work.get(b), o.maxTurnDeg(), o.maxGapM(), o.labelDistanceM())) {
                        RidgePiece m = RidgePiece.merge(List.of(work.get(a), work.get(b)), ridges);
                        work.remove(b);
                        work.set(a, m);
                        merged = true;
                        break outer;
                    }
                }
            }
        }
        return work;
    }

    private static LineString polyline(RidgePiece p, RidgeCells ridges, LinearFeatureOptions o, GeometryFactory gf) {
        GridGeometry geo = ridges.grid().geometry();
        int bins = Math.max(2, (int) Math.ceil(p.length() / o.vertexSpacingM()));
        double[] sx = new double[bins], sy = new double[bins];
        int[] n = new int[bins];
        for (int i : p.cells) {
            double x = geo.x(i % geo.columns()), y = geo.y(i / geo.columns());
            int b = (int) Math.min(bins - 1, Math.floor((p.along(x, y) - p.minT) / p.length() * bins));
            sx[b] += x;
            sy[b] += y;
            n[b]++;
        }
        List<Coordinate> pts = new ArrayList<>();
        for (int b = 0; b < bins; b++) {
            if (n[b] > 0) {
                pts.add(new Coordinate(sx[b] / n[b], sy[b] / n[b]));
            }
        }
        if (pts.size() < 2) {
            double[] e = p.ends();
            pts = List.of(new Coordinate(e[0], e[1]), new Coordinate(e[2], e[3]));
        }
        // Bin means sit half a bin inside the ends: slide the end vertices out to the ridge's extent.
        extend(pts.get(0), p, p.minT);
        extend(pts.get(pts.size() - 1), p, p.maxT);
        LineString raw = gf.createLineString(pts.toArray(new Coordinate[0]));
        return (LineString) DouglasPeuckerSimplifier.simplify(raw, geo.cellSize());
    }

    private static void extend(Coordinate c, RidgePiece p, double toT) {
        double shift = toT - p.along(c.x, c.y);
        c.x += shift * p.ux;
        c.y += shift * p.uy;
    }

    private static double medianValue(RidgePiece p, Grid g) {
        double[] v = Arrays.stream(p.cells).mapToDouble(g::get).toArray();
        return NoiseEstimate.median(v);
    }

    /** Angle between two undirected directions, radians, 0 to pi/2. */
    static double turn(double a, double b) {
        double d = Math.abs(a - b) % Math.PI;
        return Math.min(d, Math.PI - d);
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }
}
