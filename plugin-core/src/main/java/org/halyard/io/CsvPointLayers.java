package org.halyard.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * Reads a CSV table with a header as a point layer (targets, track samples, picks).
 *
 * <p>Coordinate columns are found by name, case-insensitive: {@code x}/{@code y}, {@code easting}/
 * {@code northing} or {@code e}/{@code n} in the given projected CRS; else {@code lon}/{@code lat}
 * ({@code longitude}/{@code latitude}) in WGS 84. Every other column becomes an attribute (REAL where all
 * values are numbers).
 *
 * <p><b>Limitations:</b> holds the whole table in memory, as the map must.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class CsvPointLayers {

    private static final String[][] PROJECTED = {{"x", "y"}, {"easting", "northing"}, {"e", "n"}};
    private static final String[][] GEOGRAPHIC = {{"lon", "lat"}, {"longitude", "latitude"}};

    private CsvPointLayers() {
    }

    /**
     * Reads {@code file}.
     *
     * @param crsCode CRS of projected coordinate columns, for example {@code EPSG:32631}
     * @throws IllegalArgumentException naming the file (and line and column) when no coordinate columns are
     *     found or a coordinate is not a number
     */
    public static FeatureLayer read(Path file, String crsCode) {
        GeometryFactory gf = new GeometryFactory();
        List<Geometry> geoms = new ArrayList<>();
        List<Map<String, Object>> props = new ArrayList<>();
        String crs;
        try (CsvTableReader r = CsvTableReader.open(file)) {
            int[] xy = find(r, PROJECTED);
            crs = crsCode;
            if (xy == null) {
                xy = find(r, GEOGRAPHIC);
                crs = CrsTransforms.WGS84;
            }
            if (xy == null) {
                throw new IllegalArgumentException(file + ": no coordinate columns; name them x,y or easting,northing"
                        + " (or lon,lat); the header has " + r.header());
            }
            List<String> header = r.header();
            while (r.next()) {
                geoms.add(gf.createPoint(new Coordinate(r.number(xy[0]), r.number(xy[1]))));
                Map<String, Object> p = new LinkedHashMap<>();
                for (int c = 0; c < header.size(); c++) {
                    if (c != xy[0] && c != xy[1] && c < r.fieldCount()) {
                        p.put(header.get(c), r.isEmpty(c) ? null : r.text(c).toString());
                    }
                }
                props.add(p);
            }
        }
        return FeatureTables.build(LayerNames.of(file), crs, geoms, props);
    }

    private static int[] find(CsvTableReader r, String[][] pairs) {
        for (String[] pair : pairs) {
            int x = r.findColumn(pair[0]), y = r.findColumn(pair[1]);
            if (x >= 0 && y >= 0) {
                return new int[] {x, y};
            }
        }
        return null;
    }
}
