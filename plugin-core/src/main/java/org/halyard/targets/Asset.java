package org.halyard.targets;

import org.locationtech.jts.geom.Geometry;

/**
 * A charted infrastructure feature (cable, pipeline, wellhead, charted wreck) in the survey's CRS.
 *
 * @param id       the feature's identifier in the infrastructure layer
 * @param geometry its geometry, x easting and y northing in metres of the survey's CRS (reproject at I/O)
 */
public record Asset(String id, Geometry geometry) {

    public Asset {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("infrastructure feature needs a non-empty id");
        }
        if (geometry == null || geometry.isEmpty()) {
            throw new IllegalArgumentException("infrastructure feature " + id + " has no geometry");
        }
    }
}
