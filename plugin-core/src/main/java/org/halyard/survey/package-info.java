/**
 * Survey line processing: the columnar line model, positioning of each sensor, diurnal correction from a
 * base station, spike cleaning, sensor-pair gradients, tie-line levelling and the QC summary and report.
 *
 * <p>Conventions for the whole package: x easting and y northing in metres of the recipe's projected CRS;
 * depth positive down, altitude positive up from the seabed, metres; fields in nT, gradients in nT/m;
 * headings in degrees clockwise from grid north; times in epoch seconds (UTC).
 *
 * <p>Depends on the JDK, JTS, Commons Math and {@code org.halyard.grid}/{@code org.halyard.model}; never on
 * GeoTools (file formats live in {@code org.halyard.io}, which builds the values this package takes).
 */
package org.halyard.survey;
