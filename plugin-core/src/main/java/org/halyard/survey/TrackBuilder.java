package org.halyard.survey;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.hull.ConcaveHull;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiPoint;
import org.locationtech.jts.simplify.DouglasPeuckerSimplifier;

/**
 * Track geometries and the coverage outline.
 *
 * <p><b>Algorithm:</b> one JTS LineString per line and sensor, simplified by Douglas-Peucker to a
 * tolerance (JTS {@link DouglasPeuckerSimplifier}); the coverage outline is the JTS concave hull
 * ({@link ConcaveHull#concaveHullByLength}) of sensor positions taken every few metres, with a longest
 * edge of twice the spacing limit (or of 50 m without one), so that the outline follows the survey's
 * edges without bridging large holes.
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class TrackBuilder {

    private static final GeometryFactory GF = new GeometryFactory();
    /** Longest outline edge when there is no spacing limit, m. */
    static final double DEFAULT_OUTLINE_EDGE_M = 50;

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
                Coordinate[] c = new Coordinate[e - s];
                for (int i = s; i < e; i++) {
                    c[i - s] = new Coordinate(st.x()[i], st.y()[i]);
                }
                Geometry g = GF.createLineString(c);
                if (tolM > 0) {
                    g = DouglasPeuckerSimplifier.simplify(g, tolM);
                }
                out.add(new TrackFeature(lines.lineId(l), st.spec().column(), (LineString) g, qc.get(l)));
            }
        }
        return out;
    }

    static Geometry outline(SurveyLines lines, List<SensorTrack> sensors, double[] distanceM, double spacingLimitM) {
        double edge = Double.isNaN(spacingLimitM) ? DEFAULT_OUTLINE_EDGE_M : 2 * spacingLimitM;
        double step = edge / 2;
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
