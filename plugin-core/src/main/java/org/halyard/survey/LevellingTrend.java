package org.halyard.survey;

/** The form of the correction fitted to each line by tie-line levelling. */
public enum LevellingTrend {
    /** No levelling. */
    NONE(-1),
    /** A constant per line. */
    CONSTANT(0),
    /** A constant and a linear drift in time per line. */
    LINEAR(1),
    /** Up to a quadratic in time per line. */
    QUADRATIC(2);

    private final int order;

    LevellingTrend(int order) {
        this.order = order;
    }

    /** Polynomial order, -1 for none. */
    public int order() {
        return order;
    }
}
