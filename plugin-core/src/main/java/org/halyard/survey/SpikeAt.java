package org.halyard.survey;

/**
 * A spike found and repaired.
 *
 * @param line   line identifier
 * @param sensor sensor column
 * @param row    row in the line data
 * @param x      sensor easting, m
 * @param y      sensor northing, m
 * @param time   epoch seconds
 */
public record SpikeAt(String line, String sensor, int row, double x, double y, double time) {
}
