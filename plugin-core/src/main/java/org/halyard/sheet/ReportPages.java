package org.halyard.sheet;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDRectangle;

/**
 * Report pages: a table (the target list, the QC summary) paginated onto as many pages as it needs, with
 * the header row repeated, a heading band, "page n of m" and the cautions on every page.
 *
 * <p>Column widths follow the widest cell; when the table is wider than the page the font shrinks, down
 * to {@link #MIN_PT}. Numeric columns are right-aligned.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class ReportPages {

    static final float BODY_PT = 7.5f;
    static final float MIN_PT = 5f;
    static final float CELL_PAD = 4f;
    private static final float HEAD_BAND = 34f;

    private ReportPages() {
    }

    /**
     * Writes {@code table} to a PDF file.
     *
     * @return the number of pages written
     * @throws IllegalArgumentException when the columns do not fit the page even at {@link #MIN_PT}
     */
    public static int write(TableModel table, SheetTitle title, PageFormat format, Path file) {
        try (PDDocument doc = new PDDocument()) {
            doc.getDocumentInformation().setTitle(title.project() + " - " + table.title());
            doc.getDocumentInformation().setCreator("Halyard");
            int pages = addPages(doc, table, title, format);
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            doc.save(file.toFile());
            return pages;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file + ": " + e.getMessage(), e);
        }
    }

    /** Adds the table's pages to {@code doc}; returns how many. */
    static int addPages(PDDocument doc, TableModel t, SheetTitle title, PageFormat format) {
        PageRect border = format.page().inset(SheetLayout.MARGIN);
        float footH = TextWrap.height(Cautions.TEXT, border.width() - 2 * CELL_PAD, 6f, false) + 18;
        PageRect body = new PageRect(border.x() + CELL_PAD, border.y() + footH, border.width() - 2 * CELL_PAD,
                border.height() - footH - HEAD_BAND - 6);
        float pt = BODY_PT;
        float[] widths = widths(t, pt);
        float total = sum(widths);
        if (total > body.width()) {
            pt = BODY_PT * body.width() / total;
            if (pt < MIN_PT) {
                throw new IllegalArgumentException("table '" + t.title() + "' is too wide for " + format.label()
                        + ": use landscape or larger paper");
            }
            widths = widths(t, pt);
        }
        float stretch = body.width() / sum(widths);
        for (int i = 0; i < widths.length; i++) {
            widths[i] *= stretch;
        }
        float rowH = pt * 1.7f;
        List<List<List<String>>> pages = paginate(t, body.height(), rowH, pt);
        for (int p = 0; p < pages.size(); p++) {
            PDPage page = new PDPage(new PDRectangle(format.widthPt(), format.heightPt()));
            doc.addPage(page);
            try (SheetCanvas c = new SheetCanvas(doc, page)) {
                heading(c, border, title, t.title(), p + 1, pages.size());
                float y = TableDrawing.draw(c, t, pages.get(p), body, widths, rowH, pt);
                if (p == pages.size() - 1) {
                    c.fill(0x111111);
                    for (String note : t.notes()) {
                        y -= TextWrap.draw(c, note, new PageRect(body.x(), body.y(), body.width(),
                                y - 4 - body.y()), pt, false) + 3;
                    }
                }
                c.fill(0x7A1010);
                c.text("CAUTION", border.x() + CELL_PAD, border.y() + footH - 10, 6.5f, true);
                TextWrap.draw(c, Cautions.TEXT, new PageRect(border.x() + CELL_PAD, border.y(),
                        border.width() - 2 * CELL_PAD, footH - 13), 6f, false);
                MapSheetPage.drawBorder(c, border, title.project() + " | " + t.title() + " | revision "
                        + title.revision() + " | " + title.date());
            }
        }
        return pages.size();
    }

    private static void heading(SheetCanvas c, PageRect border, SheetTitle title, String what, int page, int of) {
        PageRect band = border.topStrip(HEAD_BAND).inset(3);
        c.fill(PanelFlow.BAND_RGB);
        c.fillRect(band);
        c.fill(0xFFFFFF);
        c.text(what.toUpperCase(java.util.Locale.ROOT), band.x() + 6, band.top() - 13, 10f, true);
        c.text(title.project() + (title.area().isEmpty() ? "" : " - " + title.area()), band.x() + 6,
                band.y() + 6, 7f, false);
        c.text("PAGE " + page + " OF " + of, band.right() - 6, band.top() - 13, 8f, true, 1, 0);
        c.text(title.date() + ", revision " + title.revision(), band.right() - 6, band.y() + 6, 7f, false, 1, 0);
    }

    /** Rows per page: the table's rows split so that each page, notes included on the last, fits. */
    static List<List<List<String>>> paginate(TableModel t, float height, float rowH, float pt) {
        int perPage = Math.max(1, (int) Math.floor(height / rowH) - 1);
        List<List<List<String>>> pages = new ArrayList<>();
        for (int i = 0; i < t.rows().size(); i += perPage) {
            pages.add(t.rows().subList(i, Math.min(t.rows().size(), i + perPage)));
        }
        if (pages.isEmpty()) {
            pages.add(List.of());
        }
        float notesH = 0;
        for (String n : t.notes()) {
            notesH += TextWrap.height(n, 400, pt, false) + 3;
        }
        List<List<String>> last = pages.get(pages.size() - 1);
        if ((last.size() + 1) * rowH + notesH + 6 > height) {
            pages.add(List.of());
        }
        return pages;
    }

    private static float[] widths(TableModel t, float pt) {
        float[] w = new float[t.columns().size()];
        for (int c = 0; c < w.length; c++) {
            w[c] = SheetCanvas.textWidth(t.columns().get(c), pt, true);
            for (List<String> r : t.rows()) {
                w[c] = Math.max(w[c], SheetCanvas.textWidth(SheetCanvas.printable(r.get(c)), pt, false));
            }
            w[c] += 2 * CELL_PAD;
        }
        return w;
    }

    private static float sum(float[] a) {
        float s = 0;
        for (float v : a) {
            s += v;
        }
        return s;
    }
}
