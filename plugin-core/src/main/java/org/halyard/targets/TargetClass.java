package org.halyard.targets;

/** What a pick is taken to be. */
public enum TargetClass {
    /** A compact object: ordnance, anchor, debris. */
    DISCRETE,
    /** A pick on a linear feature: cable, pipeline, chain. */
    LINEAR;

    /** The label written in outputs: {@code discrete} or {@code linear}. */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
