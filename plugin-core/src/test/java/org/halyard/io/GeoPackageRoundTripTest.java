package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class GeoPackageRoundTripTest {

    private static final GeometryFactory GF = new GeometryFactory();
    private static final Instant WHEN = Instant.parse("2026-05-14T00:00:00Z");

    @TempDir
    Path dir;

    private static List<FeatureLayer> layers() {
        List<FeatureLayer.Column> cols = List.of(new FeatureLayer.Column("name", FeatureLayer.ColumnType.TEXT),
                new FeatureLayer.Column("depth_m", FeatureLayer.ColumnType.REAL),
                new FeatureLayer.Column("rank", FeatureLayer.ColumnType.INTEGER));
        Map<String, Object> a1 = Map.of("name", "wreck, \"old\"", "depth_m", 12.25, "rank", 3L);
        Map<String, Object> a2 = new HashMap<>();
        a2.put("name", "no depth");
        a2.put("rank", -7L);
        FeatureLayer points = new FeatureLayer("targets", "Point", "EPSG:32631", cols, List.of(
                new FeatureLayer.Feature(1, GF.createPoint(new Coordinate(500123.5, 5700456.25)), a1),
                new FeatureLayer.Feature(2, GF.createPoint(new Coordinate(500200.0, 5700300.0)), a2)));
        FeatureLayer lines = new FeatureLayer("cables", "LineString", "EPSG:32631",
                List.of(new FeatureLayer.Column("asset", FeatureLayer.ColumnType.TEXT)), List.of(
                new FeatureLayer.Feature(7, GF.createLineString(new Coordinate[] {new Coordinate(500000, 5700000),
                        new Coordinate(500100, 5700050), new Coordinate(500180, 5700200)}), Map.of("asset", "C-1"))));
        FeatureLayer quay = new FeatureLayer("quay", "Polygon", "EPSG:32631", List.of(), List.of(
                new FeatureLayer.Feature(1, GF.createPolygon(new Coordinate[] {new Coordinate(500000, 5700000),
                        new Coordinate(500050, 5700000), new Coordinate(500050, 5700020),
                        new Coordinate(500000, 5700000)}), Map.of())));
        return List.of(points, lines, quay);
    }

    @Test
    void readsBackWhatItWrote() {
        Path f = dir.resolve("a.gpkg");
        GeoPackageWriter.write(f, layers(), WHEN);
        assertThat(GeoPackageReader.layerNames(f)).containsExactly("targets", "cables", "quay");
        for (FeatureLayer expected : layers()) {
            FeatureLayer got = GeoPackageReader.read(f, expected.name());
            assertThat(got.crsCode()).isEqualTo("EPSG:32631");
            assertThat(got.geometryType()).isEqualTo(expected.geometryType());
            assertThat(got.columns()).isEqualTo(expected.columns());
            assertThat(got.features()).hasSameSizeAs(expected.features());
            for (int i = 0; i < got.features().size(); i++) {
                var g = got.features().get(i);
                var e = expected.features().get(i);
                assertThat(g.id()).isEqualTo(e.id());
                assertThat(g.geometry().equalsExact(e.geometry())).as("geometry of %s", e.id()).isTrue();
                for (var c : expected.columns()) {
                    assertThat(g.attributes().get(c.name())).isEqualTo(e.attributes().get(c.name()));
                }
            }
        }
    }

    @Test
    void sameLayersGiveSameBytes() throws Exception {
        Path a = dir.resolve("a.gpkg"), b = dir.resolve("b.gpkg");
        GeoPackageWriter.write(a, layers(), WHEN);
        Thread.sleep(1100); // a clock-dependent field would show up as a difference
        GeoPackageWriter.write(b, layers(), WHEN);
        assertThat(Files.readAllBytes(b)).isEqualTo(Files.readAllBytes(a));
    }

    @Test
    void badInputIsRejectedWithTheFileName() {
        Path f = dir.resolve("a.gpkg");
        assertThatThrownBy(() -> GeoPackageReader.read(dir.resolve("missing.gpkg"), "x"))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("missing.gpkg");
        GeoPackageWriter.write(f, layers(), WHEN);
        assertThatThrownBy(() -> GeoPackageReader.read(f, "nope"))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("targets");
        FeatureLayer bad = new FeatureLayer("x", "Point", "EPSG:32631", List.of(), List.of());
        assertThatThrownBy(() -> GeoPackageWriter.write(f, List.of(bad, bad), WHEN))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("repeated");
        assertThatThrownBy(() -> new FeatureLayer("x", "Point", "EPSG:32631", List.of(), List.of(
                new FeatureLayer.Feature(1, GF.createLineString(new Coordinate[] {new Coordinate(0, 0), new Coordinate(1, 1)}),
                        Map.of())))).isInstanceOf(IllegalArgumentException.class).hasMessageContaining("LineString");
    }

    @Test
    @Tag("external")
    void gdalReadsLayersAttributesAndCrs() {
        ExternalTools.require("ogrinfo");
        Path f = dir.resolve("a.gpkg");
        GeoPackageWriter.write(f, layers(), WHEN);
        // GDAL's GeoPackage driver is the reference reader (gdal.org/drivers/vector/gpkg.html)
        String info = ExternalTools.run(List.of("ogrinfo", "-ro", "-so", f.toString(), "targets"), null).orFail();
        assertThat(info).doesNotContainIgnoringCase("warning").doesNotContain("ERROR");
        assertThat(info).contains("Geometry: Point").contains("Feature Count: 2")
                .contains("ID[\"EPSG\",32631]").contains("name: String").contains("depth_m: Real")
                .contains("rank: Integer");
        String csv = ExternalTools.run(List.of("ogr2ogr", "-f", "CSV", "/vsistdout/", f.toString(), "targets",
                "-lco", "GEOMETRY=AS_WKT"), null).orFail();
        assertThat(csv).contains("\"POINT (500123.5 5700456.25)\",\"wreck, \"\"old\"\"\",12.25,\"3\"")
                .contains("\"POINT (500200 5700300)\",no depth,,\"-7\"");
        String lines = ExternalTools.run(List.of("ogr2ogr", "-f", "CSV", "/vsistdout/", f.toString(), "cables",
                "-lco", "GEOMETRY=AS_WKT"), null).orFail();
        assertThat(lines).contains("LINESTRING (500000 5700000,500100 5700050,500180 5700200)").contains("C-1");
        String all = ExternalTools.run(List.of("ogrinfo", "-ro", "-q", f.toString()), null).orFail();
        assertThat(all).contains("quay (Polygon)").doesNotContainIgnoringCase("warning");
    }
}
