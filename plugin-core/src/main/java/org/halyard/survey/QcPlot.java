package org.halyard.survey;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Locale;
import javax.imageio.ImageIO;

/**
 * A minimal Java2D chart: a frame with labelled axes over a data box, into which the report draws
 * polylines, points and bars in data coordinates. Writes PNG.
 *
 * <p><b>Thread safety:</b> none; one plot per thread.
 */
final class QcPlot {

    private static final int MARGIN_L = 80, MARGIN_R = 20, MARGIN_T = 36, MARGIN_B = 56;

    private final BufferedImage image;
    private final Graphics2D g;
    private final double x0, x1, y0, y1;
    private final int w, h;

    /**
     * A plot of {@code width x height} pixels over data bounds; with {@code equalAspect} the bounds grow so
     * that one unit is as long on both axes (maps).
     */
    QcPlot(int width, int height, String title, String xLabel, String yLabel, double xmin, double xmax,
           double ymin, double ymax, boolean equalAspect) {
        this.w = width;
        this.h = height;
        if (!(xmax > xmin)) {
            xmax = xmin + 1;
        }
        if (!(ymax > ymin)) {
            ymax = ymin + 1;
        }
        if (equalAspect) {
            double sx = (xmax - xmin) / (w - MARGIN_L - MARGIN_R), sy = (ymax - ymin) / (h - MARGIN_T - MARGIN_B);
            double s = Math.max(sx, sy);
            double cx = (xmin + xmax) / 2, cy = (ymin + ymax) / 2;
            xmin = cx - s * (w - MARGIN_L - MARGIN_R) / 2;
            xmax = cx + s * (w - MARGIN_L - MARGIN_R) / 2;
            ymin = cy - s * (h - MARGIN_T - MARGIN_B) / 2;
            ymax = cy + s * (h - MARGIN_T - MARGIN_B) / 2;
        }
        x0 = xmin;
        x1 = xmax;
        y0 = ymin;
        y1 = ymax;
        image = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, w, h);
        g.setColor(Color.BLACK);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
        g.drawString(title, MARGIN_L, 22);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        g.drawRect(MARGIN_L, MARGIN_T, w - MARGIN_L - MARGIN_R, h - MARGIN_T - MARGIN_B);
        for (int k = 0; k <= 4; k++) {
            double xv = x0 + (x1 - x0) * k / 4, yv = y0 + (y1 - y0) * k / 4;
            int px = (int) px(xv), py = (int) py(yv);
            g.drawLine(px, h - MARGIN_B, px, h - MARGIN_B + 4);
            g.drawString(label(xv), px - 25, h - MARGIN_B + 17);
            g.drawLine(MARGIN_L - 4, py, MARGIN_L, py);
            g.drawString(label(yv), 4, py + 4);
        }
        g.drawString(xLabel, w / 2 - 40, h - 12);
        g.rotate(-Math.PI / 2);
        g.drawString(yLabel, -h / 2 - 40, 14);
        g.rotate(Math.PI / 2);
        g.clipRect(MARGIN_L, MARGIN_T, w - MARGIN_L - MARGIN_R, h - MARGIN_T - MARGIN_B);
    }

    private static String label(double v) {
        double a = Math.abs(v);
        return a >= 1e5 ? String.format(Locale.ROOT, "%.0f", v) : a >= 10 ? String.format(Locale.ROOT, "%.1f", v)
                : String.format(Locale.ROOT, "%.3g", v);
    }

    double px(double x) {
        return MARGIN_L + (x - x0) / (x1 - x0) * (w - MARGIN_L - MARGIN_R);
    }

    double py(double y) {
        return h - MARGIN_B - (y - y0) / (y1 - y0) * (h - MARGIN_T - MARGIN_B);
    }

    /** Draws the polyline through rows [from, to) of x, y every {@code step} rows, skipping NaN. */
    void polyline(double[] x, double[] y, int from, int to, int step, Color c, float width) {
        Path2D.Double path = new Path2D.Double();
        boolean pen = false;
        for (int i = from; i < to; i += step) {
            if (Double.isNaN(x[i]) || Double.isNaN(y[i])) {
                pen = false;
                continue;
            }
            if (pen) {
                path.lineTo(px(x[i]), py(y[i]));
            } else {
                path.moveTo(px(x[i]), py(y[i]));
                pen = true;
            }
        }
        if (to - 1 > from && pen) {
            path.lineTo(px(x[to - 1]), py(y[to - 1]));
        }
        g.setColor(c);
        g.setStroke(new BasicStroke(width));
        g.draw(path);
    }

    /** A small filled circle at (x, y). */
    void point(double x, double y, Color c) {
        g.setColor(c);
        g.fillOval((int) px(x) - 2, (int) py(y) - 2, 5, 5);
    }

    /** A bar from 0 to {@code v} centred on {@code x} with the given data width. */
    void bar(double x, double width, double v, Color c) {
        if (Double.isNaN(v)) {
            return;
        }
        g.setColor(c);
        double a = px(x - width / 2), b = px(x + width / 2), top = py(Math.max(0, v)), bot = py(Math.min(0, v));
        g.fillRect((int) a, (int) top, Math.max(1, (int) (b - a)), Math.max(1, (int) (bot - top)));
    }

    /** A horizontal reference line at {@code y}, with a legend text. */
    void hline(double y, Color c, String text) {
        g.setColor(c);
        g.setStroke(new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, new float[] {6, 4}, 0));
        g.draw(new Line2D.Double(MARGIN_L, py(y), w - MARGIN_R, py(y)));
        g.drawString(text, MARGIN_L + 6, (int) py(y) - 4);
    }

    /** A legend entry in the top-left corner, {@code k}-th line. */
    void legend(int k, Color c, String text) {
        g.setColor(c);
        g.fillRect(MARGIN_L + 8, MARGIN_T + 8 + 16 * k, 10, 10);
        g.setColor(Color.BLACK);
        g.drawString(text, MARGIN_L + 24, MARGIN_T + 17 + 16 * k);
    }

    void write(Path file) {
        g.dispose();
        try {
            ImageIO.write(image, "png", file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot write PNG: " + e.getMessage(), e);
        }
    }
}
