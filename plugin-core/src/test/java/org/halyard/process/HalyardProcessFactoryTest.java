package org.halyard.process;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.geotools.api.data.Parameter;
import org.geotools.api.feature.type.Name;
import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.util.DefaultProgressListener;
import org.geotools.feature.NameImpl;
import org.geotools.process.Process;
import org.geotools.process.ProcessFactory;
import org.geotools.process.Processors;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.io.GeoTiffGrids;
import org.junit.jupiter.api.Test;

/** Registry checks in the manner of GeoTools' own process-factory tests: SPI discovery and metadata. */
class HalyardProcessFactoryTest {

    static List<Name> halyardNames() {
        List<Name> names = new ArrayList<>();
        for (ProcessFactory f : Processors.getProcessFactories()) {
            for (Name n : f.getNames()) {
                if (HalyardProcessFactory.NAMESPACE.equals(n.getNamespaceURI())) {
                    names.add(n);
                }
            }
        }
        return names;
    }

    @Test
    void everyListedBeanIsFoundThroughGeoToolsSpi() {
        List<String> local = halyardNames().stream().map(Name::getLocalPart).toList();
        assertThat(local).contains("ReductionToPole", "UpwardContinuation", "DownwardContinuation",
                "VerticalDerivative", "EastDerivative", "NorthDerivative", "TotalHorizontalGradient",
                "AnalyticSignal", "TiltAngle", "TiltHorizontalDerivative");
        assertThat(local).hasSize(HalyardProcessFactory.beanClasses().length);
    }

    @Test
    void everyParameterHasADescriptionAndEveryNumberAUnit() {
        for (Name n : halyardNames()) {
            ProcessFactory f = Processors.createProcessFactory(n);
            assertThat(f.getTitle(n).toString()).as(n.toString()).isNotBlank();
            assertThat(f.getDescription(n).toString()).as(n.toString()).isNotBlank();
            for (Parameter<?> p : f.getParameterInfo(n).values()) {
                assertThat(p.getDescription().toString()).as(n + " " + p.getName()).isNotBlank();
                if (Number.class.isAssignableFrom(p.getType())) {
                    Object meta = p.metadata == null ? null : p.metadata.get("unit");
                    assertThat(meta).as(n + " " + p.getName() + " unit").isNotNull();
                }
            }
            assertThat(f.getResultInfo(n, null)).as(n.toString()).isNotEmpty();
        }
    }

    @Test
    void upwardContinuationRunsThroughTheProcessApiAndReportsProgress() {
        GridGeometry g = new GridGeometry(64, 48, 500000, 5800000, 1, "EPSG:32631");
        Grid grid = Grid.sample(g, (x, y) -> 5 + 0.01 * (x - 500000));
        GridCoverage2D cov = GeoTiffGrids.toCoverage(grid, "in");
        Process p = Processors.createProcess(new NameImpl("halyard", "UpwardContinuation"));
        DefaultProgressListener listener = new DefaultProgressListener();
        Map<String, Object> out = p.execute(Map.of("data", cov, "height", 3.0), listener);
        GridCoverage2D res = (GridCoverage2D) out.get("result");
        Grid back = GeoTiffGrids.fromCoverage(res, (double) GeoTiffGrids.NODATA, "result");
        // A plane is harmonic: continuation leaves it unchanged (Blakely 1995, ch. 12).
        for (int i = 0; i < g.size(); i++) {
            assertThat((double) back.get(i)).isCloseTo(grid.get(i), org.assertj.core.data.Offset.offset(1e-3));
        }
        assertThat(listener.isCompleted()).isTrue();
        assertThat(listener.getProgress()).isEqualTo(100f);
    }

    @Test
    void cancellationStopsTheFilter() {
        GridGeometry g = new GridGeometry(64, 64, 500000, 5800000, 1, "EPSG:32631");
        GridCoverage2D cov = GeoTiffGrids.toCoverage(Grid.filled(g, 1f), "in");
        ProgressListener cancelled = new DefaultProgressListener();
        cancelled.setCanceled(true);
        Process p = Processors.createProcess(new NameImpl("halyard", "AnalyticSignal"));
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> p.execute(Map.of("data", cov), cancelled))
                .hasStackTraceContaining("cancel");
    }
}
