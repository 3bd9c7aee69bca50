/**
 * From grids and line samples to a target list: peak picking on the analytic signal, Euler deconvolution,
 * three-dimensional dipole fits, moment-to-mass ranges, burial below the seabed, linear features (cables,
 * pipelines, chains) and their matching to charted infrastructure. {@link org.halyard.targets.TargetAnalysis}
 * is the facade the pipeline calls.
 *
 * <p>Frame for the whole package: x east, y north, metres of a projected CRS; z and depth positive
 * <b>down</b>; fields in nT, gradients in nT/m, moments in A m2, angles in degrees at every interface.
 *
 * <p>Depends on {@code org.halyard.grid}, {@code org.halyard.model}, JTS and Commons Math; must not depend
 * on GeoTools, GeoPackage or any other Halyard package.
 */
package org.halyard.targets;
