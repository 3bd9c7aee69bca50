package org.halyard.sheet;

import java.util.List;

/**
 * Lines drawn over the rasters: survey tracks, a route, linear features, assets.
 *
 * @param name  legend label, e.g. {@code Planned route}
 * @param style stroke
 * @param lines ground polylines in the sheet CRS
 */
public record VectorLayer(String name, LineStyle style, List<Polyline> lines) {

    public VectorLayer {
        if (name == null || name.isBlank() || style == null) {
            throw new IllegalArgumentException("a vector layer needs a name and a line style");
        }
        lines = List.copyOf(lines);
    }
}
