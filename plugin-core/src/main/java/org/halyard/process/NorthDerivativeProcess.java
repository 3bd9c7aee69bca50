package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * North derivative of a total-field grid, as a GeoTools process ({@code halyard:NorthDerivative}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "North derivative", description = "Derivative towards north (northing), i ky, whatever the row order of the grid.")
public final class NorthDerivativeProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return dT/dy towards north, nT/m
     */
    @DescribeResult(name = "result", description = "dT/dy towards north, nT/m", meta = {"unit=nT/m"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.DY, FilterSettings.defaults(), monitor);
    }
}
