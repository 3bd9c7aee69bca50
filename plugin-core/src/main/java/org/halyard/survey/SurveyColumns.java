package org.halyard.survey;

import java.util.List;
import java.util.Optional;

/**
 * How the columns of a survey table map to the line model (the recipe's {@code survey.columns} and
 * {@code survey.sensors}). Either {@code x}/{@code y} (recipe CRS) or {@code latitude}/{@code longitude}
 * (WGS 84 degrees) give the array reference point.
 *
 * @param line      column of the line identifier (required)
 * @param time      column of ISO 8601 UTC times, if any
 * @param x         column of easting, m, if positions are projected
 * @param y         column of northing, m
 * @param latitude  column of WGS 84 latitude, degrees north, used when {@code x}/{@code y} are absent
 * @param longitude column of WGS 84 longitude, degrees east
 * @param altitude  column of sensor height above the seabed, m, positive up, if any
 * @param depth     column of sensor depth below the sea surface, m, positive down, if any
 * @param sensors   the sensors, at least one
 */
public record SurveyColumns(String line, Optional<String> time, Optional<String> x, Optional<String> y,
                            Optional<String> latitude, Optional<String> longitude, Optional<String> altitude,
                            Optional<String> depth, List<SensorSpec> sensors) {

    public SurveyColumns {
        if (line == null || line.isBlank()) {
            throw new IllegalArgumentException("survey columns: 'line' is required");
        }
        boolean projected = x.isPresent() && y.isPresent();
        boolean geographic = latitude.isPresent() && longitude.isPresent();
        if (!projected && !geographic) {
            throw new IllegalArgumentException("survey columns: give 'x' and 'y', or 'latitude' and 'longitude'");
        }
        if (sensors == null || sensors.isEmpty()) {
            throw new IllegalArgumentException("survey: at least one sensor is required");
        }
        sensors = List.copyOf(sensors);
    }

    /** A projected mapping with the given optional time, altitude and depth columns (null for none). */
    public static SurveyColumns projected(String line, String time, String x, String y, String altitude,
                                          String depth, List<SensorSpec> sensors) {
        return new SurveyColumns(line, Optional.ofNullable(time), Optional.of(x), Optional.of(y),
                Optional.empty(), Optional.empty(), Optional.ofNullable(altitude), Optional.ofNullable(depth),
                sensors);
    }

    /**
     * The mapping of a recipe's {@code survey.columns} object: keys {@code line}, {@code time}, {@code x},
     * {@code y}, {@code altitude}, {@code depth}, {@code latitude}, {@code longitude} (all but {@code line}
     * optional), values the CSV column names.
     *
     * @throws IllegalArgumentException for an unknown key, naming the keys allowed
     */
    public static SurveyColumns fromRecipe(java.util.Map<String, String> columns, List<SensorSpec> sensors) {
        java.util.Set<String> known = java.util.Set.of("line", "time", "x", "y", "altitude", "depth", "latitude",
                "longitude");
        for (String k : columns.keySet()) {
            if (!known.contains(k)) {
                throw new IllegalArgumentException("recipe survey.columns: unknown key '" + k + "'; allowed: line, time, "
                        + "x, y, altitude, depth, latitude, longitude");
            }
        }
        java.util.function.Function<String, Optional<String>> get = k -> Optional.ofNullable(columns.get(k));
        return new SurveyColumns(columns.get("line"), get.apply("time"), get.apply("x"), get.apply("y"),
                get.apply("latitude"), get.apply("longitude"), get.apply("altitude"), get.apply("depth"), sensors);
    }

    /** Whether positions come as latitude/longitude to be projected. */
    public boolean geographic() {
        return x.isEmpty() || y.isEmpty();
    }
}
