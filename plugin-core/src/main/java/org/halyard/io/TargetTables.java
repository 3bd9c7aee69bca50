package org.halyard.io;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.halyard.io.FeatureLayer.ColumnType;
import org.halyard.targets.LinearFeature;
import org.halyard.targets.Target;
import org.halyard.targets.TargetResult;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.io.WKTWriter;

/**
 * The target list and the linear features as tables: plain CSV files (CONTRACT.md columns first, then
 * extras) with a sidecar {@code <name>.method.json} naming the methods, parameters, assumptions and notes,
 * and the {@code targets} and {@code linear_features} GeoPackage layers with the same attributes. One
 * column list serves both forms.
 *
 * <p>Units: x, y in metres of the survey CRS; depths and burial in metres, positive down; amplitude in
 * nT/m (analytic signal); moment in A m2; masses in kg. Unknown values are empty CSV fields and NULL in
 * the layers. No results give header-only files and empty layers; the sidecar then carries the note.
 */
public final class TargetTables {

    /**
     * One column: name, layer type, decimals in CSV, and how to get the value (a {@link Double} with
     * {@code NaN} for unknown, a {@link Long} or a {@link String}).
     */
    record Field<T>(String name, ColumnType type, int digits, Function<T, Object> value) {
        String csv(T row) {
            Object v = value.apply(row);
            return v instanceof Double d ? CsvTableWriter.number(d, digits) : String.valueOf(v);
        }

        Object layer(T row) {
            Object v = value.apply(row);
            return v instanceof Double d && d.isNaN() ? null : v;
        }
    }

    static <T> Field<T> real(String name, int digits, Function<T, Double> f) {
        return new Field<>(name, ColumnType.REAL, digits, f::apply);
    }

    static <T> Field<T> text(String name, Function<T, String> f) {
        return new Field<>(name, ColumnType.TEXT, 0, f::apply);
    }

    private static <T> Double opt(Optional<T> o, Function<T, Double> f) {
        return o.map(f).orElse(Double.NaN);
    }

    /** Columns of {@code targets.csv} and the {@code targets} layer: the contract's, then ours. */
    static final List<Field<Target>> TARGET_FIELDS = List.of(
            new Field<>("id", ColumnType.INTEGER, 0, t -> (long) t.id()),
            real("x", 3, Target::x), real("y", 3, Target::y),
            text("class", t -> t.targetClass().label()),
            real("depth_below_sensor_m", 3, Target::depthBelowSensor),
            real("burial_m", 3, t -> t.burial().metres()),
            real("amplitude", 4, Target::amplitude),
            real("moment_am2", 4, Target::momentAm2),
            real("mass_kg_min", 1, t -> opt(t.mass(), m -> m.minKg())),
            real("mass_kg_max", 1, t -> opt(t.mass(), m -> m.maxKg())),
            text("asset", t -> t.asset().orElse("")),
            text("depth_method", Target::depthMethod),
            real("euler_depth_m", 3, t -> opt(t.euler(), e -> e.depth())),
            real("euler_depth_sigma_m", 3, t -> opt(t.euler(), e -> e.depthSigma())),
            real("fit_xy_sigma_m", 3, t -> opt(t.fit(), f -> Math.hypot(f.sigmaX(), f.sigmaY()))),
            real("fit_depth_sigma_m", 3, t -> opt(t.fit(), f -> f.sigmaZ())),
            real("moment_sigma_am2", 4, t -> opt(t.fit(), f -> f.sigmaMoment())),
            real("mass_kg_sphere", 1, t -> opt(t.mass(), m -> m.sphereKg())),
            real("fit_rms_nt", 4, t -> opt(t.fit(), f -> f.rms())),
            text("burial_basis", t -> t.burial().basis()));

    /** Columns of {@code linear_features.csv} and the {@code linear_features} layer (wkt in CSV only). */
    static final List<Field<LinearFeature>> FEATURE_FIELDS = List.of(
            new Field<>("id", ColumnType.INTEGER, 0, f -> (long) f.id()),
            text("wkt", f -> new WKTWriter().write(f.line())),
            real("length_m", 2, LinearFeature::lengthM),
            text("asset", f -> f.asset().orElse("")),
            real("azimuth_deg", 2, LinearFeature::azimuthDeg),
            real("depth_below_sensor_m", 3, LinearFeature::depth),
            real("amplitude", 4, LinearFeature::amplitude));

    private TargetTables() {
    }

