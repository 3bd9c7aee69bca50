/**
 * The map: a viewport (world-to-screen transform), layers (grids drawn as tiles off the UI thread, vector
 * features, targets by class), the Java2D painter shared by the canvas and the PNG export, and the canvas
 * with its mouse tools.
 *
 * <p>Works in one projected map CRS (x easting, y northing, metres); vector layers in another CRS are
 * reprojected on loading. Must not depend on GeoTools: CRS work goes through {@code org.halyard.io}.
 */
package org.halyard.ui.map;
