package org.halyard.survey;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.hull.ConcaveHull;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.MultiPoint;

/**
 * Track geometries and the coverage outline.
 *
 * <p><b>Algorithm:</b> one JTS LineString per line and sensor, simplified by Douglas-Peucker to a
 * tolerance ({@link TrackSimplifier}); the coverage outline is the JTS concave hull
 * ({@link ConcaveHull#concaveHullByLength}) of sensor positions taken every few metres, with a longest
 * edge of twice the spacing limit (or of 50 m without one), so that the outline follows the survey's
 * edges without bridging large holes. On large surveys the point step grows to keep about
 * {@value #MAX_OUTLINE_POINTS} points, and the longest edge with it (twice the step): the outline is then
 * coarser and holes smaller than that edge are not shown.
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class TrackBuilder {

    private static final GeometryFactory GF = new GeometryFactory();
    /** Longest outline edge when there is no spacing limit, m. */
    static final double DEFAULT_OUTLINE_EDGE_M = 50;
    /** Point budget of the outline's triangulation. */
    static final int MAX_OUTLINE_POINTS = 20000;

    private TrackBuilder() {
    }

    static List<TrackFeature> tracks(SurveyLines lines, List<SensorTrack> sensors, List<LineQc> qc, double tolM) {
        List<TrackFeature> out = new ArrayList<>();
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            if (e - s < 2) {
                continue;
            }
            for (SensorTrack st : sensors) {
                int[] keep = TrackSimplifier.keep(st.x(), st.y(), s, e, tolM);
                Coordinate[] c = new Coordinate[keep.length];
                for (int k = 0; k < keep.length; k++) {
                    c[k] = new Coordinate(st.x()[keep[k]], st.y()[keep[k]]);
                }
                out.add(new TrackFeature(lines.lineId(l), st.spec().column(), GF.createLineString(c), qc.get(l)));
            }
        }
        return out;
    }

    static Geometry outline(SurveyLines lines, List<SensorTrack> sensors, double[] distanceM, double spacingLimitM) {
        double total = 0;
        for (int l = 0; l < lines.lineCount(); l++) {
            if (lines.end(l) > lines.start(l)) {
                total += distanceM[lines.end(l) - 1] - distanceM[lines.start(l)];
            }
        }
        double edge = Double.isNaN(spacingLimitM) ? DEFAULT_OUTLINE_EDGE_M : 2 * spacingLimitM;
        // at most about MAX_OUTLINE_POINTS points (Delaunay cost); the edge grows with the step if needed
        double step = Math.max(edge / 2, 2 * total / MAX_OUTLINE_POINTS);
        edge = Math.max(edge, 2 * step);
        List<Coordinate> pts = new ArrayList<>();
        for (int l = 0; l < lines.lineCount(); l++) {
            int s = lines.start(l), e = lines.end(l);
            // the outermost sensors bound the swath; inner ones add nothing to the outline
            for (SensorTrack st : sensors.size() > 2 ? List.of(sensors.get(0), sensors.get(sensors.size() - 1)) : sensors) {
                double next = Double.NEGATIVE_INFINITY;
                for (int i = s; i < e; i++) {
                    if (distanceM[i] >= next || i == e - 1) {
                        pts.add(new Coordinate(st.x()[i], st.y()[i]));
                        next = distanceM[i] + step;
                    }
                }
            }
        }
        MultiPoint mp = GF.createMultiPointFromCoords(pts.toArray(new Coordinate[0]));
        if (pts.size() < 3) {
            return mp.convexHull();
        }
        return ConcaveHull.concaveHullByLength(mp, edge);
    }
}
