package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Total horizontal gradient of a total-field grid, as a GeoTools process ({@code halyard:TotalHorizontalGradient}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Total horizontal gradient", description = "sqrt(Tx^2 + Ty^2); peaks over the edges of sources.")
public final class TotalHorizontalGradientProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Total horizontal gradient, nT/m
     */
    @DescribeResult(name = "result", description = "Total horizontal gradient, nT/m", meta = {"unit=nT/m"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.TOTAL_HORIZONTAL_GRADIENT, FilterSettings.defaults(), monitor);
    }
}
