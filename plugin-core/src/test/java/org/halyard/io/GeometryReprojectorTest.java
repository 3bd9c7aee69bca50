package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

class GeometryReprojectorTest {

    static final GeometryFactory GF = new GeometryFactory();

    @Test
    @Tag("external")
    void geographicToUtmAgreesWithGdal() {
        ExternalTools.require("gdaltransform");
        Geometry line = GF.createLineString(new Coordinate[] {new Coordinate(3.0, 51.5), new Coordinate(2.71, 51.62)});
        Geometry utm = new GeometryReprojector("EPSG:4326", "EPSG:32631").apply(line);
        String out = ExternalTools.run(List.of("sh", "-c",
                "printf '3.0 51.5\\n2.71 51.62\\n' | gdaltransform -s_srs OGC:CRS84 -t_srs EPSG:32631"), null).orFail();
        String[] rows = out.trim().split("\n");
        for (int i = 0; i < 2; i++) {
            String[] v = rows[i].trim().split("\\s+");
            // GDAL gdaltransform (PROJ) is the reference: agreement to a millimetre.
            assertThat(utm.getCoordinates()[i].x).isCloseTo(Double.parseDouble(v[0]), offset(1e-3));
            assertThat(utm.getCoordinates()[i].y).isCloseTo(Double.parseDouble(v[1]), offset(1e-3));
        }
    }

    @Test
    void centralMeridianMapsToTheFalseEasting() {
        // UTM definition (EPSG guidance note 7-2): the zone's central meridian (3 E for zone 31) has E = 500000 m.
        Geometry p = new GeometryReprojector("EPSG:4326", "EPSG:32631").apply(GF.createPoint(new Coordinate(3, 55)));
        assertThat(p.getCoordinate().x).isCloseTo(500000, offset(1e-6));
    }

    @Test
    void roundTripAndIdentity() {
        Geometry p = GF.createPoint(new Coordinate(512345.6, 5712345.6));
        Geometry back = new GeometryReprojector("EPSG:4326", "EPSG:32631")
                .apply(new GeometryReprojector("EPSG:32631", "EPSG:4326").apply(p));
        assertThat(back.getCoordinate().distance(p.getCoordinate())).isLessThan(1e-6);
        assertThat(new GeometryReprojector("EPSG:32631", "EPSG:32631").isIdentity()).isTrue();
    }

    @Test
    void unknownCodeIsRefusedWithTheCode() {
        assertThatThrownBy(() -> new GeometryReprojector("EPSG:999999", "EPSG:32631"))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("EPSG:999999");
    }
}
