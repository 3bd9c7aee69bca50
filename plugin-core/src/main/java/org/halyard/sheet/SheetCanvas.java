package org.halyard.sheet;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.pdfbox.pdmodel.graphics.image.LosslessFactory;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
import org.apache.pdfbox.util.Matrix;

/**
 * Vector drawing on one PDF page: lines, rectangles, text and images in page points (origin lower left).
 * Wraps PDFBox's content stream so the drawing classes stay short and free of checked exceptions
 * (I/O failures become {@link UncheckedIOException}).
 *
 * <p>Drawing groups are wrapped in marked content named by {@link #begin(String)} so that tests and
 * other tools can find, for example, the scale bar's paths.
 *
 * <p><b>Thread safety:</b> none; one canvas per page, used by one thread.
 */
public final class SheetCanvas implements AutoCloseable {

    /** Regular text face for measuring text (PDF standard font, so text stays searchable and extractable). */
    static final PDType1Font REGULAR = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    /** Bold text face. */
    static final PDType1Font BOLD = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);

    private final PDDocument document;
    private final PDPageContentStream out;
    // Fonts written into pages are this canvas's own: font objects shared between documents carry object
    // numbers from the previous document, and a second document in the same JVM came out in another order.
    private final PDType1Font regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    private final PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);

    /** Opens a canvas on {@code page}, which must belong to {@code document}. */
    public SheetCanvas(PDDocument document, PDPage page) {
        this.document = document;
        try {
            this.out = new PDPageContentStream(document, page);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Opens a named marked-content group (names: letters only, e.g. {@code ScaleBar}). */
    public void begin(String group) {
        run(() -> out.beginMarkedContent(COSName.getPDFName(group)));
    }

    /** Closes the innermost marked-content group. */
    public void end() {
        run(out::endMarkedContent);
    }

    /** Saves the graphics state (colour, width, dash, clip). */
    public void save() {
        run(out::saveGraphicsState);
    }

    /** Restores the graphics state saved last. */
    public void restore() {
        run(out::restoreGraphicsState);
    }

    /** Clips further drawing to {@code r} until the next {@link #restore()}. */
    public void clip(PageRect r) {
        run(() -> {
            out.addRect(r.x(), r.y(), r.width(), r.height());
            out.clip();
        });
    }

    /** Sets the stroke colour ({@code 0xRRGGBB}), width in points and dash pattern (points; none if empty). */
    public void stroke(int rgb, float width, float... dash) {
        run(() -> {
            out.setStrokingColor(new java.awt.Color(rgb));
            out.setLineWidth(width);
            out.setLineDashPattern(dash, 0);
        });
    }

    /** Sets the fill colour, {@code 0xRRGGBB}. */
    public void fill(int rgb) {
        run(() -> out.setNonStrokingColor(new java.awt.Color(rgb)));
    }

    /** Strokes a straight line between two page points. */
    public void line(double x0, double y0, double x1, double y1) {
        run(() -> {
            out.moveTo((float) x0, (float) y0);
            out.lineTo((float) x1, (float) y1);
            out.stroke();
        });
    }

    /** Strokes an open polyline through {@code xs[i], ys[i]} (page points). */
    public void polyline(double[] xs, double[] ys, boolean closed) {
        if (xs.length < 2) {
            return;
        }
        run(() -> {
            out.moveTo((float) xs[0], (float) ys[0]);
            for (int i = 1; i < xs.length; i++) {
                out.lineTo((float) xs[i], (float) ys[i]);
            }
            if (closed) {
                out.closePath();
            }
            out.stroke();
        });
    }

    /** Fills a closed polygon through {@code xs[i], ys[i]} (page points) with the fill colour. */
    public void fillPolygon(double[] xs, double[] ys) {
        run(() -> {
            out.moveTo((float) xs[0], (float) ys[0]);
            for (int i = 1; i < xs.length; i++) {
                out.lineTo((float) xs[i], (float) ys[i]);
            }
            out.closePath();
            out.fill();
        });
    }

    /** Strokes the outline of {@code r}. */
    public void strokeRect(PageRect r) {
        run(() -> {
            out.addRect(r.x(), r.y(), r.width(), r.height());
            out.stroke();
        });
    }

    /** Fills {@code r} with the fill colour. */
    public void fillRect(PageRect r) {
        run(() -> {
            out.addRect(r.x(), r.y(), r.width(), r.height());
            out.fill();
        });
    }

    /** Strokes a circle of radius {@code r} points (four Bezier arcs). */
    public void circle(double cx, double cy, double r, boolean filled) {
        final double k = 0.5523 * r; // Bezier handle length for a quarter circle
        run(() -> {
            out.moveTo((float) (cx + r), (float) cy);
            out.curveTo((float) (cx + r), (float) (cy + k), (float) (cx + k), (float) (cy + r), (float) cx,
                    (float) (cy + r));
            out.curveTo((float) (cx - k), (float) (cy + r), (float) (cx - r), (float) (cy + k), (float) (cx - r),
                    (float) cy);
            out.curveTo((float) (cx - r), (float) (cy - k), (float) (cx - k), (float) (cy - r), (float) cx,
                    (float) (cy - r));
            out.curveTo((float) (cx + k), (float) (cy - r), (float) (cx + r), (float) (cy - k), (float) (cx + r),
                    (float) cy);
            out.closePath();
            if (filled) {
                out.fill();
            } else {
                out.stroke();
            }
        });
    }

    /** Width of {@code text} in points at {@code size} points. */
    public static float textWidth(String text, float size, boolean bold) {
        try {
            return (bold ? BOLD : REGULAR).getStringWidth(text) / 1000f * size;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Draws one line of text in the fill colour.
     *
     * @param align 0 left, 0.5 centred, 1 right of {@code x}
     * @param angle rotation, degrees anticlockwise about (x, y)
     */
    public void text(String text, double x, double y, float size, boolean bold, double align, double angle) {
        String safe = printable(text);
        float w = textWidth(safe, size, bold);
        run(() -> {
            out.beginText();
            out.setFont(bold ? this.bold : regular, size);
            double a = Math.toRadians(angle);
            double ox = x - align * w * Math.cos(a);
            double oy = y - align * w * Math.sin(a);
            out.setTextMatrix(Matrix.getRotateInstance(a, (float) ox, (float) oy));
            out.showText(safe);
            out.endText();
        });
    }

    /**
     * Draws text on a white backing box, for labels over a raster; then restores the fill colour to
     * {@code rgb}. Arguments as {@link #text(String, double, double, float, boolean, double, double)}.
     */
    public void haloText(String text, double x, double y, float size, boolean bold, double align, double angle,
                         int rgb) {
        float w = textWidth(printable(text), size, bold);
        double a = Math.toRadians(angle), cos = Math.cos(a), sin = Math.sin(a);
        double pad = size * 0.18;
        double u0 = -align * w - pad, u1 = (1 - align) * w + pad, v0 = -size * 0.25, v1 = size * 0.85;
        double[] us = {u0, u1, u1, u0}, vs = {v0, v0, v1, v1};
        double[] xs = new double[4], ys = new double[4];
        for (int i = 0; i < 4; i++) {
            xs[i] = x + us[i] * cos - vs[i] * sin;
            ys[i] = y + us[i] * sin + vs[i] * cos;
        }
        fill(0xFFFFFF);
        fillPolygon(xs, ys);
        fill(rgb);
        text(text, x, y, size, bold, align, angle);
    }

    /** Left-aligned, unrotated text. */
    public void text(String text, double x, double y, float size, boolean bold) {
        text(text, x, y, size, bold, 0, 0);
    }

    /** Draws {@code image} stretched over {@code r} (lossless, with its alpha channel as a soft mask). */
    public void image(BufferedImage image, PageRect r) {
        run(() -> {
            PDImageXObject x = LosslessFactory.createFromImage(document, image);
            out.drawImage(x, r.x(), r.y(), r.width(), r.height());
        });
    }

    @Override
    public void close() {
        run(out::close);
    }

    /** Replaces characters the standard fonts' WinAnsi encoding lacks, so text never aborts a sheet. */
    static String printable(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (char ch : s.toCharArray()) {
            boolean ok = (ch >= 0x20 && ch < 0x7f) || (ch >= 0xa0 && ch <= 0xff) || ch == '\u2013'
                    || ch == '\u2014' || ch == '\u2022';
            b.append(ok ? ch : '?');
        }
        return b.toString();
    }

    private interface IoAction {
        void run() throws IOException;
    }

    private static void run(IoAction a) {
        try {
            a.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
