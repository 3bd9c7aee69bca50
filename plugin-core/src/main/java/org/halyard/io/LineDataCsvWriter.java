package org.halyard.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.halyard.grid.Progress;
import org.halyard.survey.GradientPoints;
import org.halyard.survey.ProcessedSurvey;
import org.halyard.survey.SampleFlags;
import org.halyard.survey.SensorTrack;
import org.halyard.survey.SurveyLines;

/**
 * Writes processed line data as CSV, one row per sample: {@code line, time, x, y, heading_deg,
 * distance_m, altitude, depth}, then per sensor {@code <s>_x, <s>_y, <s>, <s>_flags} (corrected value in
 * nT, flags as names joined by '|'), then per sensor pair {@code <port>_<stbd>_gx, _gy} (nT/m). Positions
 * with 3 decimals (mm), fields with 3 (pT), gradients with 4. The file is written beside its target and
 * moved into place when complete.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class LineDataCsvWriter {

    private LineDataCsvWriter() {
    }

    /**
     * Writes {@code survey} to {@code file}.
     *
     * @param progress progress and cancellation, or null
     */
    public static void write(ProcessedSurvey survey, Path file, Progress progress) {
        Progress p = Progress.orNone(progress);
        Path abs = file.toAbsolutePath();
        Path tmp = abs.resolveSibling(abs.getFileName() + ".tmp-" + ProcessHandle.current().pid());
        SurveyLines lines = survey.lines();
        try {
            Files.createDirectories(abs.getParent());
            try (BufferedWriter w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                StringBuilder sb = new StringBuilder(256);
                sb.append("line,time,x,y,heading_deg,distance_m,altitude,depth");
                for (SensorTrack st : survey.sensors()) {
                    String c = st.spec().column();
                    sb.append(',').append(c).append("_x,").append(c).append("_y,").append(c).append(',').append(c)
                            .append("_flags");
                }
                for (GradientPoints g : survey.gradients()) {
                    String c = g.pair().replace('/', '_');
                    sb.append(',').append(c).append("_gx,").append(c).append("_gy");
                }
                w.append(sb).append('\n');
                double[] t = lines.time();
                for (int l = 0; l < lines.lineCount(); l++) {
                    String id = lines.lineId(l);
                    for (int i = lines.start(l); i < lines.end(l); i++) {
                        sb.setLength(0);
                        sb.append(id).append(',');
                        if (lines.hasTime()) {
                            IsoTime.format(t[i], sb);
                        }
                        sb.append(',');
                        fixed(sb, lines.x()[i], 3).append(',');
                        fixed(sb, lines.y()[i], 3).append(',');
                        fixed(sb, survey.headingDeg()[i], 2).append(',');
                        fixed(sb, survey.distanceM()[i], 3).append(',');
                        fixed(sb, lines.altitude()[i], 2).append(',');
                        fixed(sb, lines.depth()[i], 2);
                        for (SensorTrack st : survey.sensors()) {
                            sb.append(',');
                            fixed(sb, st.x()[i], 3).append(',');
                            fixed(sb, st.y()[i], 3).append(',');
                            fixed(sb, st.value()[i], 3).append(',').append(SampleFlags.describe(st.flags()[i]));
                        }
                        for (GradientPoints g : survey.gradients()) {
                            sb.append(',');
                            fixed(sb, g.gx()[i], 4).append(',');
                            fixed(sb, g.gy()[i], 4);
                        }
                        w.append(sb).append('\n');
                    }
                    if ((l & 15) == 0) {
                        p.checkCanceled();
                        p.report(100.0 * l / lines.lineCount());
                    }
                }
            }
            Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            p.report(100);
        } catch (IOException e) {
            deleteQuietly(tmp);
            throw new UncheckedIOException(file + ": cannot write: " + e.getMessage(), e);
        } catch (RuntimeException e) {
            deleteQuietly(tmp);
            throw e;
        }
    }

    private static final long[] POW10 = {1, 10, 100, 1000, 10000, 100000, 1000000};

    /** Appends {@code v} with {@code digits} decimals (half away from zero); NaN appends nothing. */
    static StringBuilder fixed(StringBuilder sb, double v, int digits) {
        if (Double.isNaN(v)) {
            return sb;
        }
        if (Math.abs(v) >= 1e12 || Double.isInfinite(v)) {
            return sb.append(v);
        }
        long scale = POW10[digits];
        long q = Math.round(Math.abs(v) * scale);
        if (v < 0 && q != 0) {
            sb.append('-');
        }
        sb.append(q / scale);
        if (digits > 0) {
            sb.append('.');
            long frac = q % scale;
            for (long d = scale / 10; d > 0; d /= 10) {
                sb.append((char) ('0' + frac / d % 10));
            }
        }
        return sb;
    }

    private static void deleteQuietly(Path p) {
        try {
            Files.deleteIfExists(p);
        } catch (IOException ignored) {
            // the original failure is the one to report
        }
    }
}
