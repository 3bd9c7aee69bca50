/**
 * Magnetic forward models and the Earth-field direction: point dipoles, dipole lines, prisms.
 *
 * <p>Frame for the whole package: x east, y north, z <b>down</b>, metres; moments in A m2; fields in nT.
 * Used by the simulator, by tests as closed-form truth, and by the target fitter. Depends only on the JDK.
 */
package org.halyard.model;
