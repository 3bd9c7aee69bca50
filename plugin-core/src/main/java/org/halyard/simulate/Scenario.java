package org.halyard.simulate;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

/**
 * A survey to forward-model, as read from a scenario JSON file (keys in snake_case; see
 * {@code docs/simulation.md} for every key and the sample in {@code sample-workspace/}).
 *
 * <p>Positions are metres east and north of {@code origin} (an easting, northing pair in {@code crs});
 * depths are metres below the sea surface, positive down; burials metres below the seabed; fields nT;
 * angles degrees (inclination positive down, declination and azimuths clockwise from north).
 *
 * @param name         scenario name, used in file headers
 * @param crs          projected CRS code of every output, e.g. {@code EPSG:32631}
 * @param seed         seed of every random choice (same seed, same bytes)
 * @param start        time of the first sample, UTC
 * @param origin       easting and northing of the local origin, m
 * @param field        the Earth's field
 * @param area         the surveyed rectangle and its line plan
 * @param seabed       the analytic seabed
 * @param array        the towed sensor array
 * @param noise        sensor noise, spikes and gaps
 * @param objects      placed discrete objects
 * @param randomObjects objects scattered at random (may be null)
 * @param linears      cables and pipes
 * @param geology      susceptible prisms below the seabed (may be empty)
 * @param quay         the quay outline, charted as an area (may be null)
 * @param baseStation  the base magnetometer
 */
