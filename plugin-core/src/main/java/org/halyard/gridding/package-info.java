/**
 * Scattered samples to regular grids: continuous-curvature splines in tension solved coarse to fine,
 * block reduction of dense along-line samples, blanking by distance to data, gradient-enhanced gridding
 * from measured horizontal gradients, and the analytic signal built from gridded measured gradients.
 *
 * <p>Frame for the whole package: x easting, y northing, metres of a projected CRS; grids follow
 * {@link org.halyard.grid.GridGeometry} (row 0 north, pixel-is-area). Values keep the unit of the input
 * (nT for total field, nT/m for gradients). Depends on {@code org.halyard.grid} and, for the vertical
 * gradient of the analytic signal, on {@code org.halyard.spectral}; never on GeoTools. Method notes:
 * {@code docs/gridding.md}.
 */
package org.halyard.gridding;
