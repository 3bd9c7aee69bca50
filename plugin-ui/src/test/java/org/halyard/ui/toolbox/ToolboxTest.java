package org.halyard.ui.toolbox;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Map;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.process.ParameterSpec;
import org.halyard.process.ProcessCatalog;
import org.halyard.process.ProcessSpec;
import org.halyard.ui.map.GridLayer;
import org.junit.jupiter.api.Test;

class ToolboxTest {

    private static final List<GridLayer> GRIDS = List.of(new GridLayer("total_field",
            Grid.filled(new GridGeometry(8, 8, 0, 8, 1, "EPSG:32631"), 1f), "nT", null));

    @Test
    void everyRegisteredProcessIsListedAndGetsAForm() {
        List<ProcessSpec> all = ProcessCatalog.all();
        assertThat(all).isNotEmpty();
        ProcessTree tree = new ProcessTree(all);
        assertThat(tree.filter("")).isEqualTo(all.size());
        for (ProcessSpec p : all) {
            ParameterForm form = new ParameterForm(p, () -> GRIDS);
            assertThat(form.editorCount()).as(p.qualifiedName()).isEqualTo(p.inputs().size());
        }
    }

    @Test
    void searchNarrowsTheTree() {
        List<ProcessSpec> all = ProcessCatalog.all();
        ProcessTree tree = new ProcessTree(all);
        ProcessSpec first = all.get(0);
        assertThat(tree.filter(first.localName())).isBetween(1, all.size());
        assertThat(tree.filter("no operator is called this")).isZero();
    }

    @Test
    void numberEditorChecksRangeAndKind() {
        ParameterSpec height = new ParameterSpec("height", "Height", "continuation height", ParameterSpec.Kind.NUMBER,
                Double.class, "m", 0, 50, 5.0, true, List.of());
        ParameterSpec order = new ParameterSpec("order", "Order", "", ParameterSpec.Kind.INTEGER, Integer.class, "",
                1, Double.NaN, 1, false, List.of());
        ProcessSpec spec = new ProcessSpec("test", "Continue", "Continue", "", List.of(height, order), List.of());
        ParameterForm form = new ParameterForm(spec, () -> GRIDS);
        assertThat(form.values()).isEqualTo(Map.of("height", 5.0, "order", 1L));
        assertThat(FieldEditors.rangeText(height)).isEqualTo("  0 to 50");
        assertThat(FieldEditors.rangeText(order)).isEqualTo("  at least 1");
        FieldEditor e = FieldEditors.of(new ParameterSpec("h", "Height", "", ParameterSpec.Kind.NUMBER, Double.class,
                "m", 0, 50, 80.0, true, List.of()), () -> GRIDS);
        assertThatThrownBy(e::value).isInstanceOf(IllegalArgumentException.class).hasMessageContaining("0 to 50");
    }

    @Test
    void gridEditorOffersOpenGridsAndChoiceEditorTheConstants() {
        ParameterSpec grid = new ParameterSpec("grid", "Grid", "", ParameterSpec.Kind.GRID, Object.class, "",
                Double.NaN, Double.NaN, null, true, List.of());
        assertThat(FieldEditors.of(grid, () -> GRIDS).value()).isSameAs(GRIDS.get(0).grid());
        ParameterSpec mode = new ParameterSpec("mode", "Mode", "", ParameterSpec.Kind.CHOICE, Object.class, "",
                Double.NaN, Double.NaN, null, false, List.of("ADD", "SUBTRACT"));
        assertThat(FieldEditors.of(mode, () -> GRIDS).value()).as("optional without default: left to the process").isNull();
    }
}
