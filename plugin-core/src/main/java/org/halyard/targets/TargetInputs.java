package org.halyard.targets;

import java.util.List;
import java.util.Optional;
import org.halyard.grid.Grid;
import org.halyard.model.FieldDirection;

/**
 * What {@link TargetAnalysis} works on.
 *
 * @param grids            total field (nT) and its derivatives (nT/m, z down) at the sensor level
 * @param analyticSignal   the analytic signal to pick on (nT/m), or empty to compute it from {@code grids}
 * @param samples          line samples of every sensor for the dipole fits ({@link LineSamples#NONE} for none)
 * @param field            Earth-field direction (inclination positive down, declination clockwise from north)
 * @param fieldIntensityNt main-field intensity, nT, for the moment-to-mass relation
 * @param bathymetry       seabed depth below the sea surface (m, positive down), or empty
 * @param assets           charted infrastructure in the grids' CRS (may be empty)
 */
public record TargetInputs(FieldGrids grids, Optional<Grid> analyticSignal, LineSamples samples,
                           FieldDirection field, double fieldIntensityNt, Optional<Grid> bathymetry,
                           List<Asset> assets) {

    public TargetInputs {
        if (!(fieldIntensityNt > 0)) {
            throw new IllegalArgumentException("main-field intensity must be a positive number of nT, got "
                    + fieldIntensityNt);
        }
        analyticSignal.ifPresent(a -> {
            if (!a.geometry().equals(grids.total().geometry())) {
                throw new IllegalArgumentException("analytic-signal grid must share the total-field grid's geometry");
            }
        });
        assets = List.copyOf(assets);
    }

    /** The grid peaks and ridges are picked on, nT/m. */
    public Grid pickGrid() {
        return analyticSignal.orElseGet(grids::analyticSignal);
    }
}
