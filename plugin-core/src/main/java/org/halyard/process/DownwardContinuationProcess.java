package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Downward continuation (regularised) of a total-field grid, as a GeoTools process ({@code halyard:DownwardContinuation}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Downward continuation (regularised)", description = "Continues the field downward with Tikhonov damping; unstable by nature, use small distances.")
public final class DownwardContinuationProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Anomaly continued downward, nT
     */
    @DescribeResult(name = "result", description = "Anomaly continued downward, nT", meta = {"unit=nT"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            @DescribeParameter(name = "depth", description = "Distance to continue downward, metres",
                    defaultValue = "1", minValue = 0, maxValue = 100, meta = {"unit=m"}) Double depth,
            @DescribeParameter(name = "damping", description = "Damping of the amplification, dimensionless; gain at most 1/(2 sqrt(damping))",
                    min = 0, defaultValue = "0.001", minValue = 1e-12, maxValue = 1, meta = {"unit=1"}) Double damping,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.DOWNWARD, FilterSettings.defaults().withHeight(FilterProcessSupport.or(depth, 1)).withDamping(FilterProcessSupport.or(damping, FilterSettings.DEFAULT_DAMPING)), monitor);
    }
}
