package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Upward continuation of a total-field grid, as a GeoTools process ({@code halyard:UpwardContinuation}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Upward continuation", description = "Continues the field upward, exp(-k h), as observed higher above the sources.")
public final class UpwardContinuationProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Anomaly continued upward, nT
     */
    @DescribeResult(name = "result", description = "Anomaly continued upward, nT", meta = {"unit=nT"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            @DescribeParameter(name = "height", description = "Distance to continue upward, metres",
                    defaultValue = "1", minValue = 0, maxValue = 10000, meta = {"unit=m"}) Double height,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.UPWARD, FilterSettings.defaults().withHeight(FilterProcessSupport.or(height, 1)), monitor);
    }
}
