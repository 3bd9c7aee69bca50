package org.halyard.targets;

/**
 * A local maximum of a grid, refined to sub-cell position.
 *
 * @param x         easting of the refined maximum, m
 * @param y         northing of the refined maximum, m
 * @param amplitude grid value at the maximum (the analytic signal in nT/m when picked on it)
 * @param column    column of the maximum cell
 * @param row       row of the maximum cell (row 0 north)
 */
public record Peak(double x, double y, double amplitude, int column, int row) {
}
