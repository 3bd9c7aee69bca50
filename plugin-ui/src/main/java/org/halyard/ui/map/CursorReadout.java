package org.halyard.ui.map;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.halyard.io.CrsTransforms;

/**
 * The texts of the status strip for a cursor position: map coordinates in the map CRS, latitude and
 * longitude (WGS 84, through {@link CrsTransforms}) and the value of the top visible grid.
 *
 * <p><b>Thread safety:</b> event thread only (caches the transform per CRS code).
 */
public final class CursorReadout {

    private final Map<String, CrsTransforms.PointTransform> toLonLat = new HashMap<>();

    /** "E 500 123.4  N 6 000 456.7 m  EPSG:32631". */
    public String mapText(double x, double y, String crsCode) {
        return String.format(Locale.ROOT, "E %s  N %s m  %s", group(x), group(y), crsCode == null ? "(no CRS)" : crsCode);
    }

    /** "54.123456° N  3.123456° E" (WGS 84), or a dash when the map has no CRS or the point is outside it. */
    public String latLonText(double x, double y, String crsCode) {
        if (crsCode == null) {
            return "lat/lon: no CRS";
        }
        double[] ll;
        try {
            ll = toLonLat.computeIfAbsent(crsCode, CrsTransforms::toLonLat).apply(x, y);
        } catch (IllegalArgumentException e) {
            return "lat/lon: " + e.getMessage();
        }
        if (Double.isNaN(ll[0])) {
            return "lat/lon: outside the projection";
        }
        return String.format(Locale.ROOT, "%.6f° %s  %.6f° %s  WGS 84", Math.abs(ll[1]), ll[1] >= 0 ? "N" : "S",
                Math.abs(ll[0]), ll[0] >= 0 ? "E" : "W");
    }

    /** "total_field 12.34 nT", "total_field: blank" or "" when there is no grid. */
    public static String valueText(GridLayer top, double x, double y) {
        if (top == null) {
            return "";
        }
        double v = top.cellValue(x, y);
        if (Double.isNaN(v)) {
            return top.name() + ": no value here";
        }
        return String.format(Locale.ROOT, "%s %.4g %s", top.name(), v, top.unit());
    }

    /** "1 : 2 500 (96 dpi)  0.26 m/px". */
    public static String scaleText(MapViewport v) {
        double d = v.scaleDenominator();
        // two significant figures: the readout is a guide, the scale bar is the measure
        double p = d >= 100 ? Math.pow(10, Math.floor(Math.log10(d)) - 1) : 1;
        double rounded = Math.round(d / p) * p;
        return String.format(Locale.ROOT, "1 : %s at 96 dpi   %.3g m per pixel", group0(rounded), v.metresPerPixel());
    }

    private static String group(double v) {
        return String.format(Locale.ROOT, "%,.1f", v).replace(',', ' ');
    }

    private static String group0(double v) {
        return String.format(Locale.ROOT, "%,.0f", v).replace(',', ' ');
    }
}
