package org.halyard.model;

/**
 * A direction given by inclination and declination, used for the Earth's field and for magnetisation.
 *
 * <p>Inclination is in degrees, positive <b>down</b> from the horizontal (about +66 in the North Sea);
 * declination in degrees clockwise from true (grid) north. The unit vector in the project frame
 * (x east, y north, z down) is {@code (cos I sin D, cos I cos D, sin I)}.
 *
 * @param inclinationDeg inclination in degrees, -90 to 90, positive down
 * @param declinationDeg declination in degrees, clockwise from north
 */
public record FieldDirection(double inclinationDeg, double declinationDeg) {

    /** The vertical field at the north magnetic pole: inclination 90, declination 0. */
    public static final FieldDirection POLE = new FieldDirection(90, 0);

    public FieldDirection {
        if (!(Math.abs(inclinationDeg) <= 90)) {
            throw new IllegalArgumentException("inclination must be between -90 and 90 degrees, got " + inclinationDeg);
        }
        if (!Double.isFinite(declinationDeg)) {
            throw new IllegalArgumentException("declination must be finite, got " + declinationDeg);
        }
    }

    /** East component of the unit vector (dimensionless). */
    public double east() {
        return Math.cos(Math.toRadians(inclinationDeg)) * Math.sin(Math.toRadians(declinationDeg));
    }

    /** North component of the unit vector (dimensionless). */
    public double north() {
        return Math.cos(Math.toRadians(inclinationDeg)) * Math.cos(Math.toRadians(declinationDeg));
    }

    /** Down component of the unit vector (dimensionless, positive down). */
    public double down() {
        return Math.sin(Math.toRadians(inclinationDeg));
    }

    /** The unit vector {@code {east, north, down}}. */
    public double[] unitVector() {
        return new double[] {east(), north(), down()};
    }

    /**
     * The direction of two optional angles in degrees, as user inputs give them: null when both are
     * absent.
     *
     * @param names how to name the pair in the error, e.g. {@code "--inclination and --declination"}
     * @throws IllegalArgumentException when only one of the two is given
     */
    public static FieldDirection ofOptional(Double inclinationDeg, Double declinationDeg, String names) {
        if (inclinationDeg == null && declinationDeg == null) {
            return null;
        }
        if (inclinationDeg == null || declinationDeg == null) {
            throw new IllegalArgumentException("give both " + names + " (degrees)");
        }
        return new FieldDirection(inclinationDeg, declinationDeg);
    }

    /**
     * The direction of a vector given in the project frame (x east, y north, z down); any length but zero.
     */
    public static FieldDirection ofVector(double east, double north, double down) {
        double h = Math.hypot(east, north);
        if (h == 0 && down == 0) {
            throw new IllegalArgumentException("zero vector has no direction");
        }
        double inc = Math.toDegrees(Math.atan2(down, h));
        double dec = h == 0 ? 0 : Math.toDegrees(Math.atan2(east, north));
        return new FieldDirection(inc, dec);
    }
}
