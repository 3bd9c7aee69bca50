package org.halyard.testing;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs the reference tools (GDAL, GMT, NumPy) that tests compare against.
 *
 * <p>Tests using this are tagged {@code external}. Where a tool is missing the test is skipped, except
 * with {@code CI=true}, where a missing tool fails the run: CI must install what the tests need.
 */
public final class ExternalTools {

    private ExternalTools() {
    }

    /** Debian's Python, which has NumPy once {@code python3-numpy} is installed. */
    public static final String PYTHON = "/usr/bin/python3";

    /** Skips (or, in CI, fails) unless {@code command} is on the PATH or is an existing absolute path. */
    public static void require(String command) {
        boolean found = command.startsWith("/") ? Files.isExecutable(Path.of(command)) : onPath(command);
        if (command.equals(PYTHON) && found) {
            found = run(List.of(PYTHON, "-c", "import numpy"), null).exitCode == 0;
        }
        if (!found) {
            if ("true".equals(System.getenv("CI"))) {
                fail("reference tool " + command + " is missing; .ci/run must install it");
            }
            assumeTrue(false, "reference tool " + command + " not installed");
        }
    }

    private static boolean onPath(String command) {
        String path = System.getenv("PATH");
        if (path == null) {
            return false;
        }
        for (String dir : path.split(":")) {
            if (Files.isExecutable(Path.of(dir, command))) {
                return true;
            }
        }
        return false;
    }

    /** The outcome of a command: exit code and the standard output and error merged. */
    public record Result(int exitCode, String output) {
        /** Fails the test with the command's output unless it exited 0; returns the output. */
        public String orFail() {
            if (exitCode != 0) {
                fail("reference command failed (exit " + exitCode + "):\n" + output);
            }
            return output;
        }
    }

    /** Runs a command in {@code dir} (or the current directory when null), up to 10 minutes. */
    public static Result run(List<String> command, Path dir) {
        try {
            ProcessBuilder pb = new ProcessBuilder(new ArrayList<>(command)).redirectErrorStream(true);
            if (dir != null) {
                pb.directory(dir.toFile());
            }
            Process p = pb.start();
            byte[] out = p.getInputStream().readAllBytes();
            if (!p.waitFor(10, TimeUnit.MINUTES)) {
                p.destroyForcibly();
                fail("reference command timed out: " + command);
            }
            return new Result(p.exitValue(), new String(out, StandardCharsets.UTF_8));
        } catch (IOException e) {
            return new Result(127, e.toString());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }

    /** Runs a Python script with Debian's python3 (NumPy available); returns its output or fails. */
    public static String python(String script, Path dir, String... args) {
        require(PYTHON);
        List<String> cmd = new ArrayList<>(List.of(PYTHON, "-c", script));
        cmd.addAll(List.of(args));
        return run(cmd, dir).orFail();
    }
}
