package org.halyard.survey;

import java.awt.Color;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

/**
 * Writes the QC report of a processed survey: {@code qc.html} (summary, crossover statistics, per-line
 * table, spikes) with PNG plots (tracks and coverage, noise, altitude, crossover misfits) and
 * {@code qc_lines.csv} with the per-line figures of {@link LineQc}.
 *
 * <p>The report is written into a temporary sibling directory and moved into place at the end, so a
 * failure never leaves a partial report.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class QcReportWriter {

    /** Header of {@code qc_lines.csv}. */
    public static final String LINES_HEADER = "line,kind,samples,length_m,duration_s,mean_speed_ms,median_interval_s,"
            + "gaps,altitude_mean_m,altitude_max_m,altitude_over_limit_fraction,spikes,noise_nt,spacing_median_m,"
            + "spacing_over_limit_fraction,levelling_mean_nt";

    private static final Color TRAVERSE = new Color(30, 90, 180), TIE = new Color(200, 50, 40),
            OUTLINE = new Color(120, 120, 120), AFTER = new Color(20, 20, 20), BEFORE = new Color(170, 170, 170);

    private QcReportWriter() {
    }

    /**
     * Writes the report into directory {@code dir} (created; an existing one is replaced).
     *
     * @param survey the processed survey
     * @param dir    the report directory, e.g. {@code OUT/report}
     */
    public static void write(ProcessedSurvey survey, Path dir) {
        Path abs = dir.toAbsolutePath();
        Path tmp = abs.resolveSibling(abs.getFileName() + ".tmp-" + ProcessHandle.current().pid());
        try {
            deleteTree(tmp);
            Files.createDirectories(tmp);
            writeLinesCsv(survey.qc().lines(), tmp.resolve("qc_lines.csv"));
            trackPlot(survey, tmp.resolve("tracks.png"));
            linePlot(survey.qc().lines(), "Fourth-difference noise per line", "noise (nT)", LineQc::noiseNt, Double.NaN,
                    tmp.resolve("noise.png"));
            boolean altitude = survey.qc().lines().stream().anyMatch(q -> !Double.isNaN(q.altitudeMaxM()));
            if (altitude) {
                linePlot(survey.qc().lines(), "Largest altitude above the seabed per line", "altitude (m)",
                        LineQc::altitudeMaxM, survey.qc().altitudeLimitM(), tmp.resolve("altitude.png"));
            }
            boolean xo = !survey.crossovers().isEmpty();
            if (xo) {
                crossoverPlot(survey, tmp.resolve("crossovers.png"));
            }
            Files.writeString(tmp.resolve("qc.html"), QcHtml.page(survey, altitude, xo), StandardCharsets.UTF_8);
            deleteTree(abs);
            Files.createDirectories(abs.getParent());
            Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            deleteQuietly(tmp);
            throw new UncheckedIOException(dir + ": cannot write the QC report: " + e.getMessage(), e);
        } catch (RuntimeException e) {
            deleteQuietly(tmp);
            throw e;
        }
    }

    static void writeLinesCsv(List<LineQc> lines, Path file) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(LINES_HEADER);
            w.newLine();
            for (LineQc q : lines) {
                w.write(String.join(",", csvText(q.line()), q.tie() ? "tie" : "traverse", Integer.toString(q.samples()),
                        num(q.lengthM(), 2), num(q.durationS(), 3), num(q.meanSpeedMs(), 3), num(q.medianIntervalS(), 4),
                        Integer.toString(q.gaps()), num(q.altitudeMeanM(), 2), num(q.altitudeMaxM(), 2),
                        num(q.altitudeOverLimit(), 4), Integer.toString(q.spikes()), num(q.noiseNt(), 4),
                        num(q.spacingMedianM(), 2), num(q.spacingOverLimit(), 4), num(q.levellingNt(), 3)));
                w.newLine();
            }
        }
    }

    /** A number with {@code digits} decimals, or empty for NaN. */
    static String num(double v, int digits) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%." + digits + "f", v);
    }

    static String csvText(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static void trackPlot(ProcessedSurvey s, Path file) {
        Geometry outline = s.qc().coverage();
        var env = outline.getEnvelopeInternal();
        for (SensorTrack st : s.sensors()) {
            for (int i = 0; i < st.size(); i += Math.max(1, st.size() / 20000)) {
                env.expandToInclude(st.x()[i], st.y()[i]);
            }
        }
        QcPlot p = new QcPlot(900, 800, "Sensor tracks and coverage outline", "easting (m)", "northing (m)",
                env.getMinX(), env.getMaxX(), env.getMinY(), env.getMaxY(), true);
        Coordinate[] c = outline.getCoordinates();
        double[] ox = new double[c.length], oy = new double[c.length];
        for (int i = 0; i < c.length; i++) {
            ox[i] = c[i].x;
            oy[i] = c[i].y;
        }
        SurveyLines lines = s.lines();
        for (boolean ties : new boolean[] {false, true}) { // ties over traverses, outline on top
            for (int l = 0; l < lines.lineCount(); l++) {
                if (s.tieMask()[l] != ties) {
                    continue;
                }
                int a = lines.start(l), b = lines.end(l);
                int step = Math.max(1, (b - a) / 400);
                for (SensorTrack st : s.sensors()) {
                    p.polyline(st.x(), st.y(), a, b, step, ties ? TIE : TRAVERSE, 0.8f);
                }
            }
        }
        p.polyline(ox, oy, 0, c.length, 1, OUTLINE, 1.5f);
        for (SpikeAt sp : s.qc().spikes()) {
            p.point(sp.x(), sp.y(), Color.ORANGE);
        }
        p.legend(0, TRAVERSE, "traverse lines");
        p.legend(1, TIE, "tie lines");
        p.legend(2, OUTLINE, "coverage outline");
        p.legend(3, Color.ORANGE, "spikes");
        p.write(file);
    }

    private static void linePlot(List<LineQc> lines, String title, String yLabel,
                                 java.util.function.ToDoubleFunction<LineQc> f, double limit, Path file) {
        double max = Double.isNaN(limit) ? 0 : limit;
        for (LineQc q : lines) {
            double v = f.applyAsDouble(q);
            if (!Double.isNaN(v)) {
                max = Math.max(max, v);
            }
        }
        QcPlot p = new QcPlot(900, 360, title, "line (file order)", yLabel, -0.5, lines.size() - 0.5, 0,
                max > 0 ? max * 1.1 : 1, false);
        for (int k = 0; k < lines.size(); k++) {
            p.bar(k, 0.8, f.applyAsDouble(lines.get(k)), lines.get(k).tie() ? TIE : TRAVERSE);
        }
        if (!Double.isNaN(limit)) {
            p.hline(limit, Color.RED, "limit " + num(limit, 2));
        }
        p.write(file);
    }

    private static void crossoverPlot(ProcessedSurvey s, Path file) {
        List<Crossover> xs = s.crossovers();
        LineLevelling.Solution sol = s.levelling().orElseThrow();
        double lo = 0, hi = 0;
        double[] after = new double[xs.size()];
        for (int k = 0; k < xs.size(); k++) {
            Crossover c = xs.get(k);
            after[k] = c.misfit() + sol.correction(c.traverseLine(), c.traverseTime()) - sol.correction(c.tieLine(), c.tieTime());
            lo = Math.min(lo, Math.min(c.misfit(), after[k]));
            hi = Math.max(hi, Math.max(c.misfit(), after[k]));
        }
        QcPlot p = new QcPlot(900, 360, "Crossover misfit (traverse - tie) before and after levelling", "crossover",
                "misfit (nT)", -0.5, xs.size() - 0.5, lo, hi, false);
        for (int k = 0; k < xs.size(); k++) {
            p.point(k, xs.get(k).misfit(), BEFORE);
            p.point(k, after[k], AFTER);
        }
        p.legend(0, BEFORE, "before");
        p.legend(1, AFTER, "after");
        p.write(file);
    }

    /** Deletes {@code p} and everything below it; nothing when it does not exist. */
    public static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(p)) {
            for (Path q : (Iterable<Path>) walk.sorted(Comparator.reverseOrder())::iterator) {
                Files.delete(q);
            }
        }
    }

    private static void deleteQuietly(Path p) {
        try {
            deleteTree(p);
        } catch (IOException ignored) {
            // the original failure is the one to report
        }
    }
}
