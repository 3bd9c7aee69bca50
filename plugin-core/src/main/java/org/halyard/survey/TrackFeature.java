package org.halyard.survey;

import org.locationtech.jts.geom.LineString;

/**
 * One line's track for one sensor, with the line's QC figures: a feature of the {@code tracks} layer.
 *
 * @param line     line identifier
 * @param sensor   sensor column
 * @param geometry the sensor's track in the recipe CRS (simplified to the track tolerance), m
 * @param qc       the line's QC figures
 */
public record TrackFeature(String line, String sensor, LineString geometry, LineQc qc) {
}
