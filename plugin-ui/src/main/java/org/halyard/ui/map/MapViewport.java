package org.halyard.ui.map;

import java.awt.geom.AffineTransform;
import java.awt.geom.Point2D;
import org.locationtech.jts.geom.Envelope;

/**
 * The window of the map on screen: its centre in map coordinates, its resolution and its size in pixels.
 *
 * <p>Conventions: map x easting, y northing in metres; screen x right, y down, pixels from the top-left
 * corner. {@code screenX = width/2 + (x - centreX) / metresPerPixel},
 * {@code screenY = height/2 - (y - centreY) / metresPerPixel}.
 *
 * <p><b>Thread safety:</b> mutable; use on one thread (the event thread) and hand {@link #copy()}s to others.
 */
public final class MapViewport {

    /** Nominal screen resolution for the scale readout, 96 dpi (the CSS reference pixel, W3C CSS Values 3). */
    public static final double NOMINAL_DPI = 96;

    private static final double MIN_RESOLUTION = 1e-4;
    private static final double MAX_RESOLUTION = 1e6;

    private double centreX;
    private double centreY;
    private double metresPerPixel = 1;
    private int width = 1;
    private int height = 1;

    /** A viewport of {@code width x height} pixels centred on (x, y) at {@code metresPerPixel}. */
    public MapViewport(double x, double y, double metresPerPixel, int width, int height) {
        this.centreX = x;
        this.centreY = y;
        setResolution(metresPerPixel);
        setSize(width, height);
    }

    /** An independent copy. */
    public MapViewport copy() {
        return new MapViewport(centreX, centreY, metresPerPixel, width, height);
    }

    public double centreX() {
        return centreX;
    }

    public double centreY() {
        return centreY;
    }

    /** Ground size of one screen pixel, metres. */
    public double metresPerPixel() {
        return metresPerPixel;
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** Resizes the screen window, keeping the centre and the resolution. */
    public void setSize(int w, int h) {
        width = Math.max(1, w);
        height = Math.max(1, h);
    }

    private void setResolution(double mpp) {
        if (!(mpp > 0) || Double.isInfinite(mpp)) {
            throw new IllegalArgumentException("map resolution must be a positive number of metres per pixel, got " + mpp);
        }
        metresPerPixel = Math.max(MIN_RESOLUTION, Math.min(MAX_RESOLUTION, mpp));
    }

    /** Screen x (pixels from the left) of map easting {@code x} (metres). */
    public double screenX(double x) {
        return width / 2.0 + (x - centreX) / metresPerPixel;
    }

    /** Screen y (pixels from the top) of map northing {@code y} (metres). */
    public double screenY(double y) {
        return height / 2.0 - (y - centreY) / metresPerPixel;
    }

    /** Map easting (metres) under screen x. */
    public double mapX(double sx) {
        return centreX + (sx - width / 2.0) * metresPerPixel;
    }

    /** Map northing (metres) under screen y. */
    public double mapY(double sy) {
        return centreY - (sy - height / 2.0) * metresPerPixel;
    }

    /** The map point under a screen point. */
    public Point2D.Double toMap(double sx, double sy) {
        return new Point2D.Double(mapX(sx), mapY(sy));
    }

    /** Moves the map with the mouse: a drag of (dx, dy) pixels moves the content by that much. */
    public void pan(double dxPixels, double dyPixels) {
        centreX -= dxPixels * metresPerPixel;
        centreY += dyPixels * metresPerPixel;
    }

    /**
     * Zooms by {@code factor} (&lt; 1 zooms in) keeping the map point under screen (sx, sy) where it is,
     * as a mouse wheel should.
     */
    public void zoomAbout(double sx, double sy, double factor) {
        double x = mapX(sx), y = mapY(sy);
        setResolution(metresPerPixel * factor);
        centreX = x - (sx - width / 2.0) * metresPerPixel;
        centreY = y + (sy - height / 2.0) * metresPerPixel;
    }

    /** Shows all of {@code box} (map metres), as large as fits, centred. */
    public void show(Envelope box) {
        if (box == null || box.isNull()) {
            return;
        }
        centreX = (box.getMinX() + box.getMaxX()) / 2;
        centreY = (box.getMinY() + box.getMaxY()) / 2;
        double mpp = Math.max(box.getWidth() / width, box.getHeight() / height);
        setResolution(mpp > 0 ? mpp : metresPerPixel);
    }

    /** Shows the screen rectangle between two corners (a box zoom). */
    public void showScreenBox(double sx0, double sy0, double sx1, double sy1) {
        show(new Envelope(mapX(sx0), mapX(sx1), mapY(sy0), mapY(sy1)));
    }

    /** The map area on screen, metres. */
    public Envelope visible() {
        return new Envelope(mapX(0), mapX(width), mapY(height), mapY(0));
    }

    /** The map-to-screen transform for Java2D. */
    public AffineTransform mapToScreen() {
        AffineTransform t = new AffineTransform();
        t.translate(width / 2.0, height / 2.0);
        t.scale(1 / metresPerPixel, -1 / metresPerPixel);
        t.translate(-centreX, -centreY);
        return t;
    }

    /** Scale denominator at {@link #NOMINAL_DPI}: ground metres per metre of screen. */
    public double scaleDenominator() {
        return metresPerPixel / (0.0254 / NOMINAL_DPI);
    }
}
