package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.grid.GridGeometry;
import org.halyard.gridding.GradientSamples;
import org.halyard.gridding.MeasuredGradientAnalyticSignal;
import org.halyard.gridding.SplineGridder;
import org.halyard.io.GeoTiffGrids;

/**
 * Analytic signal from measured horizontal gradients of line data, as a GeoTools process
 * ({@code halyard:MeasuredGradientAnalyticSignal}). Kernel: {@link MeasuredGradientAnalyticSignal}; compare
 * with {@code halyard:AnalyticSignal} of the gridded total field.
 */
@DescribeProcess(title = "Analytic signal from measured gradients", description = "Grids the measured east and north"
        + " gradients, derives the vertical gradient by the harmonic relation and returns sqrt(Tx^2 + Ty^2 + Tz^2)"
        + " (Roest et al. 1992).")
public final class MeasuredGradientAnalyticSignalProcess implements HalyardProcess {

    /**
     * Computes the amplitude.
     *
     * @return analytic-signal amplitude, nT/m
     */
    @DescribeResult(name = "result", description = "Analytic signal amplitude, nT/m", meta = {"unit=nT/m"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "features", description = "Gradient points in a projected CRS in metres")
            SimpleFeatureCollection features,
            @DescribeParameter(name = "gradientEastAttribute", description = "Attribute of east gradients, nT/m")
            String gradientEast,
            @DescribeParameter(name = "gradientNorthAttribute", description = "Attribute of north gradients, nT/m")
            String gradientNorth,
            @DescribeParameter(name = "cellSize", description = "Cell size, metres", minValue = 0, meta = {"unit=m"})
            Double cellSize,
            @DescribeParameter(name = "tension", description = "Spline tension, 0 to below 1", min = 0,
                    defaultValue = "0.25", minValue = 0, maxValue = 0.999, meta = {"unit=1"}) Double tension,
            @DescribeParameter(name = "blankDistance", description = "Blank cells farther than this from data, metres;"
                    + " empty: automatic", min = 0, minValue = 0, meta = {"unit=m"}) Double blankDistance,
            ProgressListener monitor) {
        ListenerProgress p = ListenerProgress.of(monitor);
        p.listener().started();
        if (cellSize == null) {
            throw new IllegalArgumentException("the cell size 'cellSize' (metres) is required");
        }
        GriddingProcessSupport.Points pts = GriddingProcessSupport.points(features, gradientEast, gradientNorth);
        GridGeometry g = SplineGridder.geometryFor(pts.x(), pts.y(), cellSize, pts.crsCode());
        MeasuredGradientAnalyticSignal as = MeasuredGradientAnalyticSignal.compute(
                new GradientSamples(pts.x(), pts.y(), pts.values()[0], pts.values()[1]), g,
                GriddingProcessSupport.options(tension, blankDistance), p);
        GridCoverage2D out = GeoTiffGrids.toCoverage(as.amplitude(), "analytic_signal_measured");
        p.listener().complete();
        return out;
    }
}
