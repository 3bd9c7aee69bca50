package org.halyard.sheet;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.halyard.io.CsvTableReader;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

/**
 * Reads the tables sheets are made from: a target list (the {@code targets.csv} of {@code halyard run}),
 * lines as WKT ({@code linear_features.csv}) and a route as ordered x, y rows. Coordinates are metres in
 * the sheet CRS.
 */
public final class SheetInputs {

    /** Most target-table columns printed on a report page; the rest are left to the CSV. */
    static final List<String> TABLE_COLUMNS = List.of("id", "x", "y", "class", "depth_below_sensor_m", "burial_m",
            "amplitude", "moment_am2", "mass_kg_min", "mass_kg_max", "asset");

    private SheetInputs() {
    }

    /** Targets and the table of their columns read from one CSV. */
    public record Targets(List<TargetMark> marks, TableModel table) { }

    /**
     * Reads a target CSV with at least columns {@code id, x, y, class}; the report table keeps the columns
     * of {@link #TABLE_COLUMNS} that are present, in that order.
     */
    public static Targets targets(Path file) {
        try (CsvTableReader r = CsvTableReader.open(file)) {
            int id = r.column("id"), x = r.column("x"), y = r.column("y"), cls = r.column("class");
            List<Integer> cols = new ArrayList<>();
            List<String> names = new ArrayList<>();
            for (String n : TABLE_COLUMNS) {
                int c = r.findColumn(n);
                if (c >= 0) {
                    cols.add(c);
                    names.add(n);
                }
            }
            List<TargetMark> marks = new ArrayList<>();
            List<List<String>> rows = new ArrayList<>();
            while (r.next()) {
                marks.add(new TargetMark(r.text(id).toString(), r.number(x), r.number(y), r.text(cls).toString()));
                List<String> row = new ArrayList<>();
                for (int c : cols) {
                    row.add(r.isEmpty(c) ? "" : r.text(c).toString());
                }
                rows.add(row);
            }
            return new Targets(marks, new TableModel("Target list", names, rows, List.of(
                    "Coordinates in metres of the survey CRS. Depths positive down, metres; amplitude in the"
                            + " units of the picked grid; mass as a range for an equivalent steel sphere.")));
        }
    }

    /**
     * Reads a QC summary from a CSV with columns {@code check, value} and optional {@code limit, verdict};
     * rows whose check is {@code note} become notes (their value is the text).
     */
    public static QcSummary qc(Path file) {
        List<QcSummary.Check> checks = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        try (CsvTableReader r = CsvTableReader.open(file)) {
            int name = r.column("check"), value = r.column("value");
            int limit = r.findColumn("limit"), verdict = r.findColumn("verdict");
            while (r.next()) {
                String n = r.text(name).toString();
                String v = cell(r, value);
                if (n.equalsIgnoreCase("note")) {
                    notes.add(v);
                } else {
                    checks.add(new QcSummary.Check(n, v, cell(r, limit), cell(r, verdict)));
                }
            }
        }
        return new QcSummary(checks, notes);
    }

    private static String cell(CsvTableReader r, int col) {
        return col < 0 || r.isEmpty(col) ? "" : r.text(col).toString();
    }

    /** Reads LINESTRING geometries from the {@code wkt} column of a CSV. */
    public static List<Polyline> wktLines(Path file) {
        List<Polyline> out = new ArrayList<>();
        WKTReader wkt = new WKTReader();
        try (CsvTableReader r = CsvTableReader.open(file)) {
            int col = r.column("wkt");
            while (r.next()) {
                Geometry g;
                try {
                    g = wkt.read(r.text(col).toString());
                } catch (ParseException e) {
                    throw new IllegalArgumentException(file + ": line " + r.lineNumber() + ": column wkt: "
                            + e.getMessage());
                }
                for (int i = 0; i < g.getNumGeometries(); i++) {
                    if (g.getGeometryN(i) instanceof LineString ls && ls.getNumPoints() >= 2) {
                        out.add(toPolyline(ls.getCoordinates()));
                    }
                }
            }
        }
        return out;
    }

    /** Reads a route as the {@code x, y} columns of a CSV, in row order. */
    public static Polyline route(Path file) {
        List<double[]> pts = new ArrayList<>();
        try (CsvTableReader r = CsvTableReader.open(file)) {
            int x = r.column("x"), y = r.column("y");
            while (r.next()) {
                pts.add(new double[] {r.number(x), r.number(y)});
            }
        }
        if (pts.size() < 2) {
            throw new IllegalArgumentException(file + ": a route needs at least two x, y rows");
        }
        double[] xs = new double[pts.size()], ys = new double[pts.size()];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = pts.get(i)[0];
            ys[i] = pts.get(i)[1];
        }
        return new Polyline(xs, ys);
    }

    private static Polyline toPolyline(Coordinate[] cs) {
        double[] xs = new double[cs.length], ys = new double[cs.length];
        for (int i = 0; i < cs.length; i++) {
            xs[i] = cs[i].x;
            ys[i] = cs[i].y;
        }
        return new Polyline(xs, ys);
    }
}
