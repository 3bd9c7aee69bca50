/**
 * File formats: GeoTIFF grids, survey CSV, IAGA-2002 base-station files, GeoPackage vector layers.
 *
 * <p>GeoTools and GeoPackage library types live here (and in {@code org.halyard.process}) only; the rest of
 * Halyard sees {@link org.halyard.grid.Grid}, plain arrays, JTS geometries and the records of this package.
 */
package org.halyard.io;
