package org.halyard.targets;

import org.halyard.model.SteelSphere;

/**
 * Moment to mass for steel objects magnetised by the Earth's field.
 *
 * <p><b>Algorithm:</b> a body of infinite permeability in a uniform field B0 takes the magnetisation
 * M = H0 / N along a principal axis with demagnetising factor N, so m = V B0 / (mu0 N); for a sphere
 * N = 1/3 and m = 3 V B0 / mu0 (textbook magnetostatics, DOMAIN.md; Jackson, Classical Electrodynamics,
 * 3rd ed., section 5.12 for the sphere). The mass is rho V with rho = 7850 kg/m3 for steel. The range spans
 * prolate spheroids of aspect ratio 1 to {@code maxAspect} in any orientation: magnetised along the long
 * axis (smallest N, lightest) to across it (N near 1/2, heaviest), {@link SpheroidDemagnetisation}.
 *
 * <p><b>Limitations:</b> remanent magnetisation is ignored (it can make an object look heavier or lighter
 * by a factor of several); thin-walled objects (shells, pipes) weigh less than a solid body of the same
 * outline; susceptibility is taken as infinite.
 *
 * @param densityKgM3 density of the steel, kg/m3
 * @param maxAspect   the most elongated body considered, length / diameter, at least 1
 */
public record SteelMassModel(double densityKgM3, double maxAspect) {

    /** Solid steel (7850 kg/m3, DOMAIN.md), bodies up to five times longer than wide (assumed). */
    public static final SteelMassModel DEFAULT = new SteelMassModel(SteelSphere.STEEL_DENSITY, 5);

    public SteelMassModel {
        if (!(densityKgM3 > 0)) {
            throw new IllegalArgumentException("steel density must be positive kg/m3, got " + densityKgM3);
        }
        if (!(maxAspect >= 1)) {
            throw new IllegalArgumentException("maximum aspect ratio must be at least 1, got " + maxAspect);
        }
    }

    /**
     * The mass range for moment {@code momentAm2} (A m2) induced by a main field of {@code fieldNt} nT.
     */
    public MassRange massRange(double momentAm2, double fieldNt) {
        // The sphere (N = 1/3) from the model package, scaled to this density and to N = 1.
        double perN = 3 * SteelSphere.massForMoment(Math.abs(momentAm2), fieldNt) * densityKgM3 / SteelSphere.STEEL_DENSITY;
        return new MassRange(perN * SpheroidDemagnetisation.axial(maxAspect), perN / 3,
                perN * SpheroidDemagnetisation.transverse(maxAspect));
    }

    /** The assumptions, one sentence, for output metadata. */
    public String assumptions() {
        return "mass = density x V with m = V B0 / (mu0 N): infinitely permeable solid steel (" + densityKgM3
                + " kg/m3), prolate spheroids of length/diameter 1 to " + maxAspect
                + " in any orientation (demagnetising factor N from Osborn 1945), induced magnetisation only"
                + " (remanence ignored), sphere value m = 3 V B0 / mu0";
    }
}
