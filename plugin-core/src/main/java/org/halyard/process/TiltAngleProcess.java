package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Tilt angle of a total-field grid, as a GeoTools process ({@code halyard:TiltAngle}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Tilt angle", description = "atan2(Tz, sqrt(Tx^2 + Ty^2)) in degrees (Miller and Singh 1994); zero over source edges.")
public final class TiltAngleProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Tilt angle, degrees, -90 to 90
     */
    @DescribeResult(name = "result", description = "Tilt angle, degrees, -90 to 90", meta = {"unit=degrees"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.TILT, FilterSettings.defaults(), monitor);
    }
}
