package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.process.factory.DescribeParameter;
import org.geotools.process.factory.DescribeProcess;
import org.geotools.process.factory.DescribeResult;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * Reduction to the pole of a total-field grid, as a GeoTools process ({@code halyard:ReductionToPole}). Kernel:
 * {@link org.halyard.spectral.FilterBank}; method notes in docs/filters.md.
 */
@DescribeProcess(title = "Reduction to the pole", description = "Recomputes the anomaly as if field and magnetisation were vertical (Baranov 1957), stabilised at low inclination.")
public final class ReductionToPoleProcess implements HalyardProcess {

    /**
     * Runs the filter.
     *
     * @param data total-field anomaly grid, nT, projected CRS in metres, north-up, square cells
     * @return Anomaly reduced to the pole, nT
     */
    @DescribeResult(name = "result", description = "Anomaly reduced to the pole, nT", meta = {"unit=nT"})
    public GridCoverage2D execute(
            @DescribeParameter(name = "data", description = "Total-field anomaly grid, nT, projected CRS in metres",
                    meta = {"unit=nT"}) GridCoverage2D data,
            @DescribeParameter(name = "inclination", description = "Earth-field inclination, degrees, positive down",
                    minValue = -90, maxValue = 90, meta = {"unit=degrees"}) Double inclination,
            @DescribeParameter(name = "declination", description = "Earth-field declination, degrees clockwise from north",
                    minValue = -180, maxValue = 360, meta = {"unit=degrees"}) Double declination,
            @DescribeParameter(name = "magnetisationInclination", description = "Source magnetisation inclination, degrees, positive down; empty for induced",
                    min = 0, minValue = -90, maxValue = 90, meta = {"unit=degrees"}) Double magInclination,
            @DescribeParameter(name = "magnetisationDeclination", description = "Source magnetisation declination, degrees clockwise from north; empty for induced",
                    min = 0, minValue = -180, maxValue = 360, meta = {"unit=degrees"}) Double magDeclination,
            @DescribeParameter(name = "stabilisingInclination", description = "Inclination below which the filter amplitude is stabilised, degrees",
                    min = 0, defaultValue = "20", minValue = 0, maxValue = 90, meta = {"unit=degrees"}) Double stabilising,
            ProgressListener monitor) {
        return FilterProcessSupport.run(data, FilterOperation.REDUCE_TO_POLE, new FilterSettings(org.halyard.model.FieldDirection.ofOptional(inclination, declination, "field inclination and declination"),
                org.halyard.model.FieldDirection.ofOptional(magInclination, magDeclination, "magnetisation inclination and declination"), 0, 1,
                FilterSettings.DEFAULT_DAMPING, FilterProcessSupport.or(stabilising, FilterSettings.DEFAULT_STABILISING_INCLINATION),
                org.halyard.spectral.GridSpectrum.MIN_PAD_FACTOR), monitor);
    }
}
