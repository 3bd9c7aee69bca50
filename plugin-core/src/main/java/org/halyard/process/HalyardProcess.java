package org.halyard.process;

/**
 * Marker for the annotated bean classes that {@link HalyardProcessFactory} publishes as GeoTools processes.
 * List each implementation in {@code META-INF/services/org.halyard.process.HalyardProcess}.
 */
public interface HalyardProcess {
}
