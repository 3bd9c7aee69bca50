package org.halyard.process;

import java.util.List;

/**
 * One input or output of a process, described in plain Java types so that user interfaces can build a form
 * for it without touching GeoTools.
 *
 * @param name         parameter key passed to the process
 * @param title        short human title
 * @param description  longer help text
 * @param kind         what sort of editor fits it
 * @param type         the Java type the process expects (for {@link Kind#TEXT}, the type a text is converted to)
 * @param unit         unit from the parameter metadata {@code unit=...} (nT, nT/m, m, degrees), or "" when none
 * @param min          smallest allowed value from metadata {@code min}, {@code NaN} when unbounded
 * @param max          largest allowed value from metadata {@code max}, {@code NaN} when unbounded
 * @param defaultValue the default, or {@code null} when there is none (an optional "no value")
 * @param required     whether the process needs a value (minOccurs &gt; 0)
 * @param choices      constant names for {@link Kind#CHOICE}, empty otherwise
 */
public record ParameterSpec(String name, String title, String description, Kind kind, Class<?> type, String unit,
                            double min, double max, Object defaultValue, boolean required, List<String> choices) {

    /** Editor families. */
    public enum Kind {
        /** A raster: a {@link org.halyard.grid.Grid} is converted to the coverage the process takes. */
        GRID,
        /** A floating-point number, with unit and range. */
        NUMBER,
        /** A whole number, with unit and range. */
        INTEGER,
        /** True or false. */
        BOOLEAN,
        /** One constant of an enumeration. */
        CHOICE,
        /** A file or URL. */
        FILE,
        /** Anything else, typed as text and converted by GeoTools' converters (WKT, EPSG codes, strings). */
        TEXT
    }

    public ParameterSpec {
        choices = List.copyOf(choices);
        unit = unit == null ? "" : unit;
    }

    /** The title with its unit, for example "Height (m)". */
    public String label() {
        return unit.isEmpty() ? title : title + " (" + unit + ")";
    }

    /** Whether {@code value} is within {@code [min, max]} (bounds that are NaN do not constrain). */
    public boolean inRange(double value) {
        return !(value < min) && !(value > max);
    }
}
