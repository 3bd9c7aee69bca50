package org.halyard.io;

import java.util.Locale;
import java.util.function.DoubleFunction;

/**
 * Writes IAGA-2002 text per the format description (IAGA Division V working group; INTERMAGNET):
 * twelve header records with labels from column 2 and values from column 25, ending with '|' in column
 * 70; comment records " # ..."; the data header "DATE TIME DOY" and four element columns; data records.
 * The station code ZZQ is fictional.
 */
public final class Iaga2002Fixture {

    private Iaga2002Fixture() {
    }

    /** A header or comment record padded to 70 characters with '|' last. */
    static String record(String label, String value) {
        String s = String.format(Locale.ROOT, " %-23s%s", label, value);
        return String.format(Locale.ROOT, "%-69s|%n", s);
    }

    /**
     * A file of {@code n} samples every {@code dtS} seconds from epoch second {@code t0}; {@code values}
     * gives the four element values at a time; {@code elements} e.g. "XYZF" or "HDZF".
     */
    public static String file(String elements, double t0, double dtS, int n, DoubleFunction<double[]> values) {
        StringBuilder sb = new StringBuilder();
        sb.append(record("Format", "IAGA-2002"));
        sb.append(record("Source of Data", "Halyard test fixture"));
        sb.append(record("Station Name", "Quillan Skerry"));
        sb.append(record("IAGA Code", "ZZQ"));
        sb.append(record("Geodetic Latitude", "55.100"));
        sb.append(record("Geodetic Longitude", "3.200"));
        sb.append(record("Elevation", "12"));
        sb.append(record("Reported", elements));
        sb.append(record("Sensor Orientation", elements));
        sb.append(record("Digital Sampling", "0.1 second"));
        sb.append(record("Data Interval Type", dtS >= 60 ? "Filtered 1-Minute (00:15-01:45)" : "Filtered 1-Second"));
        sb.append(record("Data Type", "variation"));
        sb.append(String.format(Locale.ROOT, "%-69s|%n", " # written by a Halyard test"));
        sb.append(String.format(Locale.ROOT, "%-69s|%n", String.format(Locale.ROOT,
                "DATE       TIME         DOY     ZZQ%c      ZZQ%c      ZZQ%c      ZZQ%c", elements.charAt(0),
                elements.charAt(1), elements.charAt(2), elements.charAt(3))));
        for (int i = 0; i < n; i++) {
            double t = t0 + i * dtS;
            java.time.ZonedDateTime z = java.time.Instant.ofEpochMilli(Math.round(t * 1000)).atZone(java.time.ZoneOffset.UTC);
            double[] v = values.apply(t);
            sb.append(String.format(Locale.ROOT, "%04d-%02d-%02d %02d:%02d:%06.3f %03d   %10.2f%10.2f%10.2f%10.2f%n",
                    z.getYear(), z.getMonthValue(), z.getDayOfMonth(), z.getHour(), z.getMinute(),
                    z.getSecond() + z.getNano() / 1e9, z.getDayOfYear(), v[0], v[1], v[2], v[3]));
        }
        return sb.toString();
    }
}
