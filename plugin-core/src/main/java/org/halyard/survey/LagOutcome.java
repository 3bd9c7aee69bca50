package org.halyard.survey;

/**
 * What the lag step of a survey run found and did.
 *
 * @param estimatedS     the estimated lag, s (positive: readings late); NaN when not estimated
 * @param pairs          pairs of opposite-direction lines the estimate used (0 when not estimated)
 * @param appliedS       the lag the positions were shifted by, s; NaN when none was applied
 * @param misfitBefore   mean misfit of the opposite-direction pairs before the shift, nT^2 (NaN when
 *                       there are no such pairs or no shift)
 * @param misfitAfter    the same after the shift, nT^2
 */
public record LagOutcome(double estimatedS, int pairs, double appliedS, double misfitBefore, double misfitAfter) {
}
