package org.halyard.sheet;

import java.util.List;

/**
 * The map scales sheets are drawn at, and the choice of one that fits an extent on a map frame.
 *
 * <p>The list is the usual engineering-survey series (common practice): 1:200, 1:500, 1:1000, 1:2000,
 * 1:2500, 1:5000, 1:10000, 1:25000, 1:50000, 1:100000, 1:250000, 1:500000.
 */
public final class StandardScales {

    /** Scale denominators, largest scale (smallest denominator) first. */
    public static final List<Integer> DENOMINATORS =
            List.of(200, 500, 1000, 2000, 2500, 5000, 10000, 25000, 50000, 100000, 250000, 500000);

    private StandardScales() {
    }

    /**
     * The largest standard scale at which a ground extent fits a frame.
     *
     * @param groundWidth  extent along x, metres
     * @param groundHeight extent along y, metres
     * @param frameWidth   frame width on paper, points
     * @param frameHeight  frame height on paper, points
     * @return the scale denominator
     * @throws IllegalArgumentException when even the smallest scale is too large
     */
    public static int fit(double groundWidth, double groundHeight, double frameWidth, double frameHeight) {
        for (int d : DENOMINATORS) {
            double ppm = pointsPerMetre(d);
            if (groundWidth * ppm <= frameWidth && groundHeight * ppm <= frameHeight) {
                return d;
            }
        }
        throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                "an extent of %.0f x %.0f m does not fit one sheet even at 1:%d: choose a scale and tile it",
                groundWidth, groundHeight, DENOMINATORS.get(DENOMINATORS.size() - 1)));
    }

    /** Points of paper per metre of ground at 1:{@code denominator}: {@code 72 / 0.0254 / denominator}. */
    public static double pointsPerMetre(int denominator) {
        if (denominator <= 0) {
            throw new IllegalArgumentException("scale denominator must be positive, got " + denominator);
        }
        return 72.0 / 0.0254 / denominator;
    }

    /** Parses {@code 1:1000}, {@code 1000} or {@code fit} (returned as 0). */
    public static int parse(String s) {
        String t = s.trim();
        if (t.equalsIgnoreCase("fit")) {
            return 0;
        }
        if (t.startsWith("1:")) {
            t = t.substring(2);
        }
        try {
            int d = Integer.parseInt(t.replace("_", ""));
            if (d <= 0) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("scale '" + s + "' is not of the form 1:1000 or 'fit'");
        }
    }
}
