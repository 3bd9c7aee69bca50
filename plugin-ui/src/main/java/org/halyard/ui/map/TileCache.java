package org.halyard.ui.map;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.render.GridRenderer;
import org.halyard.render.RasterStyle;

/**
 * Renders a grid as square tiles of {@value #TILE} pixels on background threads and keeps the recent ones.
 *
 * <p><b>Algorithm:</b> the level is the power-of-two cell stride nearest below the screen resolution (one
 * sample per pixel or finer); tile (i, j) at stride s covers cells {@code [i T s, (i+1) T s)} by
 * {@code [j T s, (j+1) T s)}. Missing tiles are queued on a small pool of daemon threads and the painter
 * draws a whole-grid overview (at most {@value #OVERVIEW} pixels a side) in their place until they
 * arrive, so the event thread never renders a tile. A style change bumps a generation number: results
 * of older generations are dropped.
 *
 * <p><b>Limitations:</b> at most {@value #CAPACITY} tiles are kept (least recently used go first).
 *
 * <p><b>Thread safety:</b> {@link #paint} on one thread at a time; workers only fill the concurrent maps.
 */
final class TileCache {

    static final int TILE = 256;
    static final int OVERVIEW = 1024;
    static final int CAPACITY = 400;

    private static final ExecutorService POOL = Executors.newFixedThreadPool(
            Math.max(1, Math.min(3, Runtime.getRuntime().availableProcessors())), r -> {
                Thread t = new Thread(r, "halyard-tiles");
                t.setDaemon(true);
                t.setPriority(Thread.NORM_PRIORITY - 1);
                return t;
            });

    private record Key(int generation, int step, int i, int j) { }

    private final Grid grid;
    private final AtomicInteger generation = new AtomicInteger();
    private final Map<Key, BufferedImage> ready = java.util.Collections.synchronizedMap(
            new LinkedHashMap<>(64, 0.75f, true) {
                @Override
                protected boolean removeEldestEntry(Map.Entry<Key, BufferedImage> e) {
                    return size() > CAPACITY;
                }
            });
    private final Set<Key> pending = ConcurrentHashMap.newKeySet();
    private volatile RasterStyle style;
    private volatile BufferedImage overview;
    private volatile int overviewGeneration = -1;

    TileCache(Grid grid, RasterStyle style) {
        this.grid = grid;
        this.style = style;
    }

    /** Drops every tile; the next paint renders with {@code s}. */
    void restyle(RasterStyle s) {
        style = s;
        generation.incrementAndGet();
        ready.clear();
    }

    /** Number of tiles queued or rendering (for tests and the busy indicator). */
    int pendingCount() {
        return pending.size();
    }

    /** The power-of-two cell stride for a screen resolution. */
    static int stepFor(double metresPerPixel, double cellSize) {
        int step = 1;
        while (step * 2 * cellSize <= metresPerPixel && step < (1 << 20)) {
            step *= 2;
        }
        return step;
    }

    void paint(Graphics2D g, MapViewport v, Runnable request) {
        GridGeometry geo = grid.geometry();
        int gen = generation.get();
        int step = stepFor(v.metresPerPixel(), geo.cellSize());
        double span = (double) TILE * step * geo.cellSize();
        var vis = v.visible();
        int i0 = (int) Math.max(0, Math.floor((vis.getMinX() - geo.west()) / span));
        int i1 = (int) Math.min(Math.ceil(geo.columns() / (double) (TILE * step)) - 1, Math.floor((vis.getMaxX() - geo.west()) / span));
        int j0 = (int) Math.max(0, Math.floor((geo.north() - vis.getMaxY()) / span));
        int j1 = (int) Math.min(Math.ceil(geo.rows() / (double) (TILE * step)) - 1, Math.floor((geo.north() - vis.getMinY()) / span));
        g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, step == 1 && v.metresPerPixel() < geo.cellSize()
                ? RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR : RenderingHints.VALUE_INTERPOLATION_BILINEAR);
        boolean overviewDrawn = false;
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                Key k = new Key(gen, step, i, j);
                BufferedImage img = request == null ? ready.computeIfAbsent(k, this::render) : ready.get(k);
                if (img == null) {
                    if (!overviewDrawn) {
                        drawOverview(g, v, request);
                        overviewDrawn = true;
                    }
                    queue(k, request);
                    continue;
                }
                double x0 = geo.west() + i * span, y0 = geo.north() - j * span;
                drawCells(g, v, img, x0, y0, img.getWidth() * step * geo.cellSize(), img.getHeight() * step * geo.cellSize());
            }
        }
    }

    private void drawOverview(Graphics2D g, MapViewport v, Runnable request) {
        int gen = generation.get();
        BufferedImage o = overview;
        if (o == null || overviewGeneration != gen) {
            Key k = new Key(gen, -1, 0, 0);
            if (pending.add(k)) {
                POOL.submit(() -> {
                    try {
                        int s = Math.max(1, (int) Math.ceil(Math.max(grid.columns(), grid.rows()) / (double) OVERVIEW));
                        BufferedImage img = GridRenderer.render(grid, style, new GridRenderer.Window(0, 0, grid.columns(), grid.rows(), s));
                        if (generation.get() == gen) {
                            overview = img;
                            overviewGeneration = gen;
                        }
                    } finally {
                        pending.remove(k);
                        request.run();
                    }
                });
            }
            if (o == null) {
                return;
            }
        }
        GridGeometry geo = grid.geometry();
        drawCells(g, v, o, geo.west(), geo.north(), geo.east() - geo.west(), geo.north() - geo.south());
    }

    private static void drawCells(Graphics2D g, MapViewport v, BufferedImage img, double west, double north,
                                  double widthM, double heightM) {
        int sx0 = (int) Math.round(v.screenX(west)), sy0 = (int) Math.round(v.screenY(north));
        int sx1 = (int) Math.round(v.screenX(west + widthM)), sy1 = (int) Math.round(v.screenY(north - heightM));
        g.drawImage(img, sx0, sy0, sx1, sy1, 0, 0, img.getWidth(), img.getHeight(), null);
    }

    private void queue(Key k, Runnable request) {
        if (!pending.add(k)) {
            return;
        }
        POOL.submit(() -> {
            try {
                if (generation.get() == k.generation()) {
                    BufferedImage img = render(k);
                    if (generation.get() == k.generation()) {
                        ready.put(k, img);
                    }
                }
            } finally {
                pending.remove(k);
                request.run();
            }
        });
    }

    private BufferedImage render(Key k) {
        int span = TILE * k.step();
        int col0 = k.i() * span, row0 = k.j() * span;
        int cols = Math.min(span, grid.columns() - col0), rows = Math.min(span, grid.rows() - row0);
        return GridRenderer.render(grid, style, new GridRenderer.Window(col0, row0, cols, rows, k.step()));
    }
}
