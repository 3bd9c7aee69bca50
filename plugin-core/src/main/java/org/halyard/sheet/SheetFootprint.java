package org.halyard.sheet;

/**
 * The ground rectangle one numbered sheet of a series shows, grid north up.
 *
 * @param number sheet number, from 1
 * @param west   easting of the left edge, metres
 * @param south  northing of the bottom edge, metres
 * @param east   easting of the right edge, metres
 * @param north  northing of the top edge, metres
 */
public record SheetFootprint(int number, double west, double south, double east, double north) {

    public SheetFootprint {
        if (!(east > west) || !(north > south)) {
            throw new IllegalArgumentException("sheet " + number + " has an empty footprint");
        }
    }

    public double centreX() {
        return (west + east) / 2;
    }

    public double centreY() {
        return (south + north) / 2;
    }
}
