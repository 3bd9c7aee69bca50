package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Horizontal derivative of the tilt of a total-field grid, as a GeoTools process ({@code halyard:TiltHorizontalDerivative}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Horizontal derivative of the tilt", description = "Total horizontal derivative of the tilt angle (Verduzco et al. 2004); sharp maxima over edges.")
public final class TiltHorizontalDerivativeProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Horizontal derivative of the tilt, degrees/m
     */
    @DescribeResult(name = "result", description = "Horizontal derivative of the tilt, degrees/m", meta = {"unit=degrees/m"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.TILT_HORIZONTAL_DERIVATIVE, FilterSettings.defaults(), monitor);
    }
}
