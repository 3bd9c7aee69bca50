package org.halyard.survey;

/**
 * Bit flags set on individual sensor samples by the processing stages. A sample can carry several.
 */
public final class SampleFlags {

    /** The reading was a spike (fourth-difference test) and was replaced by interpolation. */
    public static final byte SPIKE = 1;
    /** No base-station data within the gap limit: no diurnal correction, value left NaN. */
    public static final byte BASE_GAP = 2;
    /** The reading itself was missing (empty or NaN cell). */
    public static final byte MISSING = 4;
    /** The line had no crossover with a tie line, so no levelling correction was applied. */
    public static final byte UNLEVELLED = 8;

    private SampleFlags() {
    }

    /** The flag names set in {@code f}, joined by '|', or the empty string. */
    public static String describe(byte f) {
        StringBuilder sb = new StringBuilder();
        append(sb, f, SPIKE, "spike");
        append(sb, f, BASE_GAP, "base_gap");
        append(sb, f, MISSING, "missing");
        append(sb, f, UNLEVELLED, "unlevelled");
        return sb.toString();
    }

    private static void append(StringBuilder sb, byte f, byte bit, String name) {
        if ((f & bit) != 0) {
            if (sb.length() > 0) {
                sb.append('|');
            }
            sb.append(name);
        }
    }
}
