package org.halyard.ui.map;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Point;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.event.MouseWheelEvent;
import java.awt.geom.Line2D;
import java.awt.geom.Point2D;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import javax.swing.JComponent;
import org.locationtech.jts.geom.Envelope;

/**
 * The map on screen: paints the layer stack through {@link MapPainter} and turns mouse gestures into
 * viewport changes (drag to pan, wheel to zoom about the cursor, box zoom), target picks and profile lines.
 */
public final class MapCanvas extends JComponent {

    /** Zoom factor of one wheel notch. */
    static final double WHEEL_FACTOR = 1.25;

    private static final Color BOX = new Color(0x0B, 0x6E, 0x8E);
    private static final Color PROFILE = new Color(0xE0, 0x6C, 0x00);

    private final LayerStack stack;
    private final MapViewport view = new MapViewport(0, 0, 1, 800, 600);
    private final List<Consumer<Point2D>> cursorListeners = new CopyOnWriteArrayList<>();
    private final List<Runnable> viewListeners = new CopyOnWriteArrayList<>();
    private Consumer<Point2D> pickListener = p -> { };
    private Consumer<Line2D> profileListener = l -> { };
    private MapTool tool = MapTool.PAN;
    private Point dragStart;
    private Point dragNow;
    private Line2D profileLine;
    private boolean fitted;

    public MapCanvas(LayerStack stack) {
        this.stack = stack;
        setOpaque(true);
        setFocusable(true);
        stack.addListener(this::repaint);
        Mouse m = new Mouse();
        addMouseListener(m);
        addMouseMotionListener(m);
        addMouseWheelListener(m);
    }

    public MapViewport viewport() {
        return view;
    }

    public void setTool(MapTool t) {
        tool = t;
        setCursor(java.awt.Cursor.getPredefinedCursor(t == MapTool.PAN ? java.awt.Cursor.MOVE_CURSOR
                : t == MapTool.SELECT ? java.awt.Cursor.HAND_CURSOR : java.awt.Cursor.CROSSHAIR_CURSOR));
    }

    public MapTool tool() {
        return tool;
    }

    /** Called with the map point under the mouse as it moves. */
    public void onCursor(Consumer<Point2D> l) {
        cursorListeners.add(l);
    }

    /** Called after the viewport changed (pan, zoom, resize). */
    public void onViewChange(Runnable r) {
        viewListeners.add(r);
    }

    /** Called with the map point of a click in the target-pick tool. */
    public void onPick(Consumer<Point2D> l) {
        pickListener = l;
    }

    /** Called with a finished profile line in map coordinates. */
    public void onProfile(Consumer<Line2D> l) {
        profileListener = l;
    }

    /** Shows {@code box} (map metres), with a 5 % margin. */
    public void zoomTo(Envelope box) {
        if (box == null || box.isNull()) {
            return;
        }
        Envelope e = new Envelope(box);
        e.expandBy(Math.max(e.getWidth(), e.getHeight()) * 0.05 + 1e-6);
        view.setSize(Math.max(1, getWidth()), Math.max(1, getHeight()));
        view.show(e);
        fitted = true;
        viewChanged();
    }

    /** Shows every layer. */
    public void zoomToAll() {
        zoomTo(stack.bounds());
    }

    private void viewChanged() {
        viewListeners.forEach(Runnable::run);
        repaint();
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        try {
            view.setSize(getWidth(), getHeight());
            if (!fitted && stack.size() > 0) {
                zoomToAll();
            }
            MapPainter.paint(g, view, stack.snapshot(), this::repaint);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            paintGesture(g);
            ScaleBar.paint(g, view);
        } finally {
            g.dispose();
        }
    }

    private void paintGesture(Graphics2D g) {
        if (profileLine != null) {
            g.setColor(PROFILE);
            g.setStroke(new BasicStroke(2.5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.drawLine((int) view.screenX(profileLine.getX1()), (int) view.screenY(profileLine.getY1()),
                    (int) view.screenX(profileLine.getX2()), (int) view.screenY(profileLine.getY2()));
            g.drawString("A", (int) view.screenX(profileLine.getX1()) - 12, (int) view.screenY(profileLine.getY1()) - 4);
            g.drawString("B", (int) view.screenX(profileLine.getX2()) + 5, (int) view.screenY(profileLine.getY2()) - 4);
        }
        if (dragStart == null || dragNow == null) {
            return;
        }
        if (tool == MapTool.BOX_ZOOM || boxByShift) {
            g.setColor(new Color(BOX.getRed(), BOX.getGreen(), BOX.getBlue(), 40));
            int x = Math.min(dragStart.x, dragNow.x), y = Math.min(dragStart.y, dragNow.y);
            int w = Math.abs(dragNow.x - dragStart.x), h = Math.abs(dragNow.y - dragStart.y);
            g.fillRect(x, y, w, h);
            g.setColor(BOX);
            g.setStroke(new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4f, new float[] {6f, 4f}, 0f));
            g.drawRect(x, y, w, h);
        }
    }

    /** The profile line drawn last, in map coordinates, or {@code null}. */
    public Line2D profileLine() {
        return profileLine;
    }

    private boolean boxByShift;

    private final class Mouse extends MouseAdapter {
        private Point last;

        @Override
        public void mousePressed(MouseEvent e) {
            requestFocusInWindow();
            dragStart = e.getPoint();
            last = e.getPoint();
            boxByShift = e.isShiftDown();
        }

        @Override
        public void mouseDragged(MouseEvent e) {
            dragNow = e.getPoint();
            if (tool == MapTool.PAN && !boxByShift) {
                view.pan(e.getX() - last.x, e.getY() - last.y);
                last = e.getPoint();
                viewChanged();
            } else if (tool == MapTool.PROFILE && !boxByShift) {
                profileLine = new Line2D.Double(view.toMap(dragStart.x, dragStart.y), view.toMap(e.getX(), e.getY()));
                repaint();
            } else {
                repaint();
            }
            cursor(e);
        }

        @Override
        public void mouseReleased(MouseEvent e) {
            if (dragStart != null && dragNow != null) {
                boolean farEnough = dragStart.distance(e.getPoint()) > 4;
                if ((tool == MapTool.BOX_ZOOM || boxByShift) && farEnough) {
                    view.showScreenBox(dragStart.x, dragStart.y, e.getX(), e.getY());
                    viewChanged();
                } else if (tool == MapTool.PROFILE && farEnough && profileLine != null) {
                    profileListener.accept(profileLine);
                }
            }
            dragStart = null;
            dragNow = null;
            boxByShift = false;
            repaint();
        }

        @Override
        public void mouseClicked(MouseEvent e) {
            if (tool == MapTool.SELECT) {
                pickListener.accept(view.toMap(e.getX(), e.getY()));
            }
        }

        @Override
        public void mouseMoved(MouseEvent e) {
            cursor(e);
        }

        @Override
        public void mouseWheelMoved(MouseWheelEvent e) {
            view.zoomAbout(e.getX(), e.getY(), Math.pow(WHEEL_FACTOR, e.getPreciseWheelRotation()));
            viewChanged();
            cursor(e);
        }

        private void cursor(MouseEvent e) {
            Point2D p = view.toMap(e.getX(), e.getY());
            cursorListeners.forEach(l -> l.accept(p));
        }
    }
}
