package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.halyard.targets.Asset;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

class InfrastructureLayerTest {

    @TempDir
    Path dir;

    static final GeometryFactory GF = new GeometryFactory();

    /** A chart in Web Mercator (EPSG:3857) with one cable near 3 E 51.5 N. */
    Path chart() {
        Geometry cable = new GeometryReprojector("EPSG:4326", "EPSG:3857").apply(GF.createLineString(new Coordinate[] {
            new Coordinate(2.99, 51.49), new Coordinate(3.01, 51.51)}));
        FeatureLayer layer = new FeatureLayer("assets", "LineString", "EPSG:3857",
                List.of(new FeatureLayer.Column("asset_id", FeatureLayer.ColumnType.TEXT)),
                List.of(new FeatureLayer.Feature(1, cable, Map.of("asset_id", "CBL-TERN-2"))));
        Path file = dir.resolve("assets.gpkg");
        GeoPackageWriter.write(file, List.of(layer), Instant.parse("2026-05-14T09:30:00Z"));
        return file;
    }

    @Test
    @Tag("external")
    void layerInAnotherCrsIsReprojectedLikeOgr2ogr() {
        ExternalTools.require("ogr2ogr");
        Path in = chart();
        InfrastructureLayer.Result r = InfrastructureLayer.read(in, "assets", "asset_id", "EPSG:32631");
        assertThat(r.reprojected()).isTrue();
        assertThat(r.sourceCrs()).isEqualTo("EPSG:3857");
        Asset a = r.assets().get(0);
        assertThat(a.id()).isEqualTo("CBL-TERN-2");
        Path ref = dir.resolve("ref.gpkg");
        ExternalTools.run(List.of("ogr2ogr", "-f", "GPKG", "-t_srs", "EPSG:32631", ref.toString(), in.toString()), dir)
                .orFail();
        Geometry gdal = GeoPackageReader.read(ref, "assets").features().get(0).geometry();
        for (int i = 0; i < 2; i++) {
            // GDAL ogr2ogr (PROJ) is the reference: agreement to a millimetre.
            assertThat(a.geometry().getCoordinates()[i].x).isCloseTo(gdal.getCoordinates()[i].x, offset(1e-3));
            assertThat(a.geometry().getCoordinates()[i].y).isCloseTo(gdal.getCoordinates()[i].y, offset(1e-3));
        }
    }

    @Test
    void sameCrsIsLeftAlone() {
        InfrastructureLayer.Result r = InfrastructureLayer.read(chart(), "assets", null, "EPSG:3857");
        assertThat(r.reprojected()).isFalse();
        assertThat(r.assets().get(0).id()).isEqualTo("1");
    }

    @Test
    void missingColumnIsNamed() {
        assertThatThrownBy(() -> InfrastructureLayer.read(chart(), "assets", "name", "EPSG:32631"))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("'name'");
    }
}
