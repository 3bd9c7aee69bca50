package org.halyard.ui.map;

import java.awt.Graphics2D;
import java.nio.file.Path;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.render.ColourRamp;
import org.halyard.render.LinearStretch;
import org.halyard.render.RasterStyle;
import org.halyard.render.Shading;
import org.locationtech.jts.geom.Envelope;

/**
 * A grid on the map, drawn in tiles rendered off the event thread ({@link TileCache}).
 *
 * <p>The unit is guessed from the layer name when not given (nT/m for derivatives, degrees for tilt, m for
 * bathymetry, else nT) and shown in the readouts.
 */
public final class GridLayer extends Layer {

    private final Grid grid;
    private final String unit;
    private final Path source;
    private RasterStyle style;
    private final TileCache tiles;

    /** A grid layer with a default style: diverging ramp for signed fields, sequential otherwise. */
    public GridLayer(String name, Grid grid, String unit, Path source) {
        super(name);
        this.grid = grid;
        this.unit = unit == null ? UnitGuess.of(name) : unit;
        this.source = source;
        this.style = defaultStyle(grid);
        this.tiles = new TileCache(grid, style);
    }

    /** Signed fields (a good share of cells on both sides of zero) get WAKE with a symmetric stretch. */
    static RasterStyle defaultStyle(Grid grid) {
        double[] r = grid.range();
        boolean signed = r[0] < 0 && r[1] > 0 && Math.min(-r[0], r[1]) > 0.1 * Math.max(-r[0], r[1]);
        return signed
                ? new RasterStyle(ColourRamp.WAKE, LinearStretch.symmetric(grid, 98), Shading.NONE)
                : new RasterStyle(ColourRamp.SHOAL, LinearStretch.percentiles(grid, 2, 98), Shading.NONE);
    }

    public Grid grid() {
        return grid;
    }

    /** Unit of the values: nT, nT/m, degrees, m. */
    public String unit() {
        return unit;
    }

    /** The file it came from, or {@code null} for a computed grid. */
    public Path source() {
        return source;
    }

    public RasterStyle style() {
        return style;
    }

    /** Changes the style; tiles are re-rendered in the background. */
    public void setStyle(RasterStyle s) {
        style = s;
        tiles.restyle(s);
    }

    /** The value of the cell containing map point (x, y) (not interpolated), {@code NaN} outside or blank. */
    public double cellValue(double x, double y) {
        GridGeometry g = grid.geometry();
        int c = (int) Math.floor((x - g.west()) / g.cellSize());
        int r = (int) Math.floor((g.north() - y) / g.cellSize());
        return c < 0 || r < 0 || c >= g.columns() || r >= g.rows() ? Double.NaN : grid.get(c, r);
    }

    /** Tiles still being rendered. */
    public int pendingTiles() {
        return tiles.pendingCount();
    }

    @Override
    public Envelope bounds() {
        GridGeometry g = grid.geometry();
        return new Envelope(g.west(), g.east(), g.south(), g.north());
    }

    @Override
    public String summary() {
        GridGeometry g = grid.geometry();
        return String.format(java.util.Locale.ROOT, "grid %d x %d, %.3g m cells, %s", g.columns(), g.rows(),
                g.cellSize(), unit);
    }

    @Override
    public void paint(Graphics2D g, MapViewport view, Runnable request) {
        tiles.paint(g, view, request);
    }
}