public record Scenario(String name, String crs, long seed, String start, double[] origin, Field field, Area area,
                       Seabed seabed, Array array, Noise noise, List<Target> objects, RandomTargets randomObjects,
                       List<Linear> linears, List<Body> geology, Quay quay, BaseStation baseStation) {

    /** @param gradientNtPerKmNorth regional main-field gradient towards north, nT/km */
    public record Field(double inclinationDeg, double declinationDeg, double intensityNt, double gradientNtPerKmNorth) { }

    /**
     * The survey rectangle in line coordinates: {@code u} along the lines (azimuth {@code lineAzimuthDeg}),
     * {@code v} to starboard of the first line; corner at the origin.
     *
     * @param lengthM        line length, m
     * @param widthM         extent across the lines, m
     * @param lineAzimuthDeg azimuth of the first line, degrees clockwise from north
     * @param lineSpacingM   distance between survey lines, m
     * @param tieSpacingM    distance between tie lines (at right angles), m; 0 for none
     * @param runInM         straight run-in and run-out beyond the rectangle, m
     * @param turnRadiusM    radius of the vessel's turns between lines, m
     * @param speedMps       speed over ground, m/s
     * @param sampleHz       sampling rate, Hz
     * @param wanderM        amplitude of the array's sideways wander about the planned line, m
     */
    public record Area(double lengthM, double widthM, double lineAzimuthDeg, double lineSpacingM, double tieSpacingM,
                       double runInM, double turnRadiusM, double speedMps, double sampleHz, double wanderM) { }

    /**
     * Seabed depth d(x, y) = depthM + slopeEast x + slopeNorth y + channel + sand waves (local x, y from the
     * origin): a Gaussian channel of {@code channelDepthM} and half-width {@code channelWidthM} along the
     * line through the origin at azimuth {@code channelAzimuthDeg}, offset {@code channelOffsetM} to its right,
     * and sand waves of {@code sandWaveAmplitudeM} and {@code sandWaveLengthM} crests at right angles to it.
     *
     * @param cellM cell of the bathymetry GeoTIFF, m
     */
    public record Seabed(double depthM, double slopeEast, double slopeNorth, double channelDepthM,
                         double channelWidthM, double channelAzimuthDeg, double channelOffsetM,
                         double sandWaveAmplitudeM, double sandWaveLengthM, double cellM, double marginM) { }

    /** One sensor of the array: offsets from the reference point, across positive to starboard, along forward. */
    public record Sensor(String column, double acrossM, double alongM) { }

    /**
     * @param altitudeM        mean sensor height above the seabed, m
     * @param altitudeWanderM  amplitude of the slow altitude variation, m
     * @param altitudePeriodS  its period, s
     */
    public record Array(List<Sensor> sensors, double altitudeM, double altitudeWanderM, double altitudePeriodS) { }

    /**
     * @param sigmaNt          white sensor noise, nT (standard deviation)
     * @param headingErrorNt   heading error amplitude: offset headingErrorNt cos(heading - headingErrorAzimuthDeg), nT
     * @param lineOffsetSigmaNt random per-line level offset, nT (standard deviation)
     * @param spikesPerKm      mean number of spikes per km of line, per sensor
     * @param spikeNt          typical spike size, nT
     * @param gapsPerKm        mean number of record gaps (rows missing) per km of line
     * @param gapMaxS          longest gap, s
     */
    public record Noise(double sigmaNt, double headingErrorNt, double headingErrorAzimuthDeg, double lineOffsetSigmaNt,
                        double spikesPerKm, double spikeNt, double gapsPerKm, double gapMaxS) { }

    /**
     * A compact steel object: induced moment of a permeable sphere of {@code massKg}, plus a remanent moment of
     * {@code remanentRatio} times the induced magnitude along ({@code remanenceInclinationDeg},
     * {@code remanenceDeclinationDeg}).
     */
    public record Target(String id, double x, double y, double burialM, double massKg, double remanentRatio,
                         double remanenceInclinationDeg, double remanenceDeclinationDeg) { }

    /** {@code count} objects uniformly in the area, log-uniform mass, uniform burial, random remanence. */
    public record RandomTargets(int count, double massMinKg, double massMaxKg, double burialMaxM, double remanentRatioMax) { }

    /**
     * A cable or pipe: a polyline of local (x, y) vertices buried {@code burialM} below the seabed, induced
     * magnetisation from {@code massPerMetreKg} of steel. Charted when {@code asset} is not null, at the true
     * position shifted {@code chartShiftM} to the right of its first segment (chart error).
     *
     * @param kind {@code cable} or {@code pipeline}
     */
    public record Linear(String id, String kind, String asset, String name, double massPerMetreKg, double burialM,
                         List<double[]> path, double chartShiftM) { }

    /** A susceptible rectangular prism, local coordinates, depths below the sea surface, SI susceptibility. */
    public record Body(String id, double xMin, double xMax, double yMin, double yMax, double topM, double bottomM,
                       double susceptibility) { }

    /** The quay as a charted area: a closed ring of local (x, y) vertices (first not repeated). */
    public record Quay(String asset, String name, List<double[]> outline) { }

    /**
     * @param code           IAGA-style three-letter code (use one no real observatory uses)
     * @param cadenceS       sampling interval, whole seconds
     * @param quietAmplitudeNt amplitude of the quiet daily variation of F, nT
     * @param disturbedStartMin start of the disturbed interval, minutes after the survey start
     * @param disturbedMinutes  its length, minutes
     * @param disturbedAmplitudeNt amplitude of its pulsations, nT
     * @param missingStartMin  start of a stretch of missing records (99999.00), minutes after the survey start
     * @param missingSeconds   its length, s (0 for none)
     */
    public record BaseStation(String code, String stationName, double latitudeDeg, double longitudeDeg,
                              double elevationM, int cadenceS, double quietAmplitudeNt, double disturbedStartMin,
                              double disturbedMinutes, double disturbedAmplitudeNt, double missingStartMin,
                              double missingSeconds) { }

    /** The mapper for scenario files: snake_case keys, unknown keys rejected (they are usually typos). */
    static ObjectMapper mapper() {
        return new ObjectMapper()
                .setPropertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
                .configure(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES, true)
                .configure(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES, true)
                .configure(DeserializationFeature.FAIL_ON_MISSING_CREATOR_PROPERTIES, false);
    }

    /**
     * Reads and checks a scenario file.
     *
     * @throws IllegalArgumentException naming the file, line and column of a syntax or type error, or the key
     *                                  of a missing or out-of-range value
     * @throws UncheckedIOException     when the file cannot be read
     */
    public static Scenario read(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException(file + ": scenario file does not exist");
        }
        Scenario s;
        try {
            s = mapper().readValue(Files.readString(file), Scenario.class);
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            String where = at == null ? "" : " line " + at.getLineNr() + " column " + at.getColumnNr();
            throw new IllegalArgumentException(file + where + ": " + e.getOriginalMessage(), e);
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), e);
        }
        s.check(file.toString());
        return s;
    }

    /** Throws an IllegalArgumentException naming {@code source} and the key of the first bad value. */
    void check(String source) {
        require(source, name != null && !name.isBlank(), "name", "a non-empty name");
        require(source, crs != null && crs.matches("EPSG:\\d+"), "crs", "an EPSG code such as EPSG:32631");
        try {
            startInstant();
        } catch (RuntimeException e) {
            require(source, false, "start", "an ISO 8601 UTC time such as 2026-05-14T08:00:00Z");
        }
        require(source, origin != null && origin.length == 2, "origin", "[easting, northing]");
        require(source, field != null && field.intensityNt() > 20000 && field.intensityNt() < 70000,
                "field.intensity_nt", "20000 to 70000 nT");
        require(source, field != null && Math.abs(field.inclinationDeg()) <= 90, "field.inclination_deg", "-90 to 90");
        require(source, area != null && area.lengthM() > 0 && area.widthM() >= 0, "area", "length_m > 0 and width_m >= 0");
        require(source, area.lineSpacingM() > 0, "area.line_spacing_m", "a positive spacing");
        require(source, area.speedMps() > 0 && area.sampleHz() > 0 && area.sampleHz() <= 1000,
                "area.speed_mps / area.sample_hz", "positive speed and 0 < rate <= 1000 Hz");
        require(source, Math.abs(1000 / area.sampleHz() - Math.rint(1000 / area.sampleHz())) < 1e-9,
                "area.sample_hz", "a rate whose interval is a whole number of milliseconds (e.g. 10 Hz)");
        require(source, area.turnRadiusM() >= 0 && area.runInM() >= 0 && area.tieSpacingM() >= 0,
                "area.turn_radius_m / run_in_m / tie_spacing_m", "non-negative values");
        require(source, seabed != null && seabed.cellM() > 0, "seabed.cell_m", "a positive cell size");
        require(source, array != null && array.sensors() != null && !array.sensors().isEmpty(), "array.sensors",
                "at least one sensor");
        require(source, array.altitudeM() > 0, "array.altitude_m", "a positive altitude");
        require(source, array.altitudeWanderM() < array.altitudeM(), "array.altitude_wander_m",
                "less than altitude_m (the array must stay off the seabed)");
        require(source, array.altitudePeriodS() > 0, "array.altitude_period_s", "a positive period");
        require(source, noise != null && noise.sigmaNt() >= 0 && noise.spikesPerKm() >= 0 && noise.gapsPerKm() >= 0,
                "noise", "non-negative sigma_nt, spikes_per_km and gaps_per_km");
        require(source, baseStation != null && baseStation.code() != null && baseStation.code().matches("[A-Z]{3}"),
                "base_station.code", "three capital letters");
        require(source, baseStation.cadenceS() >= 1, "base_station.cadence_s", "a whole number of seconds >= 1");
        for (Sensor sn : array.sensors()) {
            require(source, sn.column() != null && sn.column().matches("[A-Za-z][A-Za-z0-9_]*"), "array.sensors.column",
                    "a column name of letters, digits and _");
        }
        for (Linear l : linears()) {
            require(source, l.path() != null && l.path().size() >= 2, "linears." + l.id() + ".path", "two or more [x, y] vertices");
            require(source, "cable".equals(l.kind()) || "pipeline".equals(l.kind()), "linears." + l.id() + ".kind",
                    "cable or pipeline");
        }
        for (Body b : geology()) {
            require(source, b.bottomM() > b.topM() && b.xMax() > b.xMin() && b.yMax() > b.yMin(), "geology." + b.id(),
                    "x_max > x_min, y_max > y_min, bottom_m > top_m");
        }
    }

    private static void require(String source, boolean ok, String key, String expected) {
        if (!ok) {
            throw new IllegalArgumentException(source + ": key '" + key + "' must be " + expected);
        }
    }

    /** The time of the first sample. */
    public Instant startInstant() {
        return Instant.parse(start);
    }

    /** Placed objects, never null. */
    @Override
    public List<Target> objects() {
        return objects == null ? List.of() : objects;
    }

    /** Cables and pipes, never null. */
    @Override
    public List<Linear> linears() {
        return linears == null ? List.of() : linears;
    }

    /** Geological prisms, never null. */
    @Override
    public List<Body> geology() {
        return geology == null ? List.of() : geology;
    }
}
