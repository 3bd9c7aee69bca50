package org.halyard.sheet;

import java.awt.geom.Point2D;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import org.apache.pdfbox.contentstream.PDFGraphicsStreamEngine;
import org.apache.pdfbox.cos.COSDictionary;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.image.PDImage;
import org.apache.pdfbox.util.Matrix;
import org.apache.pdfbox.util.Vector;

/**
 * Test helper: replays a page's content stream and records, with the marked-content group they were
 * drawn in, every path vertex (page points, after the current transform), every glyph and every image.
 */
final class PdfRecorder extends PDFGraphicsStreamEngine {

    /** A path vertex (after the CTM) and the innermost marked-content group it was drawn in. */
    record Vertex(String group, int path, double x, double y) { }

    /** A glyph with its origin on the page and group. */
    record Glyph(String group, String text, double x, double y) { }

    /** An image placed on the page: lower-left corner and size in points. */
    record Placed(double x, double y, double width, double height, int pixelsWide, int pixelsHigh) { }

    final List<Vertex> vertices = new ArrayList<>();
    final List<Glyph> glyphs = new ArrayList<>();
    final List<Placed> images = new ArrayList<>();
    private final Deque<String> groups = new ArrayDeque<>();
    private int path;
    private Point2D current = new Point2D.Double();

    PdfRecorder(PDPage page) throws IOException {
        super(page);
        processPage(page);
    }

    private String group() {
        return groups.isEmpty() ? "" : groups.peek();
    }

    /** Vertices drawn in {@code group}. */
    List<Vertex> in(String group) {
        return vertices.stream().filter(v -> v.group().equals(group)).toList();
    }

    /** Glyphs drawn in {@code group}, joined into words split where the gap is wider than a space. */
    List<Glyph> words(String group) {
        List<Glyph> out = new ArrayList<>();
        Glyph cur = null;
        double lastX = 0, lastY = 0;
        for (Glyph g : glyphs) {
            if (!g.group().equals(group)) {
                continue;
            }
            boolean join = cur != null && Math.abs(g.y() - lastY) < 0.5 && g.x() - lastX < 6 && g.x() >= lastX - 0.1
                    && !g.text().isBlank();
            if (join) {
                cur = new Glyph(group, cur.text() + g.text(), cur.x(), cur.y());
            } else {
                if (cur != null) {
                    out.add(cur);
                }
                cur = g.text().isBlank() ? null : g;
            }
            lastX = g.x();
            lastY = g.y();
        }
        if (cur != null) {
            out.add(cur);
        }
        return out;
    }

    @Override
    public void beginMarkedContentSequence(COSName tag, COSDictionary properties) {
        groups.push(tag.getName());
    }

    @Override
    public void endMarkedContentSequence() {
        groups.pop();
    }

    @Override
    protected void showGlyph(Matrix m, PDFont font, int code, Vector displacement) throws IOException {
        String u = font.toUnicode(code);
        glyphs.add(new Glyph(group(), u == null ? "?" : u, m.getTranslateX(), m.getTranslateY()));
        super.showGlyph(m, font, code, displacement);
    }

    @Override
    public void appendRectangle(Point2D p0, Point2D p1, Point2D p2, Point2D p3) {
        path++;
        for (Point2D p : new Point2D[] {p0, p1, p2, p3}) {
            vertices.add(new Vertex(group(), path, p.getX(), p.getY()));
        }
    }

    @Override
    public void drawImage(PDImage pdImage) {
        Matrix m = getGraphicsState().getCurrentTransformationMatrix();
        images.add(new Placed(m.getTranslateX(), m.getTranslateY(), m.getScalingFactorX(), m.getScalingFactorY(),
                pdImage.getWidth(), pdImage.getHeight()));
    }

    @Override
    public void clip(int windingRule) {
    }

    @Override
    public void moveTo(float x, float y) {
        path++;
        vertices.add(new Vertex(group(), path, x, y));
        current = new Point2D.Float(x, y);
    }

    @Override
    public void lineTo(float x, float y) {
        vertices.add(new Vertex(group(), path, x, y));
        current = new Point2D.Float(x, y);
    }

    @Override
    public void curveTo(float x1, float y1, float x2, float y2, float x3, float y3) {
        vertices.add(new Vertex(group(), path, x3, y3));
        current = new Point2D.Float(x3, y3);
    }

    @Override
    public Point2D getCurrentPoint() {
        return current;
    }

    @Override
    public void closePath() {
    }

    @Override
    public void endPath() {
    }

    @Override
    public void strokePath() {
    }

    @Override
    public void fillPath(int windingRule) {
    }

    @Override
    public void fillAndStrokePath(int windingRule) {
    }

    @Override
    public void shadingFill(COSName shadingName) {
    }
}
