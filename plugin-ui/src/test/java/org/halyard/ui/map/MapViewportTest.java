package org.halyard.ui.map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.Point2D;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;

class MapViewportTest {

    private final MapViewport v = new MapViewport(500_000, 6_000_000, 0.25, 800, 600);

    @Test
    void screenAndMapRoundTrip() {
        // the two mappings are inverse by construction (class javadoc formulas); check to 1e-9 m
        for (double sx : new double[] {0, 13.5, 400, 799}) {
            for (double sy : new double[] {0, 300, 599.25}) {
                assertThat(v.screenX(v.mapX(sx))).isCloseTo(sx, within(1e-9));
                assertThat(v.screenY(v.mapY(sy))).isCloseTo(sy, within(1e-9));
            }
        }
        assertThat(v.mapX(400)).isEqualTo(500_000.0); // centre of the screen is the centre of the view
        assertThat(v.mapY(0)).isCloseTo(6_000_075.0, within(1e-9)); // top edge: north, 300 px * 0.25 m
        Point2D p = new Point2D.Double();
        v.mapToScreen().transform(new Point2D.Double(500_010, 6_000_010), p);
        assertThat(p.getX()).isCloseTo(v.screenX(500_010), within(1e-9));
        assertThat(p.getY()).isCloseTo(v.screenY(6_000_010), within(1e-9));
    }

    @Test
    void panMovesTheContentWithTheMouseAndBack() {
        double x = v.mapX(100), y = v.mapY(100);
        v.pan(30, -20);
        // the point that was under (100, 100) is now under (130, 80)
        assertThat(v.mapX(130)).isCloseTo(x, within(1e-9));
        assertThat(v.mapY(80)).isCloseTo(y, within(1e-9));
        v.pan(-30, 20);
        assertThat(v.centreX()).isCloseTo(500_000, within(1e-9));
        assertThat(v.centreY()).isCloseTo(6_000_000, within(1e-9));
    }

    @Test
    void wheelZoomKeepsThePointUnderTheCursorAndUndoes() {
        double x = v.mapX(620), y = v.mapY(111);
        v.zoomAbout(620, 111, 0.8);
        assertThat(v.metresPerPixel()).isCloseTo(0.2, within(1e-12));
        assertThat(v.mapX(620)).isCloseTo(x, within(1e-9));
        assertThat(v.mapY(111)).isCloseTo(y, within(1e-9));
        v.zoomAbout(620, 111, 1 / 0.8);
        assertThat(v.metresPerPixel()).isCloseTo(0.25, within(1e-12));
        assertThat(v.centreX()).isCloseTo(500_000, within(1e-6));
        assertThat(v.centreY()).isCloseTo(6_000_000, within(1e-6));
    }

    @Test
    void boxZoomShowsTheWholeBox() {
        double x0 = v.mapX(100), y0 = v.mapY(50), x1 = v.mapX(300), y1 = v.mapY(100);
        v.showScreenBox(100, 50, 300, 100);
        Envelope vis = v.visible();
        assertThat(vis.contains(new Envelope(x0, x1, y0, y1))).isTrue();
        // 200 px of box across 800 px of screen: four times finer
        assertThat(v.metresPerPixel()).isCloseTo(0.25 * 200 / 800, within(1e-12));
    }

    @Test
    void scaleAtNinetySixDpi() {
        // CSS Values 3 (W3C): 1 px = 1/96 in = 0.0254/96 m; 0.0254/96 * 1000 m per pixel is 1:1000
        MapViewport s = new MapViewport(0, 0, 0.0254 / 96 * 1000, 10, 10);
        assertThat(s.scaleDenominator()).isCloseTo(1000, within(1e-9));
        assertThat(CursorReadout.scaleText(s)).startsWith("1 : 1 000");
    }
}
