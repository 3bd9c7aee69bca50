package org.halyard.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;
import org.halyard.io.Iaga2002Reader;
import org.halyard.io.LineDataCsvWriter;
import org.halyard.io.SurveyCsvReader;
import org.halyard.survey.BaseStation;
import org.halyard.survey.LagOptions;
import org.halyard.survey.LevellingTrend;
import org.halyard.survey.MicroLevelling;
import org.halyard.survey.ProcessedSurvey;
import org.halyard.survey.QcReportWriter;
import org.halyard.survey.SensorSpec;
import org.halyard.survey.SurveyColumns;
import org.halyard.survey.SurveyInput;
import org.halyard.survey.SurveyLines;
import org.halyard.survey.SurveyOptions;
import org.halyard.survey.SurveyProcessing;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code halyard lines}: imports survey lines, positions the sensors, removes the diurnal, repairs spikes,
 * levels on tie lines and writes the processed CSV and the QC report.
 */
@Command(name = "lines", mixinStandardHelpOptions = true, description = {
        "Process survey lines: import, sensor positions, diurnal correction, spike repair, optional lag estimate",
        "and shift, tie-line levelling, optional micro-levelling, gradients; writes OUT/lines_processed.csv and OUT/report/ (qc.html, qc_lines.csv, plots)."})
