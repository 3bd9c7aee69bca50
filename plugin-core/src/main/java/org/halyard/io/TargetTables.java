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
import org.halyard.targets.LinearFeature;
import org.halyard.targets.Target;
import org.halyard.targets.TargetResult;
import org.locationtech.jts.io.WKTWriter;

/**
 * Writes the target list and the linear features as plain CSV (CONTRACT.md columns first, then extras),
 * each with a sidecar {@code <name>.method.json} naming the methods, parameters, assumptions and notes.
 *
 * <p>Units: x, y in metres of the survey CRS; depths and burial in metres, positive down; amplitude in
 * nT/m (analytic signal); moment in A m2; masses in kg. Unknown values are empty fields. No results give
 * header-only files; the sidecar then carries the note saying why.
 */
public final class TargetTables {

    /** The contract columns of {@code targets.csv}, then ours. */
    public static final List<String> TARGET_COLUMNS = List.of("id", "x", "y", "class", "depth_below_sensor_m",
            "burial_m", "amplitude", "moment_am2", "mass_kg_min", "mass_kg_max", "asset",
            "depth_method", "euler_depth_m", "euler_depth_sigma_m", "fit_xy_sigma_m", "fit_depth_sigma_m",
            "moment_sigma_am2", "mass_kg_sphere", "fit_rms_nt", "burial_basis");

    /** The contract columns of {@code linear_features.csv}, then ours. */
    public static final List<String> FEATURE_COLUMNS = List.of("id", "wkt", "length_m", "asset", "azimuth_deg",
            "depth_below_sensor_m", "amplitude");

    private TargetTables() {
    }

    /** Writes {@code targets.csv} and {@code linear_features.csv} with their sidecars into {@code dir}. */
    public static void writeAll(Path dir, TargetResult result) {
        writeTargets(dir.resolve("targets.csv"), result);
        writeFeatures(dir.resolve("linear_features.csv"), result);
    }

    /** Writes the targets table and its sidecar. */
    public static void writeTargets(Path csv, TargetResult r) {
        try (CsvTableWriter w = CsvTableWriter.create(csv, TARGET_COLUMNS)) {
            for (Target t : r.targets()) {
                w.row(targetRow(t));
            }
        }
        Map<String, Object> meta = sidecar(csv, r);
        meta.put("mass_assumptions", r.options().mass().assumptions());
        meta.put("units", "x, y: m (survey CRS); depths, burial, sigmas: m, positive down; amplitude: nT/m"
                + " (analytic signal); moment: A m2; masses: kg; fit_rms_nt: nT");
        writeJson(sidecarPath(csv), meta);
    }

    /** Writes the linear-features table and its sidecar. */
    public static void writeFeatures(Path csv, TargetResult r) {
        WKTWriter wkt = new WKTWriter();
        try (CsvTableWriter w = CsvTableWriter.create(csv, FEATURE_COLUMNS)) {
            for (LinearFeature f : r.features()) {
                w.row(List.of(Integer.toString(f.id()), wkt.write(f.line()), CsvTableWriter.number(f.lengthM(), 2),
                        f.asset().orElse(""), CsvTableWriter.number(f.azimuthDeg(), 2),
                        CsvTableWriter.number(f.depth(), 3), CsvTableWriter.number(f.amplitude(), 4)));
            }
        }
        Map<String, Object> meta = sidecar(csv, r);
        meta.put("units", "wkt: LINESTRING in the survey CRS, m; length_m: m; azimuth_deg: degrees clockwise from"
                + " north, 0-180; depth_below_sensor_m: median Euler SI 2 depth, m, positive down; amplitude: nT/m");
        writeJson(sidecarPath(csv), meta);
    }

    static List<String> targetRow(Target t) {
        List<String> f = new ArrayList<>();
        f.add(Integer.toString(t.id()));
        f.add(CsvTableWriter.number(t.x(), 3));
        f.add(CsvTableWriter.number(t.y(), 3));
        f.add(t.targetClass().label());
        f.add(CsvTableWriter.number(t.depthBelowSensor(), 3));
        f.add(CsvTableWriter.number(t.burial().metres(), 3));
        f.add(CsvTableWriter.number(t.amplitude(), 4));
        f.add(CsvTableWriter.number(t.momentAm2(), 4));
        f.add(CsvTableWriter.number(t.mass().map(m -> m.minKg()).orElse(Double.NaN), 1));
        f.add(CsvTableWriter.number(t.mass().map(m -> m.maxKg()).orElse(Double.NaN), 1));
        f.add(t.asset().orElse(""));
        f.add(t.depthMethod());
        f.add(CsvTableWriter.number(t.euler().map(e -> e.depth()).orElse(Double.NaN), 3));
        f.add(CsvTableWriter.number(t.euler().map(e -> e.depthSigma()).orElse(Double.NaN), 3));
        f.add(CsvTableWriter.number(t.fit().map(x -> Math.hypot(x.sigmaX(), x.sigmaY())).orElse(Double.NaN), 3));
        f.add(CsvTableWriter.number(t.fit().map(x -> x.sigmaZ()).orElse(Double.NaN), 3));
        f.add(CsvTableWriter.number(t.fit().map(x -> x.sigmaMoment()).orElse(Double.NaN), 4));
        f.add(CsvTableWriter.number(t.mass().map(m -> m.sphereKg()).orElse(Double.NaN), 1));
        f.add(CsvTableWriter.number(t.fit().map(x -> x.rms()).orElse(Double.NaN), 4));
        f.add(t.burial().basis());
        return f;
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
