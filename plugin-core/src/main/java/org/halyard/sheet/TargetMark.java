package org.halyard.sheet;

/**
 * One target to mark on the map.
 *
 * @param id          label written beside the symbol
 * @param x           easting, metres
 * @param y           northing, metres
 * @param targetClass class whose symbol is drawn ({@code discrete}, {@code linear} or any other name)
 */
public record TargetMark(String id, double x, double y, String targetClass) {

    public TargetMark {
        if (id == null || targetClass == null || !Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("target needs an id, a class and finite coordinates, got " + id);
        }
    }
}
