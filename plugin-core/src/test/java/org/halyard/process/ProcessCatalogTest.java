package org.halyard.process;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import org.geotools.api.feature.type.Name;
import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.feature.NameImpl;
import org.geotools.process.ProcessFactory;
import org.geotools.process.Processors;
import org.geotools.process.factory.AnnotatedBeanProcessFactory;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.geotools.text.Text;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.io.GeoTiffGrids;
import org.junit.jupiter.api.Test;

class ProcessCatalogTest {

    /** How a sample bean is to be shifted. */
    public enum Mode { ADD, SUBTRACT }

    /** A bean shaped like Halyard's processes, for reading its metadata back. */
    @DescribeProcess(title = "Shift", description = "Adds an offset to every cell.")
    public static final class ShiftProcess {
        @DescribeResult(name = "result", description = "shifted grid")
        public GridCoverage2D execute(
                @DescribeParameter(name = "grid", description = "input grid") GridCoverage2D grid,
                @DescribeParameter(name = "offset", description = "offset in nT", min = 0, defaultValue = "1",
                        minValue = -500, maxValue = 500, meta = {"unit=nT"}) Double offset,
                @DescribeParameter(name = "mode", description = "add or subtract", min = 0) Mode mode,
                @DescribeParameter(name = "blankZeros", description = "blank exact zeros", min = 0) Boolean blank,
                ProgressListener monitor) {
            Grid g = GeoTiffGrids.fromCoverage(grid, null, "grid");
            float[] v = g.toArray();
            double sign = mode == Mode.SUBTRACT ? -1 : 1;
            monitor.started();
            for (int i = 0; i < v.length; i++) {
                if (monitor.isCanceled()) {
                    return null;
                }
                v[i] += (float) (sign * (offset == null ? 1 : offset));
                monitor.progress(100f * (i + 1) / v.length);
            }
            monitor.complete();
            return GeoTiffGrids.toCoverage(Grid.of(g.geometry(), v), "result");
        }
    }

    private static final AnnotatedBeanProcessFactory SAMPLE =
            new AnnotatedBeanProcessFactory(Text.text("sample"), "sample", ShiftProcess.class);

    private static final Name SHIFT = new NameImpl("sample", "Shift");

    @Test
    void listsEveryProcessGeoToolsReportsWithHalyardsFirst() {
        List<ProcessSpec> all = ProcessCatalog.all();
        int expected = 0;
        for (ProcessFactory f : Processors.getProcessFactories()) {
            expected += f.getNames().size();
        }
        assertThat(all).hasSize(expected);
        boolean seenOther = false;
        for (ProcessSpec p : all) {
            assertThat(seenOther && p.isHalyard()).as("%s after a non-Halyard process", p.qualifiedName()).isFalse();
            seenOther |= !p.isHalyard();
        }
    }

    @Test
    void readsUnitRangeDefaultChoicesAndKinds() {
        ProcessSpec s = ProcessCatalog.describe(SAMPLE, SHIFT);
        assertThat(s.title()).isEqualTo("Shift");
        Map<String, ParameterSpec> byName = new HashMap<>();
        s.inputs().forEach(p -> byName.put(p.name(), p));
        assertThat(byName).containsOnlyKeys("grid", "offset", "mode", "blankZeros");
        ParameterSpec offset = byName.get("offset");
        assertThat(offset.kind()).isEqualTo(ParameterSpec.Kind.NUMBER);
        assertThat(offset.unit()).isEqualTo("nT");
        assertThat(offset.min()).isEqualTo(-500.0);
        assertThat(offset.max()).isEqualTo(500.0);
        assertThat(offset.label()).isEqualTo("offset (nT)");
        assertThat(offset.required()).isFalse();
        assertThat(offset.inRange(600)).isFalse();
        assertThat(byName.get("grid").kind()).isEqualTo(ParameterSpec.Kind.GRID);
        assertThat(byName.get("grid").required()).isTrue();
        assertThat(byName.get("mode").choices()).containsExactly("ADD", "SUBTRACT");
        assertThat(byName.get("blankZeros").kind()).isEqualTo(ParameterSpec.Kind.BOOLEAN);
        assertThat(s.outputs()).extracting(ParameterSpec::kind).containsExactly(ParameterSpec.Kind.GRID);
    }

    @Test
    void invokerConvertsGridsAndChoicesAndReportsProgress() {
        ProcessSpec s = ProcessCatalog.describe(SAMPLE, SHIFT);
        Grid in = Grid.filled(new GridGeometry(4, 3, 500_000, 6_000_000, 2, "EPSG:32631"), 10f);
        double[] last = {-1};
        Progress p = new Progress() {
            @Override
            public void report(double percent) {
                last[0] = percent;
            }

            @Override
            public boolean isCanceled() {
                return false;
            }
        };
        Map<String, Object> out = run(s,
                Map.of("grid", in, "offset", "2.5", "mode", "SUBTRACT"), p);
        Grid g = (Grid) out.get("result");
        assertThat(g.get(3, 2)).isEqualTo(7.5f); // 10 - 2.5
        assertThat(last[0]).isEqualTo(100.0);
    }

    private static Map<String, Object> run(ProcessSpec s, Map<String, Object> in, Progress p) {
        return ProcessInvoker.run(SAMPLE.create(SHIFT), s, in, p, msg -> { });
    }

    @Test
    void missingRequiredGridIsNamed() {
        ProcessSpec s = ProcessCatalog.describe(SAMPLE, SHIFT);
        assertThatThrownBy(() -> run(s, Map.of(), Progress.NONE))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("'grid' needs a value");
    }

    @Test
    void cancellingStopsTheRun() {
        ProcessSpec s = ProcessCatalog.describe(SAMPLE, SHIFT);
        Grid in = Grid.filled(new GridGeometry(4, 3, 0, 0, 1, "EPSG:32631"), 1f);
        Progress cancelled = new Progress() {
            @Override
            public void report(double percent) {
            }

            @Override
            public boolean isCanceled() {
                return true;
            }
        };
        assertThatThrownBy(() -> run(s, Map.of("grid", in), cancelled))
                .isInstanceOf(CancellationException.class);
    }
}
