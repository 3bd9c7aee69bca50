package org.halyard.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.halyard.grid.Grid;
import org.halyard.io.GeoTiffGrids;
import org.halyard.sheet.Coverage;
import org.halyard.sheet.LineStyle;
import org.halyard.sheet.MapContent;
import org.halyard.sheet.Orientation;
import org.halyard.sheet.PageFormat;
import org.halyard.sheet.Paper;
import org.halyard.sheet.Polyline;
import org.halyard.sheet.RasterLayer;
import org.halyard.sheet.ReportPages;
import org.halyard.sheet.SheetInputs;
import org.halyard.sheet.SheetLayers;
import org.halyard.sheet.SheetOptions;
import org.halyard.sheet.SheetRequest;
import org.halyard.sheet.SheetSeries;
import org.halyard.sheet.SheetSet;
import org.halyard.sheet.SheetTitle;
import org.halyard.sheet.StandardScales;
import org.halyard.sheet.TargetMark;
import org.halyard.sheet.VectorLayer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code halyard sheet}: PDF map sheets, an index sheet and a target list from grids and tables. */
@Command(name = "sheet", description = {
        "Print PDF map sheets (numbered series with overlap, an index sheet) and a target list.",
        "A target list is an aid to interpretation, never a clearance certificate."})
final class SheetCommand implements Callable<Integer> {

    @Parameters(paramLabel = "GRID.tif", arity = "0..*", description = "GeoTIFF grids, drawn in order (first lowest).")
    List<Path> grids = new ArrayList<>();

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Folder for the PDFs.")
    Path out;

    @Option(names = "--units", split = ",", paramLabel = "UNIT",
            description = "Unit of each grid (nT, nT/m, degrees); default from the file name.")
    List<String> units = new ArrayList<>();

    @Option(names = "--histogram", description = "Stretch colours by histogram equalisation instead of linearly.")
    boolean histogram;

    @Option(names = "--targets", paramLabel = "FILE.csv", description = "Targets (id, x, y, class ...); also "
            + "printed as target-list.pdf.")
    Path targets;

    @Option(names = "--qc", paramLabel = "FILE.csv", description = "QC checks (check, value, limit, verdict);"
            + " printed as qc-summary.pdf.")
    Path qc;

    @Option(names = "--lines", paramLabel = "FILE.csv", description = "Lines in a 'wkt' column, e.g. "
            + "linear_features.csv; repeatable.")
    List<Path> lines = new ArrayList<>();

    @Option(names = "--route", paramLabel = "FILE.csv", description = "Route line as x, y rows.")
    Path route;

    @Option(names = "--corridor", paramLabel = "M", description = "Tile a corridor of M metres either side of"
            + " --route instead of the whole area.")
    Double corridor;

    @Option(names = "--paper", defaultValue = "A3", description = "A4, A3, A2, A1 or A0 (default ${DEFAULT-VALUE}).")
    String paper;

    @Option(names = "--orientation", defaultValue = "landscape", description = "portrait or landscape.")
    String orientation;

    @Option(names = "--scale", defaultValue = "fit", description = "1:1000, 1:2500 ... or fit (default).")
    String scale;

    @Option(names = "--overlap", defaultValue = "0.1", description = "Overlap between sheets, fraction of a sheet.")
    double overlap;

    @Option(names = "--dpi", defaultValue = "300", description = "Raster resolution (default ${DEFAULT-VALUE}).")
    int dpi;

    @Option(names = "--graticule", description = "Draw latitude and longitude lines.")
    boolean graticule;

    @Option(names = "--crs", paramLabel = "EPSG:n", description = "CRS of the layers; default that of the first grid.")
    String crs;

    @Option(names = "--project", defaultValue = "Halyard survey", description = "Project name for the title block.")
    String project;

    @Option(names = "--area", defaultValue = "", description = "Survey area for the title block.")
    String area;

    @Option(names = "--revision", defaultValue = "0", description = "Revision for the title block.")
    String revision;

    @Option(names = "--date", description = "Issue date for the title block (default today).")
    String date;

    @Override
    public Integer call() {
        if (!units.isEmpty() && units.size() != grids.size()) {
            throw new IllegalArgumentException("--units lists " + units.size() + " units for " + grids.size()
                    + " grids: give one per grid, in order");
        }
        List<RasterLayer> rasters = new ArrayList<>();
        String code = crs;
        for (int i = 0; i < grids.size(); i++) {
            Grid g = GeoTiffGrids.read(grids.get(i));
            String stem = stem(grids.get(i));
            String unit = units.isEmpty() ? SheetLayers.unitFromName(stem) : units.get(i);
            rasters.add(SheetLayers.raster(SheetLayers.displayName(stem), g, unit,
                    histogram ? SheetLayers.StretchKind.HISTOGRAM : SheetLayers.StretchKind.LINEAR));
            if (code == null) {
                code = g.geometry().crsCode();
            }
        }
        if (code == null) {
            throw new IllegalArgumentException("no CRS known: give --crs EPSG:n (the grids carry none)");
        }
        List<VectorLayer> vectors = new ArrayList<>();
        int[] colours = {0x1F4FB8, 0x7A3B00, 0x2E7D32};
        for (int i = 0; i < lines.size(); i++) {
            vectors.add(new VectorLayer(SheetLayers.displayName(stem(lines.get(i))),
                    LineStyle.solid(colours[i % colours.length], 1.1f), SheetInputs.wktLines(lines.get(i))));
        }
        Polyline routeLine = route == null ? null : SheetInputs.route(route);
        if (routeLine != null) {
            vectors.add(new VectorLayer("Route", LineStyle.dashed(0x111111, 1.2f, 6, 3), List.of(routeLine)));
        }
        SheetInputs.Targets t = targets == null ? null : SheetInputs.targets(targets);
        List<TargetMark> marks = t == null ? List.of() : t.marks();
        Coverage coverage = new Coverage.AllContent();
        if (corridor != null) {
            if (routeLine == null) {
                throw new IllegalArgumentException("--corridor needs --route FILE.csv");
            }
            coverage = new Coverage.Corridor(routeLine, corridor);
        }
        PageFormat format = new PageFormat(Paper.parse(paper), Orientation.parse(orientation));
        SheetOptions options = new SheetOptions(format, StandardScales.parse(scale), overlap, dpi, graticule);
        SheetTitle title = new SheetTitle(project, area, date, revision);
        SheetSet set = SheetSeries.write(new SheetRequest(title, code, new MapContent(rasters, vectors, marks),
                coverage, options), out);
        System.out.println(set.index());
        set.sheets().forEach(System.out::println);
        if (t != null) {
            Path list = out.resolve("target-list.pdf");
            ReportPages.write(t.table(), title, new PageFormat(Paper.A4, Orientation.LANDSCAPE), list);
            System.out.println(list);
        }
        if (qc != null) {
            Path page = out.resolve("qc-summary.pdf");
            ReportPages.write(SheetInputs.qc(qc).toTable(), title, new PageFormat(Paper.A4, Orientation.PORTRAIT),
                    page);
            System.out.println(page);
        }
        System.err.println("wrote " + set.sheets().size() + " sheet(s) at 1:" + set.scaleDenominator() + " and an index");
        return 0;
    }

    private static String stem(Path p) {
        String n = p.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }
}
