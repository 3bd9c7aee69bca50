package org.halyard.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Writes a plain comma-separated table: one header row, no comment lines, UTF-8, {@code \n} line ends
 * (RFC 4180 quoting: a field holding a comma, quote or line break is quoted, quotes doubled).
 *
 * <p>Numbers go through {@link #number(double)}: {@code NaN} becomes an empty field, others print with up
 * to {@code digits} decimals in the root locale.
 *
 * <p><b>Thread safety:</b> none; one writer per file.
 */
public final class CsvTableWriter implements AutoCloseable {

    private final Path file;
    private final BufferedWriter out;
    private final int columns;

    private CsvTableWriter(Path file, BufferedWriter out, int columns) {
        this.file = file;
        this.out = out;
        this.columns = columns;
    }

    /** Creates (or replaces) {@code file} and writes the header row. */
    public static CsvTableWriter create(Path file, List<String> header) {
        try {
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            CsvTableWriter w = new CsvTableWriter(file, Files.newBufferedWriter(file, StandardCharsets.UTF_8),
                    header.size());
            w.row(header);
            return w;
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot write: " + e.getMessage(), e);
        }
    }

    /** Writes one row; it must have as many fields as the header. */
    public void row(List<String> fields) {
        if (fields.size() != columns) {
            throw new IllegalArgumentException(file + ": row of " + fields.size() + " fields under a header of " + columns);
        }
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                b.append(',');
            }
            b.append(quote(fields.get(i)));
        }
        try {
            out.write(b.append('\n').toString());
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot write: " + e.getMessage(), e);
        }
    }

    /** {@code v} with up to 6 decimals, trailing zeros dropped; empty for {@code NaN}. */
    public static String number(double v) {
        return number(v, 6);
    }

    /** {@code v} with up to {@code digits} decimals, trailing zeros dropped; empty for {@code NaN}. */
    public static String number(double v, int digits) {
        if (Double.isNaN(v)) {
            return "";
        }
        String s = String.format(Locale.ROOT, "%." + digits + "f", v);
        if (s.indexOf('.') >= 0) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s.equals("-0") ? "0" : s;
    }

    static String quote(String f) {
        if (f.indexOf(',') < 0 && f.indexOf('"') < 0 && f.indexOf('\n') < 0 && f.indexOf('\r') < 0) {
            return f;
        }
        return '"' + f.replace("\"", "\"\"") + '"';
    }

    @Override
    public void close() {
        try {
            out.close();
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot close: " + e.getMessage(), e);
        }
    }
}
