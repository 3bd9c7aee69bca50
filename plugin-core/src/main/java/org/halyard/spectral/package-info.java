/**
 * The wavenumber-domain engine and the potential-field filters built on it: continuation, vertical and
 * horizontal derivatives, reduction to the pole, and the maps derived from them (analytic signal, tilt).
 *
 * <p>One engine serves every filter ({@link org.halyard.spectral.GridSpectrum}): trend removal, blank
 * infill, padding with a tapered mirror extension, a real 2-D FFT from JTransforms, re-blanking. A filter is
 * only a {@link org.halyard.spectral.WavenumberResponse}. Depends on {@code org.halyard.grid},
 * {@code org.halyard.model} and JTransforms; never on GeoTools.
 *
 * <p>Conventions: x east, y north, z down; wavenumbers in rad/m with F(d/dx) = i kx, F(d/dy) = i ky
 * (Blakely 1995, ch. 12), k = sqrt(kx^2 + ky^2).
 */
package org.halyard.spectral;
