package org.halyard.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.halyard.io.GeoPackageReader;
import org.halyard.ui.map.CursorReadout;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.LayerStack;
import org.halyard.ui.map.TargetLayer;
import org.halyard.ui.map.TargetSymbols;
import org.halyard.ui.targets.TargetTableModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WorkspaceLoaderTest {

    @Test
    void filesBecomeLayersWithGridsBelowAndTargetsOnTop(@TempDir Path dir) throws Exception {
        List<Path> files = DemoFiles.write(dir);
        LayerStack stack = new LayerStack();
        WorkspaceLoader.addAll(stack, WorkspaceLoader.read(files, null));
        assertThat(stack.crsCode()).isEqualTo(DemoFiles.CRS);
        assertThat(stack.get(0)).isInstanceOf(TargetLayer.class);
        assertThat(stack.get(stack.size() - 1)).isInstanceOf(GridLayer.class);
        assertThat(stack.snapshot()).extracting(l -> l.name())
                .contains("total_field", "bathymetry", "targets", "tracks", "infrastructure");
        GridLayer tf = stack.ofType(GridLayer.class).stream().filter(g -> g.name().equals("total_field")).findFirst().orElseThrow();
        assertThat(tf.unit()).isEqualTo("nT");
        assertThat(stack.ofType(GridLayer.class).stream().filter(g -> g.name().equals("bathymetry")).findFirst()
                .orElseThrow().unit()).isEqualTo("m");
        // readout at a cell centre reads that cell
        double x = DemoFiles.WEST + 10.25, y = DemoFiles.NORTH - 20.25;
        assertThat(CursorReadout.valueText(tf, x, y)).startsWith("total_field ").endsWith(" nT");
        assertThat(tf.cellValue(x, y)).isEqualTo(tf.grid().get(10, 20));
    }

    @Test
    void recipeOpensWhatItNamesAndTheRunOutputsBesideIt(@TempDir Path dir) throws Exception {
        DemoFiles.write(dir.resolve("out/grids"));
        Files.move(dir.resolve("out/grids/halyard.gpkg"), dir.resolve("out/halyard.gpkg"));
        Files.move(dir.resolve("out/grids/bathymetry.tif"), dir.resolve("bathymetry.tif"));
        Path recipe = dir.resolve("recipe.json");
        Files.writeString(recipe, "{\"crs\":\"EPSG:32631\",\"survey\":{\"file\":\"lines.csv\"},"
                + "\"bathymetry\":{\"file\":\"bathymetry.tif\"}}");
        assertThat(WorkspaceLoader.expand(List.of(recipe))).containsExactly(dir.resolve("bathymetry.tif"),
                dir.resolve("out/grids/total_field.tif"), dir.resolve("out/halyard.gpkg"));
    }

    @Test
    void unknownFileTypeIsNamed(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("notes.txt");
        Files.writeString(f, "x");
        assertThatThrownBy(() -> WorkspaceLoader.read(List.of(f), null)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("notes.txt").hasMessageContaining(".gpkg");
    }

    @Test
    void interpretationEditChangesTheSymbolAndIsSavedToTheGeoPackage(@TempDir Path dir) throws Exception {
        List<Path> files = DemoFiles.write(dir);
        LayerStack stack = new LayerStack();
        WorkspaceLoader.addAll(stack, WorkspaceLoader.read(files, null));
        TargetLayer t = stack.ofType(TargetLayer.class).get(0);
        List<TargetTableModel.Edit> edits = new java.util.ArrayList<>();
        TargetTableModel m = new TargetTableModel(t, edits::add);
        int row = m.rowOf(2);
        int col = m.columnOf(TargetLayer.ANALYST_CLASS);
        assertThat(m.isCellEditable(row, col)).isTrue();
        assertThat(m.isCellEditable(row, m.columnOf("amplitude"))).isFalse();
        assertThat(m.getColumnClass(m.columnOf("amplitude"))).isEqualTo(Double.class);
        m.setValueAt("debris", row, col);
        assertThat(TargetSymbols.of(TargetLayer.effectiveClass(t.attributes(m.feature(row)))).symbol())
                .isEqualTo(TargetSymbols.Symbol.SQUARE);
        assertThat(edits).hasSize(1);
        // what the table panel does with an edit
        org.halyard.io.GeoPackageEdits.update(files.get(2), "targets", 2, Map.of(TargetLayer.ANALYST_CLASS, "debris"));
        assertThat(GeoPackageReader.read(files.get(2), "targets").features().get(1).attributes())
                .containsEntry(TargetLayer.ANALYST_CLASS, "debris").containsEntry("class", "discrete");
    }

    @Test
    void latLonReadoutOnTheCentralMeridian() {
        // UTM zone 31 (Snyder 1987): easting 500 000 lies on 3 E; northing 0 on the equator
        assertThat(new CursorReadout().latLonText(500_000, 0, "EPSG:32631")).startsWith("0.000000° N  3.000000° E");
        double[] ll = org.halyard.io.CrsTransforms.toLonLat("EPSG:32631").apply(500_000, 6_000_000);
        assertThat(ll[0]).isCloseTo(3.0, within(1e-9));
    }
}
