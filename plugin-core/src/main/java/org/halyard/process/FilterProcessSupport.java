package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.coverage.grid.GridCoverage2D;
import org.halyard.grid.Grid;
import org.halyard.io.GeoTiffGrids;
import org.halyard.spectral.FilterBank;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;

/**
 * What every filter process does around its kernel: coverage in, {@link FilterBank} run, coverage out,
 * with the listener called from start to completion.
 */
final class FilterProcessSupport {

    private FilterProcessSupport() {
    }

    static GridCoverage2D run(GridCoverage2D data, FilterOperation op, FilterSettings settings, ProgressListener monitor) {
        if (data == null) {
            throw new IllegalArgumentException("the input grid 'data' is required");
        }
        ListenerProgress p = ListenerProgress.of(monitor);
        p.listener().started();
        Grid grid = GeoTiffGrids.fromCoverage(data, noData(data), "input grid");
        Grid out = FilterBank.once(grid, settings).apply(op, p);
        GridCoverage2D result = GeoTiffGrids.toCoverage(out, op.cliName());
        p.listener().complete();
        return result;
    }

    private static Double noData(GridCoverage2D c) {
        var nd = org.geotools.coverage.util.CoverageUtilities.getNoDataProperty(c);
        return nd == null ? null : nd.getAsSingleValue();
    }

    static double or(Double v, double fallback) {
        return v == null ? fallback : v;
    }
}
