package org.halyard.pipeline;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The run's own record, written to {@code report/run.log}: each stage's parameters, notes and timing.
 * The timings are the only part of a run's output that differs between reruns.
 */
final class RunLog {

    private final List<String> lines = new ArrayList<>();

    /** A parameter or result of the current stage, as {@code key = value}. */
    void param(String key, Object value) {
        lines.add("    " + key + " = " + (value instanceof Double d ? String.format(Locale.ROOT, "%.6g", d) : value));
    }

    void stage(String name) {
        lines.add("stage " + name);
    }

    void note(String message) {
        lines.add("    note: " + message);
    }

    void timing(long millis) {
        lines.add(String.format(Locale.ROOT, "    time: %.2f s", millis / 1000.0));
    }

    void write(Path file) throws IOException {
        Files.createDirectories(file.getParent());
        Files.write(file, lines, StandardCharsets.UTF_8);
    }
}
