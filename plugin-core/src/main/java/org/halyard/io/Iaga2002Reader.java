package org.halyard.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import org.halyard.survey.BaseStation;

/**
 * Reads geomagnetic base-station data in the IAGA-2002 exchange format (INTERMAGNET; format description
 * of the IAGA Division V working group, revision of 2001 with later additions).
 *
 * <p><b>Format as read:</b> header records begin with a space and end with '|'; labels start in column 2,
 * values in column 25; comment records begin with " #". The data header record starts {@code DATE TIME
 * DOY} and names four element columns (IAGA code plus element letter, e.g. {@code ABCX ... ABCF}). Data
 * records hold {@code YYYY-MM-DD hh:mm:ss.sss DOY} and four values; 99999.00 marks a missing value and
 * 88888.00 a value not recorded. Elements accepted: XYZ or HDZ, then F, or G (delta F) or a fourth column
 * with no F at all, in which case F is computed from the components. D is in minutes of arc (format
 * description). Any sample interval is accepted; 1 s and 1 min are the usual products.
 *
 * <p>Errors name the file, the line number and, for a value, the column (element).
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class Iaga2002Reader {

    /** The missing-data marker of IAGA-2002. */
    public static final double MISSING = 99999.0;
    /** The not-recorded marker of IAGA-2002. */
    public static final double NOT_RECORDED = 88888.0;

    private Iaga2002Reader() {
    }

    /**
     * Reads {@code file}.
     *
     * @return components X north, Y east, Z down and F in nT, NaN where marked missing or not recorded
     * @throws IllegalArgumentException naming file, line and column for malformed content
     */
    public static BaseStation read(Path file) {
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.ISO_8859_1)) {
            return parse(file, in);
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException(file + ": no such file");
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot read: " + e.getMessage(), e);
        }
    }

    private static BaseStation parse(Path file, BufferedReader in) throws IOException {
        String code = "";
        String reported = null;
        String[] elements = null;
        long lineNo = 0;
        String s;
        while ((s = in.readLine()) != null) {
            lineNo++;
            if (s.isBlank()) {
                continue;
            }
            String trimmed = s.trim();
            if (trimmed.startsWith("DATE")) {
                String body = trimmed.endsWith("|") ? trimmed.substring(0, trimmed.length() - 1) : trimmed;
                String[] tok = body.trim().split("\\s+");
                if (tok.length != 7 || !tok[1].equals("TIME") || !tok[2].equals("DOY")) {
                    throw new IllegalArgumentException(file + ": line " + lineNo + ": data header record must be "
                            + "'DATE TIME DOY' and four element columns, found '" + trimmed + "'");
                }
                elements = new String[4];
                for (int k = 0; k < 4; k++) {
                    String t = tok[3 + k];
                    elements[k] = t.substring(t.length() - 1).toUpperCase(Locale.ROOT);
                }
                break;
            }
            if (!s.startsWith(" ") || !trimmed.endsWith("|")) {
                throw new IllegalArgumentException(file + ": line " + lineNo + ": not an IAGA-2002 header record "
                        + "(must begin with a space and end with '|'): '" + abbreviate(s) + "'");
            }
            if (trimmed.startsWith("#")) {
                continue;
            }
            String label = s.length() > 24 ? s.substring(1, 24).trim() : trimmed;
            String value = s.length() > 24 ? s.substring(24, s.lastIndexOf('|')).trim() : "";
            if (label.equalsIgnoreCase("Format") && !value.toUpperCase(Locale.ROOT).startsWith("IAGA-2002")) {
                throw new IllegalArgumentException(file + ": line " + lineNo + ": format is '" + value
                        + "', expected IAGA-2002");
            } else if (label.equalsIgnoreCase("IAGA CODE")) {
                code = value;
            } else if (label.equalsIgnoreCase("Reported")) {
                reported = value.toUpperCase(Locale.ROOT);
            }
        }
        if (elements == null) {
            throw new IllegalArgumentException(file + ": no data header record (DATE TIME DOY ...) found; "
                    + "is this an IAGA-2002 file?");
        }
        String layout = String.join("", elements);
        boolean hdz = layout.startsWith("HDZ");
        if (!hdz && !layout.startsWith("XYZ")) {
            throw new IllegalArgumentException(file + ": elements " + layout + " not supported; "
                    + "expected XYZF or HDZF (or XYZG/HDZG)");
        }
        boolean hasF = elements[3].equals("F") || elements[3].equals("S");

        GrowableDoubles t = new GrowableDoubles(1 << 12), a = new GrowableDoubles(1 << 12),
                b = new GrowableDoubles(1 << 12), c = new GrowableDoubles(1 << 12), f = new GrowableDoubles(1 << 12);
        int missing = 0, notRecorded = 0;
        double prev = Double.NEGATIVE_INFINITY;
        char[] buf = new char[0];
        while ((s = in.readLine()) != null) {
            lineNo++;
            if (s.isBlank()) {
                continue;
            }
            String[] tok = s.trim().split("\\s+");
            if (tok.length < 7) {
                throw new IllegalArgumentException(file + ": line " + lineNo + ": truncated data record, "
                        + tok.length + " fields where DATE TIME DOY and four values are expected");
            }
            String dt = tok[0] + "T" + tok[1];
            if (buf.length < dt.length()) {
                buf = new char[dt.length()];
            }
            dt.getChars(0, dt.length(), buf, 0);
            double tt = IsoTime.parse(buf, 0, dt.length());
            if (Double.isNaN(tt)) {
                throw new IllegalArgumentException(file + ": line " + lineNo + ", column DATE/TIME: not a date and "
                        + "time: '" + tok[0] + " " + tok[1] + "'");
            }
            if (tt <= prev) {
                throw new IllegalArgumentException(file + ": line " + lineNo + ", column TIME: "
                        + (tt == prev ? "duplicate time " : "time goes backwards: ") + tok[0] + " " + tok[1]);
            }
            prev = tt;
            double[] v = new double[4];
            for (int k = 0; k < 4; k++) {
                String cell = tok[3 + k];
                char[] cc = cell.toCharArray();
                double d = FastDecimal.parse(cc, 0, cc.length);
                if (Double.isNaN(d)) {
                    throw new IllegalArgumentException(file + ": line " + lineNo + ", column " + elements[k]
                            + ": not a number: '" + abbreviate(cell) + "'");
                }
                if (d >= MISSING) {
                    missing++;
                    d = Double.NaN;
                } else if (d >= NOT_RECORDED) {
                    notRecorded++;
                    d = Double.NaN;
                }
                v[k] = d;
            }
            double x, y;
            if (hdz) {
                double dRad = Math.toRadians(v[1] / 60.0); // D in minutes of arc
                x = v[0] * Math.cos(dRad);
                y = v[0] * Math.sin(dRad);
            } else {
                x = v[0];
                y = v[1];
            }
            t.add(tt);
            a.add(x);
            b.add(y);
            c.add(v[2]);
            f.add(hasF ? v[3] : Double.NaN);
        }
        double[] fa = f.toArray();
        double[] xa = a.toArray(), ya = b.toArray(), za = c.toArray();
        boolean anyF = false;
        for (double d : fa) {
            if (!Double.isNaN(d)) {
                anyF = true;
                break;
            }
        }
        boolean computed = !anyF;
        if (computed) {
            // Mixing scalar and vector F would add the instruments' baseline difference, so F is computed
            // only when the file records none at all.
            for (int i = 0; i < fa.length; i++) {
                fa[i] = Math.sqrt(xa[i] * xa[i] + ya[i] * ya[i] + za[i] * za[i]);
            }
        }
        double[] ta = t.toArray();
        if (ta.length < 2) {
            throw new IllegalArgumentException(file + ": fewer than two data records");
        }
        double[] dt = new double[ta.length - 1];
        for (int i = 0; i < dt.length; i++) {
            dt[i] = ta[i + 1] - ta[i];
        }
        Arrays.sort(dt);
        double cadence = dt[dt.length / 2];
        return new BaseStation(file.getFileName().toString(), code, reported != null ? reported : layout, ta, xa, ya,
                za, fa, computed, cadence, missing, notRecorded);
    }

    private static String abbreviate(String s) {
        return s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }
}
