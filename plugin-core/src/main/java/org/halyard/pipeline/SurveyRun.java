package org.halyard.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.halyard.grid.Progress;

/**
 * Runs a recipe from raw lines to deliverables (CONTRACT.md, "Outputs of run").
 *
 * <p>Everything is written into a staging folder beside the output folder and moved into place only when
 * every stage has succeeded, so a failed or interrupted run leaves the previous outputs (or nothing) and no
 * partial files. Inputs are only read. Outputs are deterministic: the same recipe and inputs give the same
 * bytes, except the timings in {@code report/run.log}.
 */
public final class SurveyRun {

    private final List<Stage> stages;

    /** The standard sequence of stages. */
    public SurveyRun() {
        this(Stages.standard());
    }

    SurveyRun(List<Stage> stages) {
        this.stages = List.copyOf(stages);
    }

    /**
     * Runs {@code recipe}, leaving the outputs in {@code out}.
     *
     * @throws IllegalArgumentException for bad input, naming the file and what is wrong
     */
    public void run(Recipe recipe, Path out, RunListener listener) {
        Path target = out.toAbsolutePath().normalize();
        Path parent = target.getParent();
        Path work = parent.resolve("." + target.getFileName() + ".partial");
        try {
            Files.createDirectories(parent);
            deleteTree(work);
            Files.createDirectories(work);
            RunLog log = new RunLog();
            RunContext ctx = new RunContext(recipe, work, log, listener);
            log.param("recipe", recipe.file().getFileName());
            log.param("name", recipe.name());
            log.param("crs", recipe.crs());
            for (int i = 0; i < stages.size(); i++) {
                Stage s = stages.get(i);
                log.stage(s.name());
                Progress p = listener.stageStarted(s.name(), i, stages.size());
                long t0 = System.nanoTime();
                s.run(ctx, p);
                long ms = (System.nanoTime() - t0) / 1_000_000;
                log.timing(ms);
                listener.stageFinished(s.name(), ms);
            }
            log.write(work.resolve("report").resolve("run.log"));
            publish(work, target);
        } catch (IOException e) {
            cleanQuietly(work);
            throw new UncheckedIOException("run failed writing outputs: " + e.getMessage(), e);
        } catch (RuntimeException e) {
            cleanQuietly(work);
            throw e;
        } catch (Exception e) {
            cleanQuietly(work);
            throw new IllegalStateException(e.getMessage(), e);
        }
    }

    /** Swaps the staging folder in for the output folder. */
    private static void publish(Path work, Path target) throws IOException {
        Path old = target.resolveSibling("." + target.getFileName() + ".old");
        deleteTree(old);
        if (Files.exists(target)) {
            Files.move(target, old, StandardCopyOption.ATOMIC_MOVE);
        }
        Files.move(work, target, StandardCopyOption.ATOMIC_MOVE);
        deleteTree(old);
    }

    private static void cleanQuietly(Path dir) {
        try {
            deleteTree(dir);
        } catch (IOException ignored) {
            // the run's own failure is the one to report
        }
    }

    static void deleteTree(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
