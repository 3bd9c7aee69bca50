package org.halyard.ui.profile;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.Line2D;
import java.util.List;
import java.util.Map;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.io.FeatureLayer;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.VectorLayer;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class ProfileSamplerTest {

    @Test
    void planeIsLinearAlongTheLineAndNearbySamplesAreKept() {
        GridGeometry geo = new GridGeometry(100, 100, 0, 100, 1, "EPSG:32631");
        GridLayer plane = new GridLayer("total_field", Grid.sample(geo, (x, y) -> 2 * x + y), "nT", null);
        GeometryFactory gf = new GeometryFactory();
        FeatureLayer pts = new FeatureLayer("samples", "Point", "EPSG:32631",
                List.of(new FeatureLayer.Column("mag", FeatureLayer.ColumnType.REAL)), List.of(
                        new FeatureLayer.Feature(1, gf.createPoint(new Coordinate(30, 51)), Map.of("mag", 7.0)),
                        new FeatureLayer.Feature(2, gf.createPoint(new Coordinate(60, 58)), Map.of("mag", 9.0)),
                        new FeatureLayer.Feature(3, gf.createPoint(new Coordinate(95, 50)), Map.of("mag", 1.0))));
        Line2D line = new Line2D.Double(10, 50, 90, 50);
        ProfileSampler.Profile p = ProfileSampler.sample(line, List.of(plane), List.of(new VectorLayer("samples", pts, null)), 81, 2);
        assertThat(p.length()).isEqualTo(80.0);
        ProfileSampler.Series s = p.grids().get(0);
        for (int i = 0; i < 81; i++) {
            // bilinear interpolation is exact on a plane: 2 x + y at x = 10 + d, y = 50
            assertThat(s.values()[i]).isCloseTo(2 * (10 + s.distance()[i]) + 50, within(1e-3));
        }
        ProfileSampler.Series t = p.tracks().get(0);
        // only sample 1 is within 2 m of the line and beside it; its foot is 20 m from A
        assertThat(t.distance()).containsExactly(20.0);
        assertThat(t.values()).containsExactly(7.0);
    }
}
