package org.halyard.ui.map;

import java.util.Locale;

/** The unit of a grid guessed from its name, for readouts when the file does not say (common practice). */
final class UnitGuess {

    private UnitGuess() {
    }

    static String of(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        if (n.contains("tilt")) {
            return "degrees";
        }
        if (n.contains("bathy") || n.contains("depth") || n.contains("elevation")) {
            return "m";
        }
        if (n.contains("deriv") || n.contains("gradient") || n.contains("analytic") || n.matches(".*\\bd[xyz]\\b.*")) {
            return "nT/m";
        }
        return "nT";
    }
}
