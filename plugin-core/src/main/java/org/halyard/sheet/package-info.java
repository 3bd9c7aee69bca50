/**
 * PDF map sheets, sheet series with an index sheet, and report pages (target tables, QC summary), drawn
 * with PDFBox as vectors where possible and rasters at print resolution.
 *
 * <p>Page coordinates are PDF points (1/72 inch) with the origin at the lower-left corner of the page;
 * ground coordinates are easting x and northing y in metres of the survey's projected CRS. Maps are drawn
 * grid-north up.
 *
 * <p>Must not depend on GeoTools types: CRS facts come through {@link org.halyard.io.ProjectedCrs}, which
 * returns plain values. Colour ramps and stretches come from {@code org.halyard.render}; this package
 * does not define its own.
 */
package org.halyard.sheet;
