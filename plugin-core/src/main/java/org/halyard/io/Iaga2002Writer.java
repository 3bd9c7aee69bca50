package org.halyard.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;

/**
 * Writes geomagnetic XYZF samples in the IAGA-2002 exchange format (IAGA Division V, adopted 2001; the
 * format INTERMAGNET distributes).
 *
 * <p><b>Layout</b> (format description, NOAA NCEI "IAGA 2002 Data Exchange Format"): every record is 70
 * characters. Twelve mandatory header records and any comment records start with a space, carry their
 * label from column 2 and their value from column 25, and end with {@code |} in column 70. Then one data
 * header record {@code DATE TIME DOY <code>X <code>Y <code>Z <code>F |}, then data records
 * {@code yyyy-MM-dd HH:mm:ss.SSS DDD} followed by four values of 10 columns with two decimals, the first
 * after three spaces (columns 31 to 70; this column placement is from memory of published files, and the
 * test reads it back by whitespace as readers do). A missing value is written {@code 99999.00}. Lines end
 * with LF.
 *
 * <p>Units: nT; X north, Y east, Z down; times UTC.
 */
public final class Iaga2002Writer {

    /** The value IAGA-2002 uses for a missing sample. */
    public static final double MISSING = 99999.00;

    private static final DateTimeFormatter STAMP =
            DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss.SSS DDD", Locale.ROOT).withZone(ZoneOffset.UTC);

    private Iaga2002Writer() {
    }

    /**
     * The station description of the header.
     *
     * @param source         institute or program that produced the data
     * @param stationName    station name, spelt in full
     * @param code           three-letter station code
     * @param latitudeDeg    geodetic latitude, degrees north
     * @param longitudeDeg   geodetic longitude, degrees east (0 to 360 as the format asks)
     * @param elevationM     elevation above sea level, m
     * @param sampling       digital sampling description, e.g. {@code 1 second}
     * @param intervalType   data interval type, e.g. {@code 1-second (instantaneous)}
     * @param dataType       data type, e.g. {@code Provisional} or {@code Variation}
     * @param comments       comment lines (each at most 66 characters)
     */
    public record Header(String source, String stationName, String code, double latitudeDeg, double longitudeDeg,
                         double elevationM, String sampling, String intervalType, String dataType,
                         List<String> comments) { }

    /**
     * Writes the file. {@code NaN} values are written as {@link #MISSING}.
     *
     * @param epochMs sample times, ms since 1970-01-01 UTC, increasing
     * @param x       north component, nT
     * @param y       east component, nT
     * @param z       down component, nT
     * @param f       total field, nT
     */
    public static void write(Path file, Header h, long[] epochMs, double[] x, double[] y, double[] z, double[] f) {
        if (x.length != epochMs.length || y.length != epochMs.length || z.length != epochMs.length
                || f.length != epochMs.length) {
            throw new IllegalArgumentException(file + ": IAGA-2002 columns must all have " + epochMs.length + " values");
        }
        if (h.code() == null || !h.code().matches("[A-Z]{3}")) {
            throw new IllegalArgumentException(file + ": IAGA code must be three capital letters, got " + h.code());
        }
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.US_ASCII)) {
            header(w, "Format", "IAGA-2002");
            header(w, "Source of Data", h.source());
            header(w, "Station Name", h.stationName());
            header(w, "IAGA Code", h.code());
            header(w, "Geodetic Latitude", String.format(Locale.ROOT, "%.3f", h.latitudeDeg()));
            header(w, "Geodetic Longitude", String.format(Locale.ROOT, "%.3f", (h.longitudeDeg() + 360) % 360));
            header(w, "Elevation", String.format(Locale.ROOT, "%.0f", h.elevationM()));
            header(w, "Reported", "XYZF");
            header(w, "Sensor Orientation", "XYZ");
            header(w, "Digital Sampling", h.sampling());
            header(w, "Data Interval Type", h.intervalType());
            header(w, "Data Type", h.dataType());
            for (String c : h.comments()) {
                record(w, " # " + c);
            }
            String c = h.code();
            record(w, String.format(Locale.ROOT, "%-11s%-13s%-8s%-10s%-10s%-10s%-7s", "DATE", "TIME", "DOY",
                    c + "X", c + "Y", c + "Z", c + "F"));
            StringBuilder sb = new StringBuilder(72);
            for (int i = 0; i < epochMs.length; i++) {
                if (i > 0 && epochMs[i] <= epochMs[i - 1]) {
                    throw new IllegalArgumentException(file + ": sample times must increase (sample " + i + ")");
                }
                sb.setLength(0);
                sb.append(STAMP.format(Instant.ofEpochMilli(epochMs[i]))).append("   ");
                for (double v : new double[] {x[i], y[i], z[i], f[i]}) {
                    sb.append(String.format(Locale.ROOT, "%10.2f", Double.isNaN(v) ? MISSING : v));
                }
                w.write(sb.toString());
                w.write('\n');
            }
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), e);
        }
    }

    private static void header(BufferedWriter w, String label, String value) throws IOException {
        record(w, String.format(Locale.ROOT, " %-23s%s", label, value));
    }

    /** A header or comment record: padded to 69 characters, then the bar in column 70. */
    private static void record(BufferedWriter w, String text) throws IOException {
        if (text.length() > 69) {
            throw new IllegalArgumentException("IAGA-2002 header record longer than 69 characters: " + text.trim());
        }
        w.write(String.format(Locale.ROOT, "%-69s|", text));
        w.write('\n');
    }
}
