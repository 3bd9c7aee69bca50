package org.halyard.gridding;

import org.halyard.grid.Grid;

/**
 * What {@link SplineGridder} made and how.
 *
 * @param grid             the surface, blanked far from data (NaN); unit of the input values
 * @param samplesUsed      input samples that went into block reduction
 * @param nonFinite        input samples skipped for a NaN or infinite x, y or value
 * @param outside          input samples skipped because they lie outside the grid
 * @param constrainedNodes finest-level nodes holding a (merged) sample
 * @param gradientNodes    finest-level nodes given a value extrapolated from measured gradients (0 without)
 * @param blankDistance    blanking distance applied, metres ({@code +Infinity}: none)
 * @param convergenceLimit convergence limit applied, unit of the values
 * @param sweeps           relaxation sweeps over all levels
 * @param converged        whether every level met the limit before its sweep cap
 * @param lastChange       largest change of any node in the finest level's last sweep, unit of the values:
 *                         below {@code convergenceLimit} when converged, else how far from settled it stopped
 */
public record GriddingResult(Grid grid, int samplesUsed, int nonFinite, int outside, int constrainedNodes,
                             int gradientNodes, double blankDistance, double convergenceLimit, int sweeps,
                             boolean converged, double lastChange) {
}
