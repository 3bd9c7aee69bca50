package org.halyard.survey;

import java.util.Arrays;
import java.util.List;

/**
 * Survey line data in columns: one primitive array per quantity, rows grouped by line, line identifiers
 * held once per line. Memory is about 40 bytes per row plus 8 per sensor.
 *
 * <p>Rows of line {@code l} are {@code [start(l), end(l))}. Times increase strictly within a line (checked
 * on import). Without a time column, {@link #time()} holds the row index within the line in seconds and
 * {@link #hasTime()} is false.
 *
 * <p><b>Thread safety:</b> the arrays are shared, not copied; treat them as read-only once built.
 */
public final class SurveyLines {

    private final String source;
    private final String[] lineIds;
    private final int[] lineStart;
    private final boolean hasTime;
    private final double[] time;
    private final double[] x;
    private final double[] y;
    private final float[] altitude;
    private final float[] depth;
    private final List<SensorSpec> sensors;
    private final double[][] values;

    /**
     * @param source    where the data came from (a file name), used in messages
     * @param lineIds   identifier of each line
     * @param lineStart first row of each line, plus the row count at the end ({@code lineIds.length + 1}
     *                  entries, non-decreasing)
     * @param hasTime   whether {@code time} holds real epoch seconds
     * @param time      epoch seconds (UTC) per row
     * @param x         reference-point easting per row, m
     * @param y         reference-point northing per row, m
     * @param altitude  sensor altitude above the seabed per row, m, NaN where unknown
     * @param depth     sensor depth below the sea surface per row, m, positive down, NaN where unknown
     * @param sensors   the sensors
     * @param values    total-field readings per sensor and row, nT, NaN where missing
     */
    public SurveyLines(String source, String[] lineIds, int[] lineStart, boolean hasTime, double[] time,
                       double[] x, double[] y, float[] altitude, float[] depth, List<SensorSpec> sensors,
                       double[][] values) {
        int n = x.length;
        if (lineStart.length != lineIds.length + 1 || lineStart[0] != 0 || lineStart[lineIds.length] != n) {
            throw new IllegalArgumentException(source + ": inconsistent line index");
        }
        if (y.length != n || time.length != n || altitude.length != n || depth.length != n
                || values.length != sensors.size()) {
            throw new IllegalArgumentException(source + ": column arrays differ in length");
        }
        for (double[] v : values) {
            if (v.length != n) {
                throw new IllegalArgumentException(source + ": sensor arrays differ in length");
            }
        }
        this.source = source;
        this.lineIds = lineIds;
        this.lineStart = lineStart;
        this.hasTime = hasTime;
        this.time = time;
        this.x = x;
        this.y = y;
        this.altitude = altitude;
        this.depth = depth;
        this.sensors = List.copyOf(sensors);
        this.values = values;
    }

    /**
     * These lines with other reference positions (e.g. after a lag shift); every other array is shared.
     *
     * @param newX reference-point easting per row, m
     * @param newY reference-point northing per row, m
     */
    public SurveyLines withPositions(double[] newX, double[] newY) {
        return new SurveyLines(source, lineIds, lineStart, hasTime, time, newX, newY, altitude, depth, sensors, values);
    }

    /** Where the data came from, for messages. */
    public String source() {
        return source;
    }

    /** Number of rows (samples of the reference point). */
    public int size() {
        return x.length;
    }

    /** Number of lines. */
    public int lineCount() {
        return lineIds.length;
    }

    /** Identifier of line {@code l}. */
    public String lineId(int l) {
        return lineIds[l];
    }

    /** First row of line {@code l}. */
    public int start(int l) {
        return lineStart[l];
    }

    /** One past the last row of line {@code l}. */
    public int end(int l) {
        return lineStart[l + 1];
    }

    /** The index of the line called {@code id}, or -1. */
    public int lineIndex(String id) {
        for (int l = 0; l < lineIds.length; l++) {
            if (lineIds[l].equals(id)) {
                return l;
            }
        }
        return -1;
    }

    /** The line holding row {@code row}. */
    public int lineOfRow(int row) {
        int k = Arrays.binarySearch(lineStart, row);
        if (k >= 0) {
            while (k + 1 < lineStart.length && lineStart[k + 1] == row) {
                k++; // skip empty lines
            }
            return k;
        }
        return -k - 2;
    }

    /** Whether {@link #time()} holds real times. */
    public boolean hasTime() {
        return hasTime;
    }

    /** Epoch seconds (UTC) per row; the row index within the line when {@link #hasTime()} is false. */
    public double[] time() {
        return time;
    }

    /** Reference-point easting per row, m. */
    public double[] x() {
        return x;
    }

    /** Reference-point northing per row, m. */
    public double[] y() {
        return y;
    }

    /** Altitude above the seabed per row, m (positive up), NaN where unknown. */
    public float[] altitude() {
        return altitude;
    }

    /** Depth below the sea surface per row, m (positive down), NaN where unknown. */
    public float[] depth() {
        return depth;
    }

    /** The sensors, in the order of {@link #values(int)}. */
    public List<SensorSpec> sensors() {
        return sensors;
    }

    /** Readings of sensor {@code s} per row, nT, NaN where missing. */
    public double[] values(int s) {
        return values[s];
    }
}
