/**
 * File formats at the edge of Halyard: GeoTIFF grids (through GeoTools), delimited survey tables,
 * IAGA-2002 base-station files and GeoPackage layers. GeoTools and GeoPackage types stay in this package
 * and in {@code org.halyard.process}; the kernels never see them.
 */
package org.halyard.io;
