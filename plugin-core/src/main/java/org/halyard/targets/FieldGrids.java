package org.halyard.targets;

import org.halyard.grid.Grid;

/**
 * The total-field anomaly and its three derivatives on one grid geometry, at one observation level.
 *
 * <p>Units: {@code total} in nT; {@code dx}, {@code dy}, {@code dz} in nT/m with x east, y north and z
 * <b>down</b> (so {@code dz} is positive where the anomaly grows downward; DOMAIN.md). The derivatives may
 * come from the spectral filters or from measured gradients.
 *
 * @param total total-field anomaly, nT
 * @param dx    derivative with respect to easting, nT/m
 * @param dy    derivative with respect to northing, nT/m
 * @param dz    derivative with respect to depth (positive down), nT/m
 */
public record FieldGrids(Grid total, Grid dx, Grid dy, Grid dz) {

    public FieldGrids {
        for (Grid g : new Grid[] {dx, dy, dz}) {
            if (!g.geometry().equals(total.geometry())) {
                throw new IllegalArgumentException("derivative grids must share the total-field grid's geometry: "
                        + g.geometry() + " differs from " + total.geometry());
            }
        }
    }

    /**
     * The 3-D analytic signal amplitude sqrt(dx^2 + dy^2 + dz^2), nT/m (Roest, Verhoef and Pilkington 1992,
     * Geophysics 57(1) 116-125); blank where any derivative is blank.
     */
    public Grid analyticSignal() {
        float[] a = new float[total.geometry().size()];
        for (int i = 0; i < a.length; i++) {
            double gx = dx.get(i), gy = dy.get(i), gz = dz.get(i);
            a[i] = (float) Math.sqrt(gx * gx + gy * gy + gz * gz);
        }
        return Grid.wrap(total.geometry(), a);
    }
}
