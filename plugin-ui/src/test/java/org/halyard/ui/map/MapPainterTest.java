package org.halyard.ui.map;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.io.FeatureLayer;
import org.halyard.render.ColourRamp;
import org.halyard.render.LinearStretch;
import org.halyard.render.RasterStyle;
import org.halyard.render.Shading;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class MapPainterTest {

    private static final GridGeometry GEO = new GridGeometry(100, 80, 1000, 2000, 1, "EPSG:32631");

    private static GridLayer ramp() {
        Grid g = Grid.sample(GEO, (x, y) -> x - 1000); // 0.5 .. 99.5 west to east
        GridLayer l = new GridLayer("total_field", g, "nT", null);
        l.setStyle(new RasterStyle(ColourRamp.SHOAL, new LinearStretch(0, 100, "fixed"), Shading.NONE));
        return l;
    }

    @Test
    void gridCellIsDrawnInItsRampColourAtItsPlace() {
        GridLayer l = ramp();
        MapViewport v = new MapViewport(1050, 1960, 0.25, 400, 320); // whole grid, 4 px a cell
        BufferedImage img = MapPainter.image(v, List.of(l));
        // cell (30, 10) has centre x = 1030.5, value 30.5: position 0.305 of the stretch
        int sx = (int) v.screenX(1030.5), sy = (int) v.screenY(2000 - 10.5);
        assertThat(img.getRGB(sx, sy)).isEqualTo(ColourRamp.SHOAL.argb(0.305));
        // outside the grid: the map paper
        MapViewport wide = new MapViewport(1050, 1960, 1, 400, 320);
        assertThat(MapPainter.image(wide, List.of(l)).getRGB(2, 200)).isEqualTo(MapPainter.PAPER.getRGB());
    }

    @Test
    void opacityBlendsWithThePaper() {
        GridLayer l = ramp();
        l.setOpacity(0.5f);
        MapViewport v = new MapViewport(1050, 1960, 0.25, 400, 320);
        int sx = (int) v.screenX(1030.5), sy = (int) v.screenY(2000 - 10.5);
        Color c = new Color(MapPainter.image(v, List.of(l)).getRGB(sx, sy));
        Color ramp = new Color(ColourRamp.SHOAL.argb(0.305));
        // Porter and Duff 1984 "over": 0.5 src + 0.5 dst, within 1 grey level of rounding
        assertThat(c.getRed()).isBetween((ramp.getRed() + MapPainter.PAPER.getRed()) / 2 - 1,
                (ramp.getRed() + MapPainter.PAPER.getRed()) / 2 + 1);
        assertThat(c.getBlue()).isBetween((ramp.getBlue() + MapPainter.PAPER.getBlue()) / 2 - 1,
                (ramp.getBlue() + MapPainter.PAPER.getBlue()) / 2 + 1);
    }

    @Test
    void hiddenLayersAreNotDrawnAndTopLayerCovers() {
        GridLayer l = ramp();
        GeometryFactory gf = new GeometryFactory();
        FeatureLayer data = new FeatureLayer("quay", "Polygon", "EPSG:32631", List.of(), List.of(
                new FeatureLayer.Feature(1, gf.createPolygon(new Coordinate[] {new Coordinate(1010, 1930),
                    new Coordinate(1040, 1930), new Coordinate(1040, 1960), new Coordinate(1010, 1960),
                    new Coordinate(1010, 1930)}), Map.of())));
        VectorLayer quay = new VectorLayer("quay", data, null);
        quay.setStyle(new VectorStyle(Color.BLACK, Color.BLACK, 1, 4, false));
        MapViewport v = new MapViewport(1050, 1960, 0.25, 400, 320);
        int sx = (int) v.screenX(1025), sy = (int) v.screenY(1945);
        assertThat(MapPainter.image(v, List.of(quay, l)).getRGB(sx, sy)).isEqualTo(Color.BLACK.getRGB());
        quay.setVisible(false);
        assertThat(MapPainter.image(v, List.of(quay, l)).getRGB(sx, sy)).isEqualTo(ColourRamp.SHOAL.argb(0.255));
    }

    @Test
    void largeGridTilesAreRenderedOffTheCallingThread() throws Exception {
        // 4096 x 4096: painting with a repaint callback must only queue tiles, then the callback brings them
        GridGeometry big = new GridGeometry(4096, 4096, 0, 4096, 1, "EPSG:32631");
        GridLayer l = new GridLayer("big", Grid.sample(big, (x, y) -> x + y), "nT", null);
        MapViewport v = new MapViewport(2048, 2048, 4, 1024, 1024);
        BufferedImage img = new BufferedImage(1024, 1024, BufferedImage.TYPE_INT_RGB);
        CountDownLatch arrived = new CountDownLatch(1);
        var g = img.createGraphics();
        l.paint(g, v, arrived::countDown);
        assertThat(l.pendingTiles()).as("tiles queued, not drawn on this thread").isPositive();
        assertThat(arrived.await(60, TimeUnit.SECONDS)).isTrue();
        while (l.pendingTiles() > 0) {
            Thread.sleep(20);
        }
        l.paint(g, v, () -> { });
        g.dispose();
        assertThat(l.pendingTiles()).isZero();
        assertThat(img.getRGB(512, 512)).isEqualTo(l.style().ramp().argb(l.style().stretch().position(l.cellValue(2048, 2048))));
    }

    @Test
    void strideIsAPowerOfTwoAtOrBelowTheScreenResolution() {
        assertThat(TileCache.stepFor(0.3, 1)).isEqualTo(1);
        assertThat(TileCache.stepFor(4, 1)).isEqualTo(4);
        assertThat(TileCache.stepFor(7.9, 1)).isEqualTo(4);
        assertThat(TileCache.stepFor(8, 0.5)).isEqualTo(16);
    }
}
