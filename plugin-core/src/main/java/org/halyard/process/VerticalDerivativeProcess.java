package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Vertical derivative of a total-field grid, as a GeoTools process ({@code halyard:VerticalDerivative}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Vertical derivative", description = "Derivative of order n with respect to depth (z down), k^n; fractional orders allowed.")
public final class VerticalDerivativeProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Vertical derivative, nT/m^n, z down
     */
    @DescribeResult(name = "result", description = "Vertical derivative, nT/m^n, z down", meta = {"unit=nT/m^n"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            @DescribeParameter(name = "order", description = "Derivative order, fractional allowed",
                    defaultValue = "1", minValue = 0.1, maxValue = 4, meta = {"unit=1"}) Double order,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.VERTICAL_DERIVATIVE, FilterSettings.defaults().withOrder(FilterProcessSupport.or(order, 1)), monitor);
    }
}
