package org.halyard.targets;

/**
 * A range of steel masses consistent with a magnetic moment.
 *
 * @param minKg    lightest: an elongated body magnetised along its length, kg
 * @param sphereKg a permeable steel sphere, kg
 * @param maxKg    heaviest: an elongated body magnetised across its length, kg
 */
public record MassRange(double minKg, double sphereKg, double maxKg) {
}
