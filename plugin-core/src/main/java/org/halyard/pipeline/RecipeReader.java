package org.halyard.pipeline;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.halyard.io.GeoTiffGrids;
import org.halyard.survey.LagOptions;
import org.halyard.survey.MicroLevelling;
import org.halyard.survey.SensorSpec;
import org.halyard.targets.TargetOptions;

/**
 * Reads and checks a recipe (CONTRACT.md). Every problem is reported as one line naming the recipe and
 * the JSON path of the offending entry; referenced files must exist.
 */
public final class RecipeReader {

    /** Default cell size when the recipe has no grid block, metres (common practice for UXO surveys). */
    public static final double DEFAULT_CELL_M = 0.5;

    private RecipeReader() {
    }

    /** Parses and checks {@code file}. */
    public static Recipe read(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException(file + ": no such recipe file");
        }
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(file.toFile());
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException(file + ": not valid JSON (line " + e.getLocation().getLineNr()
                    + ", column " + e.getLocation().getColumnNr() + "): " + e.getOriginalMessage());
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot read: " + e.getMessage(), e);
        }
        Path dir = file.toAbsolutePath().getParent();
        Ctx c = new Ctx(file);
        if (root == null || !root.isObject()) {
            throw c.error("", "the recipe must be a JSON object");
        }
        String crs = c.text(root, "crs", true);
        try {
            GeoTiffGrids.decode(crs); // fails with a clear message for an unknown code
        } catch (IllegalArgumentException e) {
            throw c.error("crs", e.getMessage());
        }
        JsonNode s = c.object(root, "survey", true);
        Path surveyFile = c.file(dir, s, "survey.file", true);
        JsonNode cols = c.object(s, "columns", true);
        Map<String, String> columns = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = cols.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            if (!e.getValue().isTextual() || e.getValue().asText().isBlank()) {
                throw c.error("survey.columns." + e.getKey(), "must be a column name");
            }
            columns.put(e.getKey(), e.getValue().asText());
        }
        for (String req : new String[] {"line", "x", "y"}) {
            if (!columns.containsKey(req)) {
                throw c.error("survey.columns", "missing the required '" + req + "' column");
            }
        }
        JsonNode sens = s.get("sensors");
        if (sens == null || !sens.isArray() || sens.isEmpty()) {
            throw c.error("survey.sensors", "give at least one sensor {column, across_m, along_m}");
        }
        List<SensorSpec> sensors = new ArrayList<>();
        for (int i = 0; i < sens.size(); i++) {
            JsonNode n = sens.get(i);
            String at = "survey.sensors[" + i + "]";
            sensors.add(new SensorSpec(c.text(n, "column", true, at), c.number(n, "across_m", 0, at),
                    c.number(n, "along_m", 0, at)));
        }
        List<String> ties = new ArrayList<>();
        JsonNode tl = s.get("tie_lines");
        if (tl != null) {
            if (!tl.isArray()) {
                throw c.error("survey.tie_lines", "must be a list of line names");
            }
            tl.forEach(t -> ties.add(t.asText()));
        }
        Recipe.Survey survey = new Recipe.Survey(surveyFile, columns, sensors, ties, lag(c, s), microLevelling(c, s),
                c.bool(s, "skip_bad_rows", false, "survey"));
        Path base = optionalFile(c, dir, root, "base_station");
        Recipe.Field field = null;
        JsonNode f = c.object(root, "field", false);
        if (f != null) {
            field = new Recipe.Field(c.number(f, "inclination_deg", Double.NaN, "field"),
                    c.number(f, "declination_deg", Double.NaN, "field"), c.number(f, "intensity_nt", Double.NaN, "field"));
            if (!(Math.abs(field.inclinationDeg()) <= 90) || !Double.isFinite(field.declinationDeg())) {
                throw c.error("field", "needs inclination_deg (-90 to 90) and declination_deg (degrees)");
            }
        }
        JsonNode g = c.object(root, "grid", false);
        Recipe.GridBlock grid = new Recipe.GridBlock(
                g == null ? DEFAULT_CELL_M : c.number(g, "cell_m", DEFAULT_CELL_M, "grid"),
                g == null ? 0.25 : c.number(g, "tension", 0.25, "grid"),
                g == null ? Double.NaN : c.number(g, "blanking_m", Double.NaN, "grid"),
                g != null && c.bool(g, "tie_lines", false, "grid"));
        if (!(grid.cellM() > 0)) {
            throw c.error("grid.cell_m", "must be a positive number of metres");
        }
        if (!(grid.tension() >= 0 && grid.tension() < 1)) {
            throw c.error("grid.tension", "must be from 0 to below 1");
        }
        JsonNode t = c.object(root, "targets", false);
        TargetOptions td = TargetOptions.DEFAULT;
        Recipe.TargetBlock targets = new Recipe.TargetBlock(
                t == null ? td.peaks().thresholdFactor() : c.number(t, "threshold_sigma", td.peaks().thresholdFactor(), "targets"),
                t == null ? td.peaks().minSeparationM() : c.number(t, "min_separation_m", td.peaks().minSeparationM(), "targets"),
                t == null ? td.assetBufferM() : c.number(t, "asset_buffer_m", td.assetBufferM(), "targets"));
        String name = root.hasNonNull("name") ? root.get("name").asText() : file.getFileName().toString();
        return new Recipe(file, name, crs, survey, base, field, grid, optionalFile(c, dir, root, "bathymetry"),
                optionalFile(c, dir, root, "infrastructure"), targets);
    }

    /** The optional {@code survey.lag} block; {@link LagOptions#OFF} without it. */
    private static LagOptions lag(Ctx c, JsonNode survey) {
        JsonNode b = c.object(survey, "lag", false, "survey.lag");
        if (b == null) {
            return LagOptions.OFF;
        }
        boolean estimate = c.bool(b, "estimate", false, "survey.lag");
        boolean apply = c.bool(b, "apply_estimate", false, "survey.lag");
        double seconds = c.number(b, "seconds", Double.NaN, "survey.lag");
        double max = c.number(b, "max_s", LagOptions.DEFAULT_MAX_LAG_S, "survey.lag");
        try {
            return new LagOptions(estimate || apply, apply, seconds, max);
        } catch (IllegalArgumentException e) {
            throw c.error("survey.lag", e.getMessage());
        }
    }

    /** The optional {@code survey.micro_levelling} block: present (and not {@code "enabled": false}) turns it on. */
    private static Optional<MicroLevelling.Settings> microLevelling(Ctx c, JsonNode survey) {
        String at = "survey.micro_levelling";
        JsonNode b = c.object(survey, "micro_levelling", false, at);
        if (b == null || !c.bool(b, "enabled", true, at)) {
            return Optional.empty();
        }
        try {
            return Optional.of(new MicroLevelling.Settings(c.number(b, "across_wavelength_m", Double.NaN, at),
                    c.number(b, "along_wavelength_m", Double.NaN, at),
                    c.number(b, "limit_nt", MicroLevelling.DEFAULT_LIMIT_NT, at)));
        } catch (IllegalArgumentException e) {
            throw c.error(at, e.getMessage());
        }
    }

    private static Path optionalFile(Ctx c, Path dir, JsonNode root, String block) {
        JsonNode b = c.object(root, block, false);
        return b == null ? null : c.file(dir, b, block + ".file", true);
    }

    /** Error helpers that name the recipe and the JSON path. */
    private record Ctx(Path file) {
        IllegalArgumentException error(String path, String what) {
            return new IllegalArgumentException(file + ": " + (path.isEmpty() ? "" : path + ": ") + what);
        }

        JsonNode object(JsonNode parent, String key, boolean required) {
            return object(parent, key, required, key);
        }

        /** The object {@code key} of {@code parent}; {@code path} names it in errors. */
        JsonNode object(JsonNode parent, String key, boolean required, String path) {
            JsonNode n = parent.get(key);
            if (n == null || n.isNull()) {
                if (required) {
                    throw error(path, "required block is missing");
                }
                return null;
            }
            if (!n.isObject()) {
                throw error(path, "must be a JSON object");
            }
            return n;
        }

        boolean bool(JsonNode parent, String key, boolean fallback, String at) {
            JsonNode n = optional(parent, key, at, JsonNode::isBoolean, "true or false");
            return n == null ? fallback : n.asBoolean();
        }

        /** The value {@code key} of {@code parent}, null when absent or null; refused unless {@code type} holds. */
        private JsonNode optional(JsonNode parent, String key, String at,
                                  java.util.function.Predicate<JsonNode> type, String expected) {
            JsonNode n = parent.get(key);
            if (n == null || n.isNull()) {
                return null;
            }
            if (!type.test(n)) {
                throw error(at + "." + key, "must be " + expected + ", got " + n);
            }
            return n;
        }

        String text(JsonNode parent, String key, boolean required) {
            return text(parent, key, required, "");
        }

        String text(JsonNode parent, String key, boolean required, String at) {
            JsonNode n = parent.get(key);
            String path = at.isEmpty() ? key : at + "." + key;
            if (n == null || !n.isTextual() || n.asText().isBlank()) {
                if (required) {
                    throw error(path, "required text is missing");
                }
                return null;
            }
            return n.asText();
        }

        double number(JsonNode parent, String key, double fallback, String at) {
            JsonNode n = optional(parent, key, at, JsonNode::isNumber, "a number");
            return n == null ? fallback : n.asDouble();
        }

        Path file(Path dir, JsonNode block, String path, boolean mustExist) {
            String name = text(block, "file", true, path.substring(0, path.lastIndexOf('.')));
            Path p = dir.resolve(name).normalize();
            if (mustExist && !Files.isRegularFile(p)) {
                throw error(path, "no such file: " + p);
            }
            return p;
        }
    }
}
