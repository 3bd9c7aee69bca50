package org.halyard.model;

/**
 * The induced moment of a compact steel object, modelled as a highly permeable sphere, and the inverse
 * (mass from moment) used to report target masses.
 *
 * <p><b>Algorithm:</b> a sphere of permeability much larger than mu0 in a uniform field H0 = B0 / mu0 takes
 * a magnetisation M = 3 H0 (textbook magnetostatics; demagnetising factor 1/3), so its moment is
 * m = 3 V B0 / mu0 with V = mass / 7850 kg/m3 (DOMAIN.md, forward models).
 *
 * <p><b>Limitations:</b> real objects are elongated and carry remanence, so a mass from a moment is an
 * order of magnitude, to be reported as a range.
 */
public final class SteelSphere {

    /** Density of steel, kg/m3 (common practice). */
    public static final double STEEL_DENSITY = 7850;
    /** Permeability of free space, T m / A (4 pi 1e-7, the pre-2019 SI exact value). */
    public static final double MU0 = 4e-7 * Math.PI;

    private SteelSphere() {
    }

    /**
     * Induced moment of a steel sphere, A m2.
     *
     * @param massKg  mass of steel, kg, non-negative
     * @param fieldNt Earth-field intensity, nT
     */
    public static double inducedMoment(double massKg, double fieldNt) {
        if (!(massKg >= 0) || !(fieldNt > 0)) {
            throw new IllegalArgumentException("mass must be >= 0 kg and field > 0 nT, got " + massKg + " kg, "
                    + fieldNt + " nT");
        }
        return 3 * (massKg / STEEL_DENSITY) * fieldNt * 1e-9 / MU0;
    }

    /**
     * Mass of the steel sphere whose induced moment is {@code momentAm2}, kg (inverse of
     * {@link #inducedMoment}).
     *
     * @param momentAm2 moment, A m2
     * @param fieldNt   Earth-field intensity, nT
     */
    public static double massForMoment(double momentAm2, double fieldNt) {
        if (!(momentAm2 >= 0) || !(fieldNt > 0)) {
            throw new IllegalArgumentException("moment must be >= 0 A m2 and field > 0 nT, got " + momentAm2
                    + " A m2, " + fieldNt + " nT");
        }
        return momentAm2 * MU0 * STEEL_DENSITY / (3 * fieldNt * 1e-9);
    }
}
