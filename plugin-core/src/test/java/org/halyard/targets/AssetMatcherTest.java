package org.halyard.targets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

class AssetMatcherTest {

    static final GeometryFactory GF = new GeometryFactory();

    static LineString line(double x0, double y0, double x1, double y1) {
        return GF.createLineString(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y1)});
    }

    final AssetMatcher matcher = new AssetMatcher(List.of(
            new Asset("CBL-A", line(0, 0, 100, 0)),
            new Asset("WRECK-B", GF.createPoint(new Coordinate(50, 40)))), 5, 0.5);

    @Test
    void lineWithinTheBufferMatches() {
        assertThat(matcher.match(line(10, 3, 60, 4))).contains("CBL-A");
    }

    @Test
    void lineOutsideTheBufferOrCrossingIsUncharted() {
        assertThat(matcher.match(line(10, 12, 60, 12))).isEmpty();
        // Crossing at right angles: only 10 m of 60 m lies in the buffer (share 1/6 < 1/2).
        assertThat(matcher.match(line(30, -30, 30, 30))).isEmpty();
    }

    @Test
    void pointsMatchTheNearestAssetWithinTheBuffer() {
        assertThat(matcher.match(52, 37)).contains("WRECK-B");
        assertThat(matcher.match(20, 2)).contains("CBL-A");
        assertThat(matcher.match(20, 20)).isEmpty();
    }

    @Test
    void refusesAnAssetWithoutId() {
        assertThatThrownBy(() -> new Asset(" ", line(0, 0, 1, 1))).isInstanceOf(IllegalArgumentException.class);
    }
}