final class LinesCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "LINES.csv", description = "Survey CSV with a header row.")
    Path file;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Output directory.")
    Path out;

    @Option(names = "--crs", required = true, paramLabel = "EPSG:n", description = "Projected CRS of x/y (metres).")
    String crs;

    @Option(names = "--sensor", required = true, paramLabel = "COL:ACROSS[:ALONG]",
            description = "A sensor column and its offsets in metres (across positive starboard, along positive "
                    + "forward); repeat for each sensor.")
    List<String> sensors;

    @Option(names = "--skip-bad-rows", description = "Skip rows that cannot be read (truncated, not a number,"
            + " bad or repeated time) with a warning giving their count and first line numbers, instead of stopping.")
    boolean skipBadRows;

    @Option(names = "--line", defaultValue = "line", paramLabel = "COL", description = "Line id column (default: ${DEFAULT-VALUE}).")
    String line;

    @Option(names = "--time", defaultValue = "time", paramLabel = "COL",
            description = "ISO 8601 UTC time column (default: ${DEFAULT-VALUE}); '-' for none.")
    String time;

    @Option(names = "--x", defaultValue = "x", paramLabel = "COL", description = "Easting column (default: ${DEFAULT-VALUE}).")
    String x;

    @Option(names = "--y", defaultValue = "y", paramLabel = "COL", description = "Northing column (default: ${DEFAULT-VALUE}).")
    String y;

    @Option(names = "--lat", paramLabel = "COL", description = "WGS 84 latitude column, instead of --x/--y.")
    String lat;

    @Option(names = "--lon", paramLabel = "COL", description = "WGS 84 longitude column, instead of --x/--y.")
    String lon;

    @Option(names = "--altitude", paramLabel = "COL", description = "Altitude above the seabed column, m.")
    String altitude;

    @Option(names = "--depth", paramLabel = "COL", description = "Depth below the sea surface column, m.")
    String depth;

    @Option(names = "--tie", split = ",", paramLabel = "ID", description = "Tie line ids (comma-separated or repeated).")
    List<String> ties = new ArrayList<>();

    @Option(names = "--base", paramLabel = "FILE", description = "Base-station file, IAGA-2002.")
    Path base;

    @Option(names = "--datum", paramLabel = "NT", description = "Diurnal datum, nT (default: median base F over the survey).")
    Double datum;

    @Option(names = "--base-gap", paramLabel = "S", description = "Longest base-station gap bridged, s (default: 3 samples).")
    Double baseGap;

    @Option(names = "--trend", defaultValue = "constant", paramLabel = "FORM",
            description = "Levelling correction per line: none, constant, linear, quadratic (default: ${DEFAULT-VALUE}).")
    String trend;

    @Option(names = "--adjust-ties", description = "Correct tie lines too (zero mean) instead of holding them fixed.")
    boolean adjustTies;

    @Option(names = "--spike-sigmas", defaultValue = "10", paramLabel = "K",
            description = "Spike threshold in MAD sigmas of the fourth difference; 0 for none (default: ${DEFAULT-VALUE}).")
    double spikeSigmas;

    @Option(names = "--altitude-limit", paramLabel = "M", description = "Altitude limit for QC, m.")
    Double altitudeLimit;

    @Option(names = "--spacing-limit", paramLabel = "M", description = "Line spacing limit for QC, m.")
    Double spacingLimit;

    @Option(names = "--estimate-lag", description = "Estimate the lag between positions and readings from neighbouring "
            + "lines run in opposite directions, and report it.")
    boolean estimateLag;

    @Option(names = "--apply-estimated-lag", description = "Shift the positions along track by the estimated lag "
            + "(implies --estimate-lag).")
    boolean applyEstimatedLag;

    @Option(names = "--lag", paramLabel = "S", description = "Shift the positions along track by this known lag, s "
            + "(positive when the readings are late).")
    Double lag;

    @Option(names = "--max-lag", defaultValue = "2", paramLabel = "S",
            description = "Largest lag the estimate tries either way, s (default: ${DEFAULT-VALUE}).")
    double maxLag;

    @Option(names = "--micro-level", description = "Micro-level the traverse lines after tie-line levelling "
            + "(directional filter after Minty 1991).")
    boolean microLevel;

    @Option(names = "--micro-across", paramLabel = "M", description = "Micro-levelling across-line wavelength, m "
            + "(default: " + MicroLevelling.DEFAULT_ACROSS_SPACINGS + " line spacings).")
    Double microAcross;

    @Option(names = "--micro-along", paramLabel = "M", description = "Micro-levelling along-line wavelength, m "
            + "(default: " + MicroLevelling.DEFAULT_ALONG_SPACINGS + " line spacings).")
    Double microAlong;

    @Option(names = "--micro-limit", paramLabel = "NT", description = "Largest micro-levelling correction, nT "
            + "(default: " + MicroLevelling.DEFAULT_LIMIT_NT + ").")
    Double microLimit;

    @Option(names = "--timings", description = "Print the time of each stage to stderr.")
    boolean timings;

    @Override
    public Integer call() {
        long t0 = System.nanoTime();
        var threads = java.lang.management.ManagementFactory.getThreadMXBean();
        long c0 = threads.getCurrentThreadCpuTime();
        SurveyColumns cols = new SurveyColumns(line, "-".equals(time) ? Optional.empty() : Optional.of(time),
                lat != null ? Optional.empty() : Optional.of(x), lat != null ? Optional.empty() : Optional.of(y),
                Optional.ofNullable(lat), Optional.ofNullable(lon), Optional.ofNullable(altitude),
                Optional.ofNullable(depth), parseSensors(sensors));
        SurveyLines data = SurveyCsvReader.read(file, cols, crs, skipBadRows, m -> System.err.println("warning: " + m),
                null);
        long t1 = System.nanoTime();
        long c1 = threads.getCurrentThreadCpuTime();
        BaseStation bs = base != null ? Iaga2002Reader.read(base) : null;
        Set<String> tieSet = new LinkedHashSet<>(ties);
        SurveyOptions opt = SurveyOptions.defaults()
                .withLevelling(parseTrend(trend), adjustTies)
                .withLimits(altitudeLimit != null ? altitudeLimit : Double.NaN, spacingLimit != null ? spacingLimit : Double.NaN)
                .withDiurnal(datum != null ? datum : Double.NaN, baseGap != null ? baseGap : Double.NaN)
                .withCleaning(spikeSigmas, SurveyOptions.defaults().headingSmoothingM())
                .withLag(new LagOptions(estimateLag || applyEstimatedLag, applyEstimatedLag,
                        lag != null ? lag : Double.NaN, maxLag))
                .withMicroLevelling(microLevellingSettings());
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(data, tieSet), opt, bs, null);
        long t2 = System.nanoTime();
        // both outputs go to a staging folder first, so a failure leaves neither (no partial output)
        Path stage = out.resolve(".lines.partial");
        long t3, t4;
        try {
            LineDataCsvWriter.write(ps, stage.resolve("lines_processed.csv"), null);
            t3 = System.nanoTime();
            QcReportWriter.write(ps, stage.resolve("report"));
            t4 = System.nanoTime();
            publish(stage, out);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(out + ": cannot write outputs: " + e.getMessage(), e);
        } finally {
            deleteQuietly(stage);
        }
        ps.messages().forEach(m -> System.out.println(m));
        System.out.println("wrote " + out.resolve("lines_processed.csv") + " and " + out.resolve("report/qc.html"));
        if (timings) {
            System.err.printf(Locale.ROOT, "timings: import %.2f s, processing %.2f s, csv %.2f s, report %.2f s, "
                    + "total %.2f s; heap used %.0f MB%n", (t1 - t0) / 1e9, (t2 - t1) / 1e9, (t3 - t2) / 1e9,
                    (t4 - t3) / 1e9, (t4 - t0) / 1e9,
                    (Runtime.getRuntime().totalMemory() - Runtime.getRuntime().freeMemory()) / 1e6);
            System.err.printf(Locale.ROOT, "timings: cpu of the main thread: import %.2f s%n", (c1 - c0) / 1e9);
            ps.stageSeconds().forEach((k, v) -> System.err.printf(Locale.ROOT, "timings: cpu of the main thread: %s %.2f s%n", k, v));
            System.err.printf(Locale.ROOT, "timings: cpu %.2f s (process)%n",
                    java.lang.management.ManagementFactory.getRuntimeMXBean() != null
                            ? ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory
                            .getOperatingSystemMXBean()).getProcessCpuTime() / 1e9 : Double.NaN);
        }
        return 0;
    }

    private static void publish(Path stage, Path out) throws java.io.IOException {
        Path csv = out.resolve("lines_processed.csv"), report = out.resolve("report");
        QcReportWriter.deleteTree(report);
        java.nio.file.Files.move(stage.resolve("lines_processed.csv"), csv, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        java.nio.file.Files.move(stage.resolve("report"), report, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
    }

    private static void deleteQuietly(Path p) {
        try {
            QcReportWriter.deleteTree(p);
        } catch (java.io.IOException ignored) {
            // the original outcome is the one to report
        }
    }

    /** The micro-levelling settings when {@code --micro-level} is given; the other micro options need it. */
    Optional<MicroLevelling.Settings> microLevellingSettings() {
        if (!microLevel) {
            if (microAcross != null || microAlong != null || microLimit != null) {
                throw new IllegalArgumentException("--micro-across, --micro-along and --micro-limit need --micro-level");
            }
            return Optional.empty();
        }
        return Optional.of(new MicroLevelling.Settings(microAcross != null ? microAcross : Double.NaN,
                microAlong != null ? microAlong : Double.NaN, microLimit != null ? microLimit : MicroLevelling.DEFAULT_LIMIT_NT));
    }

    static List<SensorSpec> parseSensors(List<String> specs) {
        List<SensorSpec> out = new ArrayList<>();
        for (String s : specs) {
            String[] p = s.split(":");
            if (p.length < 2 || p.length > 3) {
                throw new IllegalArgumentException("--sensor '" + s + "': expected COL:ACROSS[:ALONG] in metres");
            }
            try {
                out.add(new SensorSpec(p[0], Double.parseDouble(p[1]), p.length == 3 ? Double.parseDouble(p[2]) : 0));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("--sensor '" + s + "': offsets must be numbers of metres");
            }
        }
        return out;
    }

    static LevellingTrend parseTrend(String s) {
        try {
            return LevellingTrend.valueOf(s.trim().toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--trend '" + s + "': expected none, constant, linear or quadratic");
        }
    }
}
