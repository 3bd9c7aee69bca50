package org.halyard.spectral;

import org.halyard.model.FieldDirection;

/**
 * The parameters of the wavenumber filters, grouped so that operators take one value.
 *
 * @param field                     Earth-field direction, or null when unknown (needed by reduction to pole)
 * @param magnetisation             source magnetisation direction; null means induced (along the field)
 * @param heightM                   continuation distance in metres (upward: above the grid; downward:
 *                                  below it), at least 0
 * @param order                     vertical-derivative order, positive, fractional allowed
 * @param damping                   downward-continuation damping (dimensionless), positive
 * @param stabilisingInclinationDeg inclination (degrees) below which reduction to pole is stabilised
 * @param padFactor                 padded size over grid size per side, at least 1.5
 */
public record FilterSettings(FieldDirection field, FieldDirection magnetisation, double heightM, double order,
                             double damping, double stabilisingInclinationDeg, double padFactor) {

    /** Default downward damping: caps the gain near 16 (see {@link Responses#downward}). */
    public static final double DEFAULT_DAMPING = 1e-3;

    /** Default stabilising inclination for reduction to pole, degrees (our choice; see docs/filters.md). */
    public static final double DEFAULT_STABILISING_INCLINATION = 20;

    /** Defaults: no field, height 0, first order, default damping and stabilisation, 1.5x padding. */
    public static FilterSettings defaults() {
        return new FilterSettings(null, null, 0, 1, DEFAULT_DAMPING, DEFAULT_STABILISING_INCLINATION,
                GridSpectrum.MIN_PAD_FACTOR);
    }

    public FilterSettings withField(FieldDirection f) {
        return new FilterSettings(f, magnetisation, heightM, order, damping, stabilisingInclinationDeg, padFactor);
    }

    public FilterSettings withMagnetisation(FieldDirection m) {
        return new FilterSettings(field, m, heightM, order, damping, stabilisingInclinationDeg, padFactor);
    }

    public FilterSettings withHeight(double h) {
        return new FilterSettings(field, magnetisation, h, order, damping, stabilisingInclinationDeg, padFactor);
    }

    public FilterSettings withOrder(double n) {
        return new FilterSettings(field, magnetisation, heightM, n, damping, stabilisingInclinationDeg, padFactor);
    }

    public FilterSettings withDamping(double a) {
        return new FilterSettings(field, magnetisation, heightM, order, a, stabilisingInclinationDeg, padFactor);
    }

    /** The magnetisation direction, the field's when none is given (induced). */
    public FieldDirection magnetisationOrField() {
        return magnetisation != null ? magnetisation : field;
    }
}
