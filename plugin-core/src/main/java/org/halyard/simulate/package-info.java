/**
 * Forward-modelled surveys: {@link org.halyard.simulate.SurveySimulator} turns a
 * {@link org.halyard.simulate.Scenario} into survey lines, a base-station file, bathymetry, charted assets,
 * the truth and a recipe; {@link org.halyard.simulate.Detectability} answers survey-design questions.
 *
 * <p>Builds on {@code org.halyard.model} for the physics and {@code org.halyard.io} for the files; holds no
 * GeoTools or GeoPackage types itself.
 */
package org.halyard.simulate;
