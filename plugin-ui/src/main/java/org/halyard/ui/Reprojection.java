package org.halyard.ui;

import java.util.ArrayList;
import java.util.List;
import org.halyard.io.CrsTransforms;
import org.halyard.io.FeatureLayer;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;

/** Brings a vector layer into the map CRS, point by point (vertices only; no densification). */
final class Reprojection {

    private Reprojection() {
    }

    /** {@code layer} in {@code mapCrs}; the same object when the CRS already matches or the map has none. */
    static FeatureLayer toMap(FeatureLayer layer, String mapCrs) {
        if (mapCrs == null || mapCrs.equalsIgnoreCase(layer.crsCode())) {
            return layer;
        }
        CrsTransforms.PointTransform t = CrsTransforms.between(layer.crsCode(), mapCrs);
        List<FeatureLayer.Feature> out = new ArrayList<>();
        for (FeatureLayer.Feature f : layer.features()) {
            Geometry g = f.geometry().copy();
            g.apply(new CoordinateSequenceFilter() {
                @Override
                public void filter(CoordinateSequence seq, int i) {
                    double[] p = t.apply(seq.getX(i), seq.getY(i));
                    seq.setOrdinate(i, 0, p[0]);
                    seq.setOrdinate(i, 1, p[1]);
                }

                @Override
                public boolean isDone() {
                    return false;
                }

                @Override
                public boolean isGeometryChanged() {
                    return true;
                }
            });
            out.add(new FeatureLayer.Feature(f.id(), g, f.attributes()));
        }
        return new FeatureLayer(layer.name(), layer.geometryType(), mapCrs, layer.columns(), out);
    }
}
