package org.halyard.io;

import java.io.Closeable;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * A streaming reader of delimited text tables with a header row, built for survey files of millions of
 * rows: one reusable line buffer, fields addressed by offsets, numbers parsed without creating strings.
 *
 * <p>Usage: open, look up the columns once with {@link #column(String)}, then loop on {@link #next()} and
 * read cells with {@link #number(int)} or {@link #text(int)}. Blank lines are skipped; fields may be
 * wrapped in double quotes (no line breaks inside). Every error names the file, the line number and the
 * column.
 *
 * <p><b>Thread safety:</b> none; one reader per thread.
 */
public final class CsvTableReader implements Closeable {

    private final Path file;
    private final Reader in;
    private final char delimiter;
    private final List<String> header;
    private final char[] buf = new char[1 << 16];
    private int bufLen;
    private int bufPos;
    private char[] line = new char[256];
    private int lineLen;
    private int[] starts;
    private int[] ends;
    private int fieldCount;
    private long lineNumber;
    private boolean eof;

    /** Opens {@code file} (UTF-8, comma-delimited) and reads its header row. */
    public static CsvTableReader open(Path file) {
        return open(file, ',');
    }

    /** Opens {@code file} (UTF-8) with the given delimiter and reads its header row. */
    public static CsvTableReader open(Path file, char delimiter) {
        try {
            return new CsvTableReader(file, Files.newBufferedReader(file, StandardCharsets.UTF_8), delimiter);
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException(file + ": no such file");
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot read: " + e.getMessage(), e);
        }
    }

    CsvTableReader(Path file, Reader in, char delimiter) throws IOException {
        this.file = file;
        this.in = in;
        this.delimiter = delimiter;
        this.starts = new int[16];
        this.ends = new int[16];
        if (!next()) {
            in.close();
            throw new IllegalArgumentException(file + ": empty file, expected a header row");
        }
        List<String> names = new ArrayList<>(fieldCount);
        for (int i = 0; i < fieldCount; i++) {
            String name = text(i).toString().trim();
            if (i == 0 && name.startsWith("\uFEFF")) {
                name = name.substring(1);
            }
            names.add(name);
        }
        this.header = Collections.unmodifiableList(names);
    }

    /** The file being read. */
    public Path file() {
        return file;
    }

    /** The column names of the header row, in file order. */
    public List<String> header() {
        return header;
    }

    /**
     * The index of the column named {@code name} (exact match, then case-insensitive).
     *
     * @throws IllegalArgumentException naming the columns present when there is no such column
     */
    public int column(String name) {
        int i = findColumn(name);
        if (i < 0) {
            throw new IllegalArgumentException(file + ": no column '" + name + "'; columns present: "
                    + String.join(", ", header));
        }
        return i;
    }

    /** The index of the column named {@code name}, or -1 when absent. */
    public int findColumn(String name) {
        int i = header.indexOf(name);
        if (i >= 0) {
            return i;
        }
        for (int j = 0; j < header.size(); j++) {
            if (header.get(j).equalsIgnoreCase(name)) {
                return j;
            }
        }
        return -1;
    }

    /** The 1-based line number of the current row in the file. */
    public long lineNumber() {
        return lineNumber;
    }

    /** Number of fields in the current row. */
    public int fieldCount() {
        return fieldCount;
    }

    /**
     * Advances to the next non-blank row.
     *
     * @return false at the end of the file
     */
    public boolean next() {
        try {
            while (readLine()) {
                if (lineLen > 0 && !isBlankLine()) {
                    split();
                    return true;
                }
            }
            return false;
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": read failed after line " + lineNumber + ": "
                    + e.getMessage(), e);
        }
    }

    /**
     * Checks that the current row has at least {@code n} fields.
     *
     * @throws IllegalArgumentException for a truncated row
     */
    public void requireFields(int n) {
        if (fieldCount < n) {
            String first = fieldCount < header.size() ? ", column '" + header.get(fieldCount) + "'" : "";
            throw new IllegalArgumentException(file + ": line " + lineNumber + first + ": truncated row, "
                    + fieldCount + " fields where the header has " + header.size());
        }
    }

    /** Whether field {@code col} of the current row is missing or empty. */
    public boolean isEmpty(int col) {
        return col >= fieldCount || trimmedStart(col) >= trimmedEnd(col);
    }

    /** Field {@code col} of the current row, without quotes; valid until the next call to {@link #next()}. */
    public CharSequence text(int col) {
        requireFields(col + 1);
        return java.nio.CharBuffer.wrap(line, trimmedStart(col), trimmedEnd(col) - trimmedStart(col));
    }

    /**
     * Field {@code col} of the current row as a number; an empty field gives {@code NaN}.
     *
     * @throws IllegalArgumentException naming file, line and column when the field is not a number
     */
    public double number(int col) {
        return parsed(col, FastDecimal::parse, "not a number");
    }

    /** A char-range parser returning NaN for text it does not accept. */
    private interface RangeParser {
        double parse(char[] s, int from, int to);
    }

    private double parsed(int col, RangeParser parser, String what) {
        requireFields(col + 1);
        int s = trimmedStart(col), e = trimmedEnd(col);
        if (s >= e) {
            return Double.NaN;
        }
        double v = parser.parse(line, s, e);
        if (Double.isNaN(v) && !FastDecimal.isNanLiteral(line, s, e)) {
            throw new IllegalArgumentException(file + ": line " + lineNumber + ", column '" + header.get(col)
                    + "': " + what + ": '" + new String(line, s, Math.min(e - s, 40)) + "'");
        }
        return v;
    }

    /**
     * Field {@code col} of the current row as an ISO 8601 UTC time in epoch seconds (see {@link IsoTime});
     * an empty field gives {@code NaN}.
     *
     * @throws IllegalArgumentException naming file, line and column when the field is not such a time
     */
    public double isoTime(int col) {
        return parsed(col, IsoTime::parse, "not an ISO 8601 UTC time (like 2026-05-14T09:30:00.100Z)");
    }

    /** Whether field {@code col} of the current row, without quotes, equals {@code s}; creates no string. */
    public boolean textEquals(int col, String s) {
        requireFields(col + 1);
        int a = trimmedStart(col), e = trimmedEnd(col);
        if (e - a != s.length()) {
            return false;
        }
        for (int k = 0; k < s.length(); k++) {
            if (line[a + k] != s.charAt(k)) {
                return false;
            }
        }
        return true;
    }

    private int trimmedStart(int col) {
        int s = starts[col], e = ends[col];
        while (s < e && line[s] == ' ') {
            s++;
        }
        if (s < e && line[s] == '"') {
            s++;
        }
        return s;
    }

    private int trimmedEnd(int col) {
        int s = starts[col], e = ends[col];
        while (e > s && (line[e - 1] == ' ' || line[e - 1] == '\r')) {
            e--;
        }
        if (e > s && line[e - 1] == '"' && e - 1 >= trimmedStart(col)) {
            e--;
        }
        return e;
    }

    private boolean isBlankLine() {
        for (int i = 0; i < lineLen; i++) {
            char c = line[i];
            if (c != ' ' && c != '\t' && c != '\r') {
                return false;
            }
        }
        return true;
    }

    private void split() {
        fieldCount = 0;
        int start = 0;
        boolean quoted = false;
        for (int i = 0; i <= lineLen; i++) {
            if (i < lineLen) {
                char c = line[i];
                if (c == '"') {
                    quoted = !quoted;
                    continue;
                }
                if (c != delimiter || quoted) {
                    continue;
                }
            }
            if (fieldCount == starts.length) {
                starts = java.util.Arrays.copyOf(starts, fieldCount * 2);
                ends = java.util.Arrays.copyOf(ends, fieldCount * 2);
            }
            starts[fieldCount] = start;
            ends[fieldCount] = i;
            fieldCount++;
            start = i + 1;
        }
    }

    private boolean readLine() throws IOException {
        if (eof) {
            return false;
        }
        lineLen = 0;
        while (true) {
            if (bufPos == bufLen) {
                bufLen = in.read(buf, 0, buf.length);
                bufPos = 0;
                if (bufLen <= 0) {
                    eof = true;
                    bufLen = 0;
                    lineNumber++;
                    return lineLen > 0;
                }
            }
            int i = bufPos;
            while (i < bufLen && buf[i] != '\n') {
                i++;
            }
            append(bufPos, i);
            if (i < bufLen) {
                bufPos = i + 1;
                lineNumber++;
                return true;
            }
            bufPos = bufLen;
        }
    }

    private void append(int from, int to) {
        int n = to - from;
        if (lineLen + n > line.length) {
            line = java.util.Arrays.copyOf(line, Math.max(line.length * 2, lineLen + n));
        }
        System.arraycopy(buf, from, line, lineLen, n);
        lineLen += n;
    }

    @Override
    public void close() {
        try {
            in.close();
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": close failed: " + e.getMessage(), e);
        }
    }
}
