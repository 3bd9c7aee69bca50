package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.data.simple.SimpleFeatureCollection;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.grid.Grid;
import org.halyard.targets.Peak;
import org.halyard.targets.PeakOptions;
import org.halyard.targets.PeakPicker;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;

/**
 * Peaks of a grid (normally the analytic signal) above a noise-adaptive threshold, as a GeoTools process
 * ({@code halyard:PeakPicking}). Kernel: {@link PeakPicker}; method notes in docs/targets.md.
 */
@DescribeProcess(title = "Peak picking", description = "Local maxima above median + k x robust noise (1.4826 MAD),"
        + " at least a minimum separation apart, refined to sub-cell position by parabolas.")
public final class PeakPickingProcess implements HalyardProcess {

    /**
     * Runs the picker.
     *
     * @param data grid to pick on, normally the analytic signal in nT/m; projected CRS in metres
     * @return one point per peak, strongest first, with its amplitude (the grid's unit)
     */
    @DescribeResult(name = "result", description = "Peaks: points with amplitude (unit of the input grid)")
    public SimpleFeatureCollection execute(
            @DescribeParameter(name = "data", description = "Grid to pick on, normally the analytic signal, nT/m",
                    meta = {"unit=nT/m"}) GridCoverage2D data,
            @DescribeParameter(name = "thresholdFactor", description = "k in median + k x noise, dimensionless",
                    min = 0, defaultValue = "5", minValue = 0.5, maxValue = 100, meta = {"unit=1"}) Double k,
            @DescribeParameter(name = "window", description = "Half-width of the local-maximum window, cells",
                    min = 0, defaultValue = "2", minValue = 1, maxValue = 50, meta = {"unit=cells"}) Integer window,
            @DescribeParameter(name = "separation", description = "Minimum distance between picks, m", min = 0,
                    defaultValue = "1.5", minValue = 0, maxValue = 1000, meta = {"unit=m"}) Double separation,
            ProgressListener monitor) {
        ListenerProgress p = ListenerProgress.of(monitor);
        p.listener().started();
        Grid grid = FeatureTableBuilder.grid(data, "data");
        PeakOptions o = new PeakOptions(FeatureTableBuilder.or(k, PeakOptions.DEFAULT.thresholdFactor()),
                window == null ? PeakOptions.DEFAULT.windowCells() : window,
                FeatureTableBuilder.or(separation, PeakOptions.DEFAULT.minSeparationM()));
        PeakPicker.Result r = PeakPicker.pick(grid, o, p);
        FeatureTableBuilder out = new FeatureTableBuilder("peaks", Point.class, data.getCoordinateReferenceSystem2D(),
                "id", Integer.class, "amplitude", Double.class, "threshold", Double.class);
        GeometryFactory gf = new GeometryFactory();
        int id = 1;
        for (Peak pk : r.peaks()) {
            out.add(gf.createPoint(new Coordinate(pk.x(), pk.y())), id++, pk.amplitude(), r.threshold());
        }
        p.listener().complete();
        return out.build();
    }
}
