package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class VectorReadersTest {

    @Test
    void geoJsonWithLegacyCrsMemberKeepsProjectedCoordinates(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("quay-edge.geojson");
        Files.writeString(f, """
                {"type":"FeatureCollection",
                 "crs":{"type":"name","properties":{"name":"urn:ogc:def:crs:EPSG::32631"}},
                 "features":[
                  {"type":"Feature","properties":{"name":"north mole","depth":4.5},
                   "geometry":{"type":"LineString","coordinates":[[500100,6000200],[500300,6000250]]}},
                  {"type":"Feature","properties":{"name":"buoy","depth":null},
                   "geometry":{"type":"Point","coordinates":[500150,6000100]}}]}""");
        FeatureLayer l = GeoJsonLayers.read(f);
        assertThat(l.name()).isEqualTo("quay_edge");
        assertThat(l.crsCode()).isEqualTo("EPSG:32631");
        assertThat(l.geometryType()).isEqualTo("Geometry");
        assertThat(l.column("depth").type()).isEqualTo(FeatureLayer.ColumnType.REAL);
        assertThat(l.features().get(0).attributes()).containsEntry("name", "north mole").containsEntry("depth", 4.5);
        assertThat(l.features().get(0).geometry().getLength()).isCloseTo(Math.hypot(200, 50), within(1e-9));
    }

    @Test
    void geoJsonWithoutCrsIsWgs84PerRfc7946() {
        // RFC 7946 section 4: GeoJSON coordinates are WGS 84 longitude, latitude when no other CRS is named.
        assertThat(GeoJsonLayers.crsOf(new com.fasterxml.jackson.databind.ObjectMapper().createObjectNode()))
                .isEqualTo(CrsTransforms.WGS84);
    }

    @Test
    void badGeoJsonNamesTheFeature(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("bad.geojson");
        Files.writeString(f, "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{},"
                + "\"geometry\":{\"type\":\"Point\",\"coordinates\":[\"a\"]}}]}");
        assertThatThrownBy(() -> GeoJsonLayers.read(f)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("bad.geojson").hasMessageContaining("feature 1");
    }

    @Test
    void csvPointsFindEastingNorthingAndTypeColumns(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("picks.csv");
        Files.writeString(f, "id,Easting,Northing,class,amplitude\nT1,500010.5,6000020.25,discrete,12.5\n"
                + "T2,500030,6000040,linear,3\n");
        FeatureLayer l = CsvPointLayers.read(f, "EPSG:32631");
        assertThat(l.features()).hasSize(2);
        assertThat(l.geometryType()).isEqualTo("Point");
        assertThat(l.features().get(0).geometry().getCoordinate()).isEqualTo(new Coordinate(500010.5, 6000020.25));
        assertThat(l.column("amplitude").type()).isEqualTo(FeatureLayer.ColumnType.REAL);
        assertThat(l.column("class").type()).isEqualTo(FeatureLayer.ColumnType.TEXT);
        assertThat(l.features().get(1).attributes()).containsEntry("amplitude", 3.0).containsEntry("id", "T2");
    }

    @Test
    void csvWithoutCoordinatesSaysWhatItNeeds(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("notes.csv");
        Files.writeString(f, "a,b\n1,2\n");
        assertThatThrownBy(() -> CsvPointLayers.read(f, "EPSG:32631")).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("notes.csv").hasMessageContaining("easting,northing");
    }

    @Test
    void editsAreSavedBackAndAddMissingColumns(@TempDir Path dir) {
        Path gpkg = dir.resolve("halyard.gpkg");
        GeometryFactory gf = new GeometryFactory();
        FeatureLayer targets = new FeatureLayer("targets", "Point", "EPSG:32631",
                List.of(new FeatureLayer.Column("class", FeatureLayer.ColumnType.TEXT)),
                List.of(new FeatureLayer.Feature(1, gf.createPoint(new Coordinate(500000, 6000000)), Map.of("class", "discrete")),
                        new FeatureLayer.Feature(2, gf.createPoint(new Coordinate(500010, 6000000)), Map.of("class", "linear"))));
        GeoPackageWriter.write(gpkg, List.of(targets), Instant.parse("2026-05-14T00:00:00Z"));
        GeoPackageEdits.update(gpkg, "targets", 2, Map.of("analyst_class", "cable or pipe", "analyst_confidence", "high"));
        FeatureLayer back = GeoPackageReader.read(gpkg, "targets");
        assertThat(back.features().get(1).attributes()).containsEntry("class", "linear")
                .containsEntry("analyst_class", "cable or pipe").containsEntry("analyst_confidence", "high");
        assertThat(back.features().get(0).attributes().get("analyst_class")).isNull();
        assertThatThrownBy(() -> GeoPackageEdits.update(gpkg, "targets", 9, Map.of("analyst_note", "x")))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("no feature 9");
    }

    @Test
    void utmCentralMeridianOnTheEquatorIsThreeEastZeroNorth() {
        // UTM definition (Snyder 1987, USGS PP 1395, p. 57): zone 31 has central meridian 3 E, false easting
        // 500 000 m, false northing 0 in the north.
        double[] ll = CrsTransforms.toLonLat("EPSG:32631").apply(500_000, 0);
        assertThat(ll[0]).isCloseTo(3.0, within(1e-9));
        assertThat(ll[1]).isCloseTo(0.0, within(1e-9));
    }

    @Test
    @Tag("external")
    void utmToLonLatMatchesGdaltransform() {
        ExternalTools.require("gdaltransform");
        String out = ExternalTools.run(List.of("sh", "-c",
                "echo 512345.6 5987654.3 | gdaltransform -s_srs EPSG:32631 -t_srs EPSG:4326 -output_xy"), null).orFail();
        String[] p = out.trim().split("\\s+");
        double[] ll = CrsTransforms.toLonLat("EPSG:32631").apply(512345.6, 5987654.3);
        assertThat(ll[0]).isCloseTo(Double.parseDouble(p[0]), within(1e-8));
        assertThat(ll[1]).isCloseTo(Double.parseDouble(p[1]), within(1e-8));
        double[] back = CrsTransforms.between(CrsTransforms.WGS84, "EPSG:32631").apply(ll[0], ll[1]);
        assertThat(back[0]).isCloseTo(512345.6, within(1e-3));
    }
}
