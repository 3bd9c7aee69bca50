package org.halyard.ui.map;

import java.awt.geom.Path2D;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

/** JTS geometries to Java2D paths in map coordinates (metres); points are left to the symbol painter. */
final class FeatureShapes {

    private FeatureShapes() {
    }

    /** The lines and rings of {@code g} as one path (even-odd fill for holes); empty for points. */
    static Path2D.Double path(Geometry g) {
        Path2D.Double p = new Path2D.Double(Path2D.WIND_EVEN_ODD);
        add(p, g);
        return p;
    }

    private static void add(Path2D.Double p, Geometry g) {
        if (g instanceof Point) {
            return;
        }
        if (g instanceof LineString l) {
            line(p, l.getCoordinates(), false);
        } else if (g instanceof Polygon poly) {
            line(p, poly.getExteriorRing().getCoordinates(), true);
            for (int i = 0; i < poly.getNumInteriorRing(); i++) {
                line(p, poly.getInteriorRingN(i).getCoordinates(), true);
            }
        } else {
            for (int i = 0; i < g.getNumGeometries(); i++) {
                if (g.getGeometryN(i) != g) {
                    add(p, g.getGeometryN(i));
                }
            }
        }
    }

    private static void line(Path2D.Double p, Coordinate[] cs, boolean close) {
        for (int i = 0; i < cs.length; i++) {
            if (i == 0) {
                p.moveTo(cs[i].x, cs[i].y);
            } else {
                p.lineTo(cs[i].x, cs[i].y);
            }
        }
        if (close && cs.length > 0) {
            p.closePath();
        }
    }
}
