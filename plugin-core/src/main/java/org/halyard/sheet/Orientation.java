package org.halyard.sheet;

/** Which way up the paper is: portrait (long side vertical) or landscape (long side horizontal). */
public enum Orientation {
    PORTRAIT,
    LANDSCAPE;

    /** Parses {@code portrait} or {@code landscape}, any case. */
    public static Orientation parse(String s) {
        return Paper.parseEnum(Orientation.class, s, "orientation");
    }
}
