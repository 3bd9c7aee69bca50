package org.halyard.survey;

/**
 * One sensor's processed record: where each reading was taken and its corrected value.
 *
 * @param spec     the sensor and its offsets
 * @param x        sensor easting per row, m
 * @param y        sensor northing per row, m
 * @param depth    sensor depth below the sea surface per row, m, positive down, NaN where unknown (the
 *                 array's; shared by all sensors)
 * @param altitude sensor height above the seabed per row, m, NaN where unknown (shared)
 * @param value    corrected total field per row (diurnal, spikes, levelling), nT; NaN where unusable
 * @param flags    {@link SampleFlags} per row
 */
public record SensorTrack(SensorSpec spec, double[] x, double[] y, float[] depth, float[] altitude,
                          double[] value, byte[] flags) {

    /** Number of rows. */
    public int size() {
        return x.length;
    }
}
