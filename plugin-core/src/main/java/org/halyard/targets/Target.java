package org.halyard.targets;

import java.util.Optional;

/**
 * One characterised pick: a row of {@code targets.csv}.
 *
 * @param id               1-based, strongest pick first
 * @param x                easting, m (dipole fit where it succeeded, else Euler, else the pick)
 * @param y                northing, m
 * @param targetClass      discrete object or pick on a linear feature
 * @param depthBelowSensor depth of the source under the sensor level, m, positive down; {@code NaN} unknown
 * @param depthMethod      which estimate gave the depth: {@code dipole-fit}, {@code euler-si3},
 *                         {@code euler-si2} or {@code none}
 * @param burial           burial below the seabed (see {@link Burial})
 * @param amplitude        peak analytic signal, nT/m
 * @param euler            the Euler solution, if one was accepted
 * @param fit              the dipole fit, if one succeeded (discrete picks only)
 * @param mass             steel mass range from the fitted moment, if there is one
 * @param asset            matched infrastructure id, empty when none
 */
public record Target(int id, double x, double y, TargetClass targetClass, double depthBelowSensor,
                     String depthMethod, Burial burial, double amplitude, Optional<EulerSolution> euler,
                     Optional<DipoleFitResult> fit, Optional<MassRange> mass, Optional<String> asset) {

    /** Fitted moment magnitude, A m2; {@code NaN} without a fit. */
    public double momentAm2() {
        return fit.map(f -> f.dipole().moment()).orElse(Double.NaN);
    }
}
