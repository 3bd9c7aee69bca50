package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.grid.GridGeometry;
import org.halyard.gridding.GradientSamples;
import org.halyard.gridding.GriddingOptions;
import org.halyard.gridding.GriddingResult;
import org.halyard.gridding.SplineGridder;
import org.halyard.io.GeoTiffGrids;

/**
 * Point samples to a grid by continuous-curvature splines in tension, optionally gradient-enhanced, as a
 * GeoTools process ({@code halyard:SplineGrid}). Kernel: {@link SplineGridder}; method notes in
 * docs/gridding.md.
 */
@DescribeProcess(title = "Grid by splines in tension", description = "Scattered point samples to a regular grid:"
        + " continuous-curvature splines in tension (Smith and Wessel 1990), solved coarse to fine, blanked far from"
        + " data; measured horizontal gradients, when given, constrain the surface between lines.")
public final class SplineGridProcess implements HalyardProcess {

    /**
     * Grids the layer.
     *
     * @return the grid in the unit of the value attribute, nodata far from data
     */
    @DescribeResult(name = "result", description = "Gridded values, unit of the value attribute (nT)", meta = {"unit=nT"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "features", description = "Point samples in a projected CRS in metres")
            SimpleFeatureCollection features,
            @DescribeParameter(name = "valueAttribute", description = "Numeric attribute to grid (nT)") String valueAttribute,
            @DescribeParameter(name = "cellSize", description = "Cell size, metres", minValue = 0, meta = {"unit=m"})
            Double cellSize,
            @DescribeParameter(name = "tension", description = "Spline tension, 0 (minimum curvature) to below 1",
                    min = 0, defaultValue = "0.25", minValue = 0, maxValue = 0.999, meta = {"unit=1"}) Double tension,
            @DescribeParameter(name = "blankDistance", description = "Blank cells farther than this from data, metres;"
                    + " empty: the larger of 3 cells and 0.75 x the typical line spacing", min = 0, minValue = 0,
                    meta = {"unit=m"}) Double blankDistance,
            @DescribeParameter(name = "gradientEastAttribute", description = "Attribute of measured east gradients,"
                    + " nT/m (gradient-enhanced mode, with the north one)", min = 0) String gradientEast,
            @DescribeParameter(name = "gradientNorthAttribute", description = "Attribute of measured north gradients,"
                    + " nT/m", min = 0) String gradientNorth,
            ProgressListener monitor) {
        ListenerProgress p = ListenerProgress.of(monitor);
        p.listener().started();
        if ((gradientEast == null) != (gradientNorth == null)) {
            throw new IllegalArgumentException("give both gradient attributes (east and north) or neither");
        }
        if (cellSize == null) {
            throw new IllegalArgumentException("the cell size 'cellSize' (metres) is required");
        }
        GriddingProcessSupport.Points pts = gradientEast == null
                ? GriddingProcessSupport.points(features, valueAttribute)
                : GriddingProcessSupport.points(features, valueAttribute, gradientEast, gradientNorth);
        GriddingOptions options = GriddingProcessSupport.options(tension, blankDistance);
        GridGeometry g = SplineGridder.geometryFor(pts.x(), pts.y(), cellSize, pts.crsCode());
        GriddingResult r = gradientEast == null
                ? SplineGridder.grid(pts.x(), pts.y(), pts.values()[0], g, options, p)
                : SplineGridder.grid(pts.x(), pts.y(), pts.values()[0],
                        new GradientSamples(pts.x(), pts.y(), pts.values()[1], pts.values()[2]), g, options, p);
        GridCoverage2D out = GeoTiffGrids.toCoverage(r.grid(), valueAttribute);
        p.listener().complete();
        return out;
    }
}
