package org.halyard.survey;

/**
 * Where a traverse line crosses a tie line, and what each measured there.
 *
 * @param traverseLine  index of the traverse line
 * @param tieLine       index of the tie line
 * @param x             easting of the intersection, m
 * @param y             northing of the intersection, m
 * @param traverseTime  time on the traverse line at the intersection, epoch seconds
 * @param tieTime       time on the tie line, epoch seconds
 * @param traverseValue field on the traverse line, interpolated in time, nT
 * @param tieValue      field on the tie line, interpolated in time, nT
 */
public record Crossover(int traverseLine, int tieLine, double x, double y, double traverseTime, double tieTime,
                        double traverseValue, double tieValue) {

    /** The misfit traverse minus tie, nT. */
    public double misfit() {
        return traverseValue - tieValue;
    }
}
