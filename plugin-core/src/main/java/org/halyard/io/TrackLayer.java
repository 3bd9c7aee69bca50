package org.halyard.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.halyard.survey.LineQc;
import org.halyard.survey.TrackFeature;

/**
 * The {@code tracks} layer of {@code halyard.gpkg}: one LINESTRING per line and sensor with the line's QC
 * figures, as a {@link FeatureLayer} for {@link GeoPackageWriter}. NaN figures become NULL.
 *
 * <p>Columns: line, sensor, kind (traverse/tie), samples, length_m, mean_speed_ms, median_interval_s,
 * gaps, altitude_mean_m, altitude_max_m, altitude_over_limit, spikes, noise_nt, spacing_median_m,
 * spacing_over_limit, levelling_nt.
 */
public final class TrackLayer {

    /** The layer's name in the GeoPackage. */
    public static final String NAME = "tracks";

    private TrackLayer() {
    }

    /**
     * The layer of {@code tracks} in CRS {@code crsCode} (x easting, y northing, m).
     */
    public static FeatureLayer of(List<TrackFeature> tracks, String crsCode) {
        FeatureLayer.ColumnType t = FeatureLayer.ColumnType.TEXT, r = FeatureLayer.ColumnType.REAL,
                i = FeatureLayer.ColumnType.INTEGER;
        List<FeatureLayer.Column> cols = List.of(col("line", t), col("sensor", t), col("kind", t), col("samples", i),
                col("length_m", r), col("mean_speed_ms", r), col("median_interval_s", r), col("gaps", i),
                col("altitude_mean_m", r), col("altitude_max_m", r), col("altitude_over_limit", r), col("spikes", i),
                col("noise_nt", r), col("spacing_median_m", r), col("spacing_over_limit", r), col("levelling_nt", r));
        List<FeatureLayer.Feature> features = new ArrayList<>(tracks.size());
        long id = 1;
        for (TrackFeature tf : tracks) {
            LineQc q = tf.qc();
            Map<String, Object> a = new LinkedHashMap<>();
            a.put("line", tf.line());
            a.put("sensor", tf.sensor());
            a.put("kind", q.tie() ? "tie" : "traverse");
            a.put("samples", (long) q.samples());
            a.put("length_m", real(q.lengthM()));
            a.put("mean_speed_ms", real(q.meanSpeedMs()));
            a.put("median_interval_s", real(q.medianIntervalS()));
            a.put("gaps", (long) q.gaps());
            a.put("altitude_mean_m", real(q.altitudeMeanM()));
            a.put("altitude_max_m", real(q.altitudeMaxM()));
            a.put("altitude_over_limit", real(q.altitudeOverLimit()));
            a.put("spikes", (long) q.spikes());
            a.put("noise_nt", real(q.noiseNt()));
            a.put("spacing_median_m", real(q.spacingMedianM()));
            a.put("spacing_over_limit", real(q.spacingOverLimit()));
            a.put("levelling_nt", real(q.levellingNt()));
            features.add(new FeatureLayer.Feature(id++, tf.geometry(), a));
        }
        return new FeatureLayer(NAME, "LineString", crsCode, cols, features);
    }

    private static FeatureLayer.Column col(String n, FeatureLayer.ColumnType type) {
        return new FeatureLayer.Column(n, type);
    }

    private static Double real(double v) {
        return Double.isNaN(v) ? null : v;
    }
}
