package org.halyard.sheet;

/**
 * What a sheet series must cover: everything in the map content, a rectangle, or a corridor along a route.
 */
public sealed interface Coverage {

    /** The extent of all layers of the request. */
    record AllContent() implements Coverage { }

    /**
     * A rectangle, metres in the sheet CRS.
     *
     * @param xmin west easting
     * @param ymin south northing
     * @param xmax east easting
     * @param ymax north northing
     */
    record Area(double xmin, double ymin, double xmax, double ymax) implements Coverage {
        public Area {
            if (!(xmax > xmin) || !(ymax > ymin)) {
                throw new IllegalArgumentException("coverage area must have xmax > xmin and ymax > ymin");
            }
        }
    }

    /**
     * A corridor of {@code halfWidth} metres either side of a route.
     *
     * @param route     route line, metres in the sheet CRS
     * @param halfWidth metres, positive
     */
    record Corridor(Polyline route, double halfWidth) implements Coverage {
        public Corridor {
            if (route == null || !(halfWidth > 0)) {
                throw new IllegalArgumentException("a corridor needs a route line and a positive half-width in m");
            }
        }
    }
}