    /** Names of the target columns, in order. */
    public static List<String> targetColumns() {
        return TARGET_FIELDS.stream().map(Field::name).toList();
    }

    /** Writes {@code targets.csv} and {@code linear_features.csv} with their sidecars into {@code dir}. */
    public static void writeAll(Path dir, TargetResult result) {
        writeTargets(dir.resolve("targets.csv"), result);
        writeFeatures(dir.resolve("linear_features.csv"), result);
    }

    /** Writes the targets table and its sidecar. */
    public static void writeTargets(Path csv, TargetResult r) {
        writeCsv(csv, TARGET_FIELDS, r.targets());
        Map<String, Object> meta = sidecar(csv, r);
        meta.put("mass_assumptions", r.options().mass().assumptions());
        meta.put("units", "x, y: m (survey CRS); depths, burial, sigmas: m, positive down; amplitude: nT/m"
                + " (analytic signal); moment: A m2; masses: kg; fit_rms_nt: nT");
        writeJson(sidecarPath(csv), meta);
    }

    /** Writes the linear-features table and its sidecar. */
    public static void writeFeatures(Path csv, TargetResult r) {
        writeCsv(csv, FEATURE_FIELDS, r.features());
        Map<String, Object> meta = sidecar(csv, r);
        meta.put("units", "wkt: LINESTRING in the survey CRS, m; length_m: m; azimuth_deg: degrees clockwise from"
                + " north, 0-180; depth_below_sensor_m: median Euler SI 2 depth, m, positive down; amplitude: nT/m");
        writeJson(sidecarPath(csv), meta);
    }

    /**
     * The {@code targets} (points) and {@code linear_features} (lines) layers for {@code halyard.gpkg}, in
     * {@code crsCode} (the survey CRS), every attribute of the CSV files but the wkt.
     */
    public static List<FeatureLayer> layers(TargetResult r, String crsCode) {
        GeometryFactory gf = new GeometryFactory();
        return List.of(layer("targets", "Point", crsCode, TARGET_FIELDS, r.targets(),
                        t -> gf.createPoint(new Coordinate(t.x(), t.y()))),
                layer("linear_features", "LineString", crsCode,
                        FEATURE_FIELDS.stream().filter(f -> !f.name().equals("wkt")).toList(), r.features(),
                        LinearFeature::line));
    }

    private static <T> FeatureLayer layer(String name, String type, String crs, List<Field<T>> fields, List<T> rows,
                                          Function<T, Geometry> geometry) {
        List<Field<T>> attrs = fields.stream().filter(f -> !f.name().equals("id")).toList();
        List<FeatureLayer.Feature> features = new ArrayList<>();
        for (T row : rows) {
            Map<String, Object> a = new LinkedHashMap<>();
            for (Field<T> f : attrs) {
                a.put(f.name(), f.layer(row));
            }
            features.add(new FeatureLayer.Feature((Long) fields.get(0).value().apply(row), geometry.apply(row), a));
        }
        return new FeatureLayer(name, type, crs,
                attrs.stream().map(f -> new FeatureLayer.Column(f.name(), f.type())).toList(), features);
    }

    private static <T> void writeCsv(Path csv, List<Field<T>> fields, List<T> rows) {
        try (CsvTableWriter w = CsvTableWriter.create(csv, fields.stream().map(Field::name).toList())) {
            for (T row : rows) {
                w.row(fields.stream().map(f -> f.csv(row)).toList());
            }
        }
    }

    private static Map<String, Object> sidecar(Path csv, TargetResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("file", csv.getFileName().toString());
        m.put("methods", r.options().describe());
        m.put("parameters", r.options().toString());
        m.put("analytic_signal_noise_nt_per_m", r.noise().sigma());
        m.put("analytic_signal_background_nt_per_m", r.noise().background());
        m.put("peak_threshold_nt_per_m", r.threshold());
        m.put("notes", r.notes());
        return m;
    }

    /** {@code targets.csv} to {@code targets.method.json}. */
    public static Path sidecarPath(Path csv) {
        String name = csv.getFileName().toString();
        String stem = name.endsWith(".csv") ? name.substring(0, name.length() - 4) : name;
        return csv.resolveSibling(stem + ".method.json");
    }

    private static void writeJson(Path file, Map<String, Object> meta) {
        try {
            new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValue(file.toFile(), meta);
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot write: " + e.getMessage(), e);
        }
    }
}
