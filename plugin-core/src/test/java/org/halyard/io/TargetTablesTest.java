package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.halyard.targets.Burial;
import org.halyard.targets.EulerSolution;
import org.halyard.targets.LinearFeature;
import org.halyard.targets.MassRange;
import org.halyard.targets.NoiseEstimate;
import org.halyard.targets.Target;
import org.halyard.targets.TargetClass;
import org.halyard.targets.TargetOptions;
import org.halyard.targets.TargetResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class TargetTablesTest {

    @TempDir
    Path dir;

    static final String CONTRACT_TARGETS = "id,x,y,class,depth_below_sensor_m,burial_m,amplitude,moment_am2,"
            + "mass_kg_min,mass_kg_max,asset"; // CONTRACT.md, outputs of run
    static final String CONTRACT_FEATURES = "id,wkt,length_m,asset"; // CONTRACT.md, outputs of run

    static TargetResult empty() {
        return new TargetResult(List.of(), List.of(), new NoiseEstimate(0.01, 0.002), 0.02,
                List.of("no peaks: the analytic signal nowhere exceeds the threshold"), TargetOptions.DEFAULT);
    }

    @Test
    void emptyResultsGiveHeaderOnlyFilesAndANote() throws Exception {
        TargetTables.writeAll(dir, empty());
        List<String> t = Files.readAllLines(dir.resolve("targets.csv"));
        List<String> f = Files.readAllLines(dir.resolve("linear_features.csv"));
        assertThat(t).hasSize(1);
        assertThat(t.get(0)).startsWith(CONTRACT_TARGETS);
        assertThat(f).hasSize(1);
        assertThat(f.get(0)).startsWith(CONTRACT_FEATURES);
        JsonNode meta = new ObjectMapper().readTree(dir.resolve("targets.method.json").toFile());
        assertThat(meta.get("notes").get(0).asText()).startsWith("no peaks");
        assertThat(meta.get("methods").asText()).contains("Euler deconvolution");
        assertThat(meta.get("mass_assumptions").asText()).contains("7850");
    }

    static TargetResult sample() {
        GeometryFactory gf = new GeometryFactory();
        var line = gf.createLineString(new Coordinate[] {new Coordinate(0, 0), new Coordinate(30, 40)});
        Target discrete = new Target(1, 500123.25, 5700456.5, TargetClass.DISCRETE, 3.2, "euler-si3",
                new Burial(Double.NaN, "no bathymetry grid and no sensor altitude"), 1.25,
                Optional.of(new EulerSolution(500123.25, 5700456.5, 3.2, 0, 0.1, 3, 6, 169)), Optional.empty(),
                Optional.of(new MassRange(1, 6, 9)), Optional.of("WRECK, 7"));
        Target onCable = new Target(2, 15, 20, TargetClass.LINEAR, 3.3, "euler-si2", new Burial(1.1, "altitude"), 0.5,
                Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty());
        TargetResult r = new TargetResult(List.of(discrete, onCable),
                List.of(new LinearFeature(1, line, 0.4, 3.3, Optional.of("CBL-1"))),
                new NoiseEstimate(0.01, 0.002), 0.02, List.of(), TargetOptions.DEFAULT);
        return r;
    }

    @Test
    void rowsCarryTheValuesAndLeaveUnknownsEmpty() throws Exception {
        TargetResult r = sample();
        TargetTables.writeAll(dir, r);
        List<String> t = Files.readAllLines(dir.resolve("targets.csv"));
        assertThat(t).hasSize(3);
        assertThat(t.get(1)).startsWith("1,500123.25,5700456.5,discrete,3.2,,1.25,,1,9,\"WRECK, 7\",euler-si3,3.2,0.1");
        assertThat(t.get(2)).startsWith("2,15,20,linear,3.3,1.1,0.5,,,,,euler-si2");
        List<String> f = Files.readAllLines(dir.resolve("linear_features.csv"));
        assertThat(f.get(1)).startsWith("1,\"LINESTRING (0 0, 30 40)\",50,CBL-1"); // 3-4-5 triangle: 50 m
    }

    @Test
    @org.junit.jupiter.api.Tag("external")
    void layersCarryEveryAttributeAndGdalReadsThem() throws Exception {
        org.halyard.testing.ExternalTools.require("ogrinfo");
        TargetResult r = sample();
        Path gpkg = dir.resolve("halyard.gpkg");
        GeoPackageWriter.write(gpkg, TargetTables.layers(r, "EPSG:32631"), java.time.Instant.parse("2026-05-14T09:30:00Z"));
        FeatureLayer back = GeoPackageReader.read(gpkg, "targets");
        assertThat(back.features()).hasSize(2);
        assertThat(back.columns().stream().map(FeatureLayer.Column::name).toList())
                .containsAll(TargetTables.targetColumns().subList(1, TargetTables.targetColumns().size()));
        assertThat(back.features().get(0).attributes().get("burial_m")).isNull(); // unknown stays NULL
        String info = org.halyard.testing.ExternalTools.run(List.of("ogrinfo", "-so", gpkg.toString(), "linear_features"),
                dir).orFail();
        assertThat(info).contains("Feature Count: 1").contains("azimuth_deg");
    }

    @Test
    void numbersInTheRootLocale() {
        assertThat(CsvTableWriter.number(-0.0000001, 3)).isEqualTo("0");
        assertThat(CsvTableWriter.number(1234.5, 2)).isEqualTo("1234.5");
        assertThat(CsvTableWriter.number(Double.NaN)).isEmpty();
    }
}
