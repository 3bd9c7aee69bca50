package org.halyard.survey;

/**
 * One magnetometer of the towed array and where it sits relative to the array reference point.
 *
 * @param column  the CSV column holding its total-field readings (nT); also the sensor's name in outputs
 * @param acrossM offset across the track in metres, positive to starboard
 * @param alongM  offset along the track in metres, positive forward
 */
public record SensorSpec(String column, double acrossM, double alongM) {

    public SensorSpec {
        if (column == null || column.isBlank()) {
            throw new IllegalArgumentException("a sensor needs a column name");
        }
        if (!Double.isFinite(acrossM) || !Double.isFinite(alongM)) {
            throw new IllegalArgumentException("sensor '" + column + "': offsets must be finite metres");
        }
    }
}
