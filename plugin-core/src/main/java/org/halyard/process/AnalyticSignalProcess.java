package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Analytic signal amplitude of a total-field grid, as a GeoTools process ({@code halyard:AnalyticSignal}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Analytic signal amplitude", description = "sqrt(Tx^2 + Ty^2 + Tz^2) (Roest et al. 1992); peaks over compact sources whatever their magnetisation.")
public final class AnalyticSignalProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Analytic signal amplitude, nT/m
     */
    @DescribeResult(name = "result", description = "Analytic signal amplitude, nT/m", meta = {"unit=nT/m"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.ANALYTIC_SIGNAL, FilterSettings.defaults(), monitor);
    }
}
