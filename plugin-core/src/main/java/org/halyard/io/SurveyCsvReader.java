package org.halyard.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.halyard.grid.Progress;
import org.halyard.survey.SensorSpec;
import org.halyard.survey.SurveyColumns;
import org.halyard.survey.SurveyLines;

/**
 * Reads a survey CSV (header row, one sample of the array reference point per row) into the columnar
 * {@link SurveyLines}, streaming: numbers and times are parsed from the line buffer without strings and
 * a line identifier becomes a string only when it changes.
 *
 * <p>Checks, each failing with the file, line number and column: missing columns (listing those
 * present), non-numeric cells, truncated rows, empty line ids or positions, times going backwards or
 * repeating within a line, a line whose rows are not contiguous. Latitude/longitude columns are projected
 * into the recipe CRS with {@link CrsTransforms}.
 *
 * <p><b>Limitations:</b> rows of a line must be contiguous; positions may not be empty.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class SurveyCsvReader {

    private SurveyCsvReader() {
    }

    /**
     * Reads {@code file}.
     *
     * @param file     the CSV (UTF-8, comma-delimited, header row)
     * @param columns  the column mapping
     * @param crsCode  the recipe CRS (projected, metres), e.g. {@code EPSG:32631}; checked to exist
     * @param progress progress and cancellation, or null
     * @return the line data: x easting, y northing (m), altitude positive up, depth positive down (m), nT
     */
    public static SurveyLines read(Path file, SurveyColumns columns, String crsCode, Progress progress) {
        return read(file, columns, crsCode, false, m -> { }, progress);
    }

    /**
     * Reads {@code file}, optionally skipping the rows that cannot be read (truncated, a cell that is not a
     * number or not an ISO 8601 time, an empty line id, time or position, a time that repeats or goes
     * backwards within its line). Skipped rows are reported once through {@code warnings}: their count and
     * the first {@value SkippedRows#SHOWN} with line number, column and reason. A line that resumes after
     * other lines is never skipped: it is an error in the file's layout, not in one row.
     *
     * @param skipBadRows false: the first bad row is an error, as {@link #read(Path, SurveyColumns, String, Progress)}
     * @param warnings    receives the one-sentence report of skipped rows, if any
     * @see #read(Path, SurveyColumns, String, Progress)
     */
    public static SurveyLines read(Path file, SurveyColumns columns, String crsCode, boolean skipBadRows,
                                   java.util.function.Consumer<String> warnings, Progress progress) {
        Progress p = Progress.orNone(progress);
        CrsTransforms.requireProjected(crsCode);
        try (CsvTableReader r = CsvTableReader.open(file)) {
            List<String> names = new ArrayList<>();
            names.add(columns.line());
            columns.time().ifPresent(names::add);
            boolean geo = columns.geographic();
            names.add(geo ? columns.longitude().orElseThrow() : columns.x().orElseThrow());
            names.add(geo ? columns.latitude().orElseThrow() : columns.y().orElseThrow());
            columns.altitude().ifPresent(names::add);
            columns.depth().ifPresent(names::add);
            for (SensorSpec s : columns.sensors()) {
                names.add(s.column());
            }
            List<String> missing = new ArrayList<>();
            for (String n : names) {
                if (r.findColumn(n) < 0) {
                    missing.add(n);
                }
            }
            if (!missing.isEmpty()) {
                throw new IllegalArgumentException(file + ": line 1: missing column" + (missing.size() > 1 ? "s " : " ")
                        + String.join(", ", missing) + "; columns present: " + String.join(", ", r.header()));
            }
            int cLine = r.column(columns.line());
            int cTime = columns.time().map(r::column).orElse(-1);
            int cx = r.column(names.get(cTime >= 0 ? 2 : 1));
            int cy = r.column(names.get(cTime >= 0 ? 3 : 2));
            int cAlt = columns.altitude().map(r::column).orElse(-1);
            int cDep = columns.depth().map(r::column).orElse(-1);
            int ns = columns.sensors().size();
            int[] cs = new int[ns];
            int maxCol = Math.max(Math.max(cLine, cTime), Math.max(Math.max(cx, cy), Math.max(cAlt, cDep)));
            for (int s = 0; s < ns; s++) {
                cs[s] = r.column(columns.sensors().get(s).column());
                maxCol = Math.max(maxCol, cs[s]);
            }
            String timeName = cTime >= 0 ? r.header().get(cTime) : null;

            int cap = 1 << 16;
            GrowableDoubles t = new GrowableDoubles(cap), x = new GrowableDoubles(cap), y = new GrowableDoubles(cap);
            GrowableDoubles alt = new GrowableDoubles(cap), dep = new GrowableDoubles(cap);
            GrowableDoubles[] v = new GrowableDoubles[ns];
            for (int s = 0; s < ns; s++) {
                v[s] = new GrowableDoubles(cap);
            }
            List<String> ids = new ArrayList<>();
            List<Integer> starts = new ArrayList<>();
            Map<String, Long> firstSeen = new HashMap<>();
            String current = null;
            double prevT = Double.NaN;
            long prevLine = 0;
            int row = 0;
            int indexInLine = 0;
            SkippedRows skipped = new SkippedRows(file, skipBadRows);
            double[] vv = new double[ns]; // one row's sensor values, kept until the row is known good
            while (r.next()) {
                boolean newLine = false;
                String id = current;
                double tt, xx, yy, aa, dd;
                try {
                    r.requireFields(maxCol + 1);
                    newLine = current == null || !r.textEquals(cLine, current);
                    if (newLine) {
                        id = r.text(cLine).toString();
                        if (id.isEmpty()) {
                            throw new IllegalArgumentException(file + ": line " + r.lineNumber() + ", column '"
                                    + columns.line() + "': empty line identifier");
                        }
                        Long seen = firstSeen.get(id);
                        if (seen != null) {
                            throw new StructureError(file + ": line " + r.lineNumber() + ", column '"
                                    + columns.line() + "': line '" + id + "' (first at line " + seen
                                    + ") resumes after other lines; rows of a line must be contiguous");
                        }
                    }
                    double before = newLine ? Double.NaN : prevT;
                    if (cTime >= 0) {
                        tt = r.isoTime(cTime);
                        if (Double.isNaN(tt)) {
                            throw new IllegalArgumentException(file + ": line " + r.lineNumber() + ", column '"
                                    + timeName + "': empty time");
                        }
                        if (tt <= before) {
                            throw new IllegalArgumentException(file + ": line " + r.lineNumber() + ", column '"
                                    + timeName + "': " + (tt == before ? "duplicate time" : "time goes backwards")
                                    + " within line '" + current + "' (previous row at line " + prevLine + ": "
                                    + IsoTime.format(before) + ", this row: " + IsoTime.format(tt) + ")");
                        }
                    } else {
                        tt = newLine ? 0 : indexInLine;
                    }
                    xx = r.number(cx);
                    yy = r.number(cy);
                    if (Double.isNaN(xx) || Double.isNaN(yy)) {
                        throw new IllegalArgumentException(file + ": line " + r.lineNumber() + ", column '"
                                + r.header().get(Double.isNaN(xx) ? cx : cy) + "': empty position");
                    }
                    aa = cAlt >= 0 ? r.number(cAlt) : Double.NaN;
                    dd = cDep >= 0 ? r.number(cDep) : Double.NaN;
                    for (int s = 0; s < ns; s++) {
                        vv[s] = r.number(cs[s]);
                    }
                } catch (StructureError e) {
                    throw e;
                } catch (IllegalArgumentException e) {
                    skipped.add(e);
                    continue;
                }
                if (newLine) {
                    firstSeen.put(id, r.lineNumber());
                    current = id;
                    ids.add(id);
                    starts.add(row);
                    indexInLine = 0;
                }
                prevT = tt;
                prevLine = r.lineNumber();
                t.add(tt);
                x.add(xx);
                y.add(yy);
                alt.add(aa);
                dep.add(dd);
                for (int s = 0; s < ns; s++) {
                    v[s].add(vv[s]);
                }
                row++;
                indexInLine++;
                if ((row & 0xFFFF) == 0) {
                    p.checkCanceled();
                }
            }
            skipped.report(warnings);
            if (row == 0) {
                throw new IllegalArgumentException(file + ": no data rows after the header");
            }
            int[] lineStart = new int[ids.size() + 1];
            for (int l = 0; l < ids.size(); l++) {
                lineStart[l] = starts.get(l);
            }
            lineStart[ids.size()] = row;
            double[] xa = x.toArray(), ya = y.toArray();
            if (geo) {
                checkGeographic(file, xa, ya);
                CrsTransforms.transformInPlace(CrsTransforms.WGS84, crsCode, xa, ya);
            }
            double[][] va = new double[ns][];
            for (int s = 0; s < ns; s++) {
                va[s] = v[s].toArray();
            }
            p.report(100);
            return new SurveyLines(file.getFileName().toString(), ids.toArray(new String[0]), lineStart,
                    cTime >= 0, t.toArray(), xa, ya, alt.toFloatArray(), dep.toFloatArray(), columns.sensors(), va);
        }
    }

    /** A fault in the file's layout rather than in one row: never skipped. */
    private static final class StructureError extends IllegalArgumentException {
        StructureError(String message) {
            super(message);
        }
    }

    /** The rows skipped so far: their count and the first few reasons. */
    private static final class SkippedRows {
        static final int SHOWN = 5;
        private final Path file;
        private final boolean allowed;
        private final List<String> first = new ArrayList<>();
        private long count;

        SkippedRows(Path file, boolean allowed) {
            this.file = file;
            this.allowed = allowed;
        }

        void add(IllegalArgumentException e) {
            if (!allowed) {
                throw e;
            }
            count++;
            if (first.size() < SHOWN) {
                String m = e.getMessage();
                String prefix = file + ": ";
                first.add(m.startsWith(prefix) ? m.substring(prefix.length()) : m);
            }
        }

        void report(java.util.function.Consumer<String> warnings) {
            if (count > 0) {
                warnings.accept(file.getFileName() + ": skipped " + count + " row" + (count > 1 ? "s" : "")
                        + " that could not be read (" + (count > SHOWN ? "first " + SHOWN + ": " : "")
                        + String.join("; ", first) + ")");
            }
        }
    }

    private static void checkGeographic(Path file, double[] lon, double[] lat) {
        for (int i = 0; i < lon.length; i++) {
            if (!(Math.abs(lat[i]) <= 90) || !(Math.abs(lon[i]) <= 360)) {
                throw new IllegalArgumentException(file + ": data row " + (i + 1) + ": latitude " + lat[i]
                        + " / longitude " + lon[i] + " is not a WGS 84 position in degrees");
            }
        }
    }
}
