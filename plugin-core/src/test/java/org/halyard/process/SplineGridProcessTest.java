package org.halyard.process;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.HashMap;
import java.util.Map;
import org.geotools.api.feature.simple.SimpleFeatureType;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.collection.ListFeatureCollection;
import org.geotools.data.util.DefaultProgressListener;
import org.geotools.feature.NameImpl;
import org.geotools.feature.simple.SimpleFeatureBuilder;
import org.geotools.feature.simple.SimpleFeatureTypeBuilder;
import org.geotools.process.Processors;
import org.geotools.referencing.CRS;
import org.halyard.grid.Grid;
import org.halyard.gridding.GriddingOptions;
import org.halyard.gridding.SplineGridder;
import org.halyard.io.GeoTiffGrids;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.junit.jupiter.api.Test;

/** The gridding processes through the GeoTools process API: same grid as the kernel, listener called. */
class SplineGridProcessTest {

    private static ListFeatureCollection points(double[] x, double[] y, double[] v) throws Exception {
        SimpleFeatureTypeBuilder tb = new SimpleFeatureTypeBuilder();
        tb.setName("samples");
        tb.setCRS(CRS.decode("EPSG:32631", true));
        tb.add("geom", org.locationtech.jts.geom.Point.class);
        tb.add("mag", Double.class);
        tb.add("ge", Double.class);
        tb.add("gn", Double.class);
        SimpleFeatureType t = tb.buildFeatureType();
        ListFeatureCollection fc = new ListFeatureCollection(t);
        GeometryFactory gf = new GeometryFactory();
        SimpleFeatureBuilder fb = new SimpleFeatureBuilder(t);
        for (int i = 0; i < x.length; i++) {
            // a plane of slope (0.2, -0.1) nT/m: its gradients are exact
            fc.add(fb.buildFeature("s" + i, new Object[] {gf.createPoint(new Coordinate(x[i], y[i])), v[i], 0.2, -0.1}));
        }
        return fc;
    }

    @Test
    void splineGridMatchesTheKernelAndCompletesTheListener() throws Exception {
        int n = 400;
        double[] x = new double[n], y = new double[n], v = new double[n];
        java.util.Random rnd = new java.util.Random(4);
        for (int i = 0; i < n; i++) {
            x[i] = 500000 + 30 * rnd.nextDouble();
            y[i] = 5800000 + 20 * rnd.nextDouble();
            v[i] = Math.sin(x[i] / 5) + 0.2 * (x[i] - 500000) - 0.1 * (y[i] - 5800000);
        }
        DefaultProgressListener listener = new DefaultProgressListener();
        Map<String, Object> in = new HashMap<>(Map.of("features", points(x, y, v), "valueAttribute", "mag",
                "cellSize", 0.5, "tension", 0.25));
        GridCoverage2D cov = (GridCoverage2D) Processors.createProcess(new NameImpl("halyard", "SplineGrid"))
                .execute(in, listener).get("result");
        Grid got = GeoTiffGrids.fromCoverage(cov, (double) GeoTiffGrids.NODATA, "result");
        Grid expect = SplineGridder.grid(x, y, v, SplineGridder.geometryFor(x, y, 0.5, "EPSG:32631"),
                GriddingOptions.defaults(), null).grid();
        assertThat(got.geometry()).isEqualTo(expect.geometry());
        for (int i = 0; i < expect.geometry().size(); i++) {
            // the bean is a thin adapter: identical cells, blanks included
            assertThat(Float.floatToIntBits(got.get(i))).isEqualTo(Float.floatToIntBits(expect.get(i)));
        }
        assertThat(listener.isCompleted()).isTrue();
        assertThat(listener.getProgress()).isEqualTo(100f);

        in.put("gradientEastAttribute", "ge");
        assertThatThrownBy(() -> Processors.createProcess(new NameImpl("halyard", "SplineGrid")).execute(in, null))
                .hasMessageContaining("both gradient attributes");
    }

    @Test
    void measuredGradientAnalyticSignalOfAPlaneIsItsSlope() throws Exception {
        int n = 600;
        double[] x = new double[n], y = new double[n], v = new double[n];
        java.util.Random rnd = new java.util.Random(5);
        for (int i = 0; i < n; i++) {
            x[i] = 500000 + 30 * rnd.nextDouble();
            y[i] = 5800000 + 30 * rnd.nextDouble();
        }
        GridCoverage2D cov = (GridCoverage2D) Processors.createProcess(
                new NameImpl("halyard", "MeasuredGradientAnalyticSignal")).execute(Map.of("features", points(x, y, v),
                "gradientEastAttribute", "ge", "gradientNorthAttribute", "gn", "cellSize", 1.0), null).get("result");
        Grid a = GeoTiffGrids.fromCoverage(cov, (double) GeoTiffGrids.NODATA, "result");
        // Constant horizontal gradients have no vertical gradient (harmonic plane), so |A| = |(0.2, -0.1)|.
        double expect = Math.hypot(0.2, -0.1);
        int checked = 0;
        for (int i = 0; i < a.geometry().size(); i++) {
            if (!Float.isNaN(a.get(i))) {
                assertThat((double) a.get(i)).isCloseTo(expect, org.assertj.core.data.Offset.offset(1e-3));
                checked++;
            }
        }
        assertThat(checked).isGreaterThan(500);
    }
}
