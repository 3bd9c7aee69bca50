package org.halyard.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.io.FeatureLayer;
import org.halyard.io.GeoPackageWriter;
import org.halyard.io.GeoTiffGrids;
import org.halyard.model.Dipole;
import org.halyard.model.DipoleLine;
import org.halyard.model.FieldDirection;
import org.halyard.model.SteelSphere;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * A small fictional harbour survey for workbench tests, forward-modelled with {@code org.halyard.model}
 * (fixed positions, no randomness): a total-field grid with three steel objects and a charted cable, a
 * bathymetry grid, and a GeoPackage with targets, tracks and infrastructure.
 */
public final class DemoFiles {

    public static final String CRS = "EPSG:32631";
    public static final double WEST = 500_000, NORTH = 6_000_300, CELL = 1.0;
    public static final FieldDirection FIELD = new FieldDirection(66, 1.5);
    static final double[][] OBJECTS = {{500_060, 6_000_220, 1000}, {500_150, 6_000_120, 250}, {500_200, 6_000_240, 60}};

    private DemoFiles() {
    }

    private static Grid totalField;

    /** Writes the files into {@code dir} and returns them: total field, bathymetry, GeoPackage. */
    public static List<Path> write(Path dir) throws Exception {
        Files.createDirectories(dir);
        Grid tf = totalField();
        Grid bathy = Grid.sample(tf.geometry(), (x, y) -> 6 + 0.02 * (x - WEST) + 0.8 * Math.sin((y - NORTH) / 25));
        Path tfPath = dir.resolve("total_field.tif");
        Path bathyPath = dir.resolve("bathymetry.tif");
        GeoTiffGrids.write(tf, tfPath);
        GeoTiffGrids.write(bathy, bathyPath);
        Path gpkg = dir.resolve("halyard.gpkg");
        GeoPackageWriter.write(gpkg, List.of(targets(), tracks(), infrastructure()), Instant.parse("2026-05-14T00:00:00Z"));
        return List.of(tfPath, bathyPath, gpkg);
    }

    /** The forward-modelled field, computed once per test JVM (the cable sum is the slow part). */
    private static synchronized Grid totalField() {
        if (totalField != null) {
            return totalField;
        }
        GridGeometry geo = new GridGeometry(260, 200, WEST, NORTH, CELL, CRS);
        List<Dipole> ds = new ArrayList<>();
        for (double[] o : OBJECTS) {
            ds.add(Dipole.along(o[0], o[1], 5, SteelSphere.inducedMoment(o[2], 49_000), FIELD));
        }
        // the cable as a chain of dipoles 2 m apart (the limit DipoleLine refines; coarse is enough for a picture)
        double perMetre = DipoleLine.inducedMomentPerMetre(20, 49_000);
        for (int k = 0; k <= 139; k++) {
            double t = k / 139.0;
            ds.add(Dipole.along(500_000 + 260 * t, 6_000_160 - 100 * t, 6, perMetre * 2.0, FIELD));
        }
        totalField = Grid.sample(geo, (x, y) -> {
            double v = 0;
            for (Dipole d : ds) {
                v += d.totalField(x, y, 0, FIELD);
            }
            return v;
        });
        return totalField;
    }

    private static FeatureLayer targets() {
        GeometryFactory gf = new GeometryFactory();
        List<FeatureLayer.Feature> fs = new ArrayList<>();
        for (int i = 0; i < OBJECTS.length; i++) {
            fs.add(new FeatureLayer.Feature(i + 1, gf.createPoint(new Coordinate(OBJECTS[i][0], OBJECTS[i][1])),
                    Map.of("class", "discrete", "amplitude", 40.0 / (i + 1), "mass_kg_min", OBJECTS[i][2] * 0.5)));
        }
        fs.add(new FeatureLayer.Feature(4, gf.createPoint(new Coordinate(500_130, 6_000_110)),
                Map.of("class", "linear", "amplitude", 8.0, "mass_kg_min", 0.0)));
        return new FeatureLayer("targets", "Point", CRS, List.of(
                new FeatureLayer.Column("class", FeatureLayer.ColumnType.TEXT),
                new FeatureLayer.Column("amplitude", FeatureLayer.ColumnType.REAL),
                new FeatureLayer.Column("mass_kg_min", FeatureLayer.ColumnType.REAL)), fs);
    }

    private static FeatureLayer tracks() {
        GeometryFactory gf = new GeometryFactory();
        List<FeatureLayer.Feature> fs = new ArrayList<>();
        for (int i = 0; i < 9; i++) {
            double y = NORTH - 20 - i * 20;
            fs.add(new FeatureLayer.Feature(i + 1, gf.createLineString(new Coordinate[] {
                new Coordinate(WEST + 5, y), new Coordinate(WEST + 255, y + 2)}), Map.of("line", "L" + (i + 1))));
        }
        return new FeatureLayer("tracks", "LineString", CRS,
                List.of(new FeatureLayer.Column("line", FeatureLayer.ColumnType.TEXT)), fs);
    }

    private static FeatureLayer infrastructure() {
        GeometryFactory gf = new GeometryFactory();
        return new FeatureLayer("infrastructure", "LineString", CRS,
                List.of(new FeatureLayer.Column("asset", FeatureLayer.ColumnType.TEXT)),
                List.of(new FeatureLayer.Feature(1, gf.createLineString(new Coordinate[] {
                    new Coordinate(500_000, 6_000_160), new Coordinate(500_260, 6_000_060)}),
                        Map.of("asset", "Skerrow export cable"))));
    }
}
