package org.halyard.sheet;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.halyard.io.ProjectedCrs;

/**
 * Writes a series of numbered map sheets and its index sheet, one PDF file each.
 *
 * <p>Steps: plan the page layout; choose the scale (given, or fitted: {@link SheetOptions}); tile the
 * coverage ({@link AreaTiler}, {@link CorridorTiler}); draw every sheet with a key map, then the index
 * sheet at the largest standard scale that shows every footprint.
 *
 * <p><b>Thread safety:</b> stateless; one call writes its own files.
 */
public final class SheetSeries {

    private SheetSeries() {
    }

    /**
     * Writes {@code index.pdf} and {@code sheet-01.pdf}, {@code sheet-02.pdf} ... into {@code dir}
     * (created if missing). A sheet file has one page per raster layer, in layer order, each with every
     * vector layer and target.
     *
     * @return the files and footprints written
     * @throws IllegalArgumentException for a bad request (unknown CRS, nothing to map, panel too big)
     * @throws UncheckedIOException     when a file cannot be written
     */
    public static SheetSet write(SheetRequest request, Path dir) {
        SeriesPlan plan = SeriesPlan.of(request);
        ProjectedCrs crs = plan.crs();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create sheet folder " + dir + ": " + e.getMessage(), e);
        }
        List<Path> files = new ArrayList<>();
        int n = plan.footprints().size();
        String digits = n > 99 ? "%03d" : "%02d";
        for (SheetFootprint fp : plan.footprints()) {
            MapWindow w = MapWindow.centred(fp.centreX(), fp.centreY(), plan.layout().frame(), plan.scale());
            String label = String.format(Locale.ROOT, "SHEET %d OF %d", fp.number(), n);
            KeyMap key = new KeyMap(plan.footprints(), fp.number(), plan.coverageLines());
            List<MapSheetPage> pages = new ArrayList<>();
            for (SheetRequest view : request.perRaster()) {
                String layer = view.content().rasters().isEmpty() ? ""
                        : " | " + view.content().rasters().get(0).name();
                pages.add(new MapSheetPage(request.options().format(), plan.layout(), w,
                        SheetBlocks.of(view, crs, label, w, key), view.content(), crs, request.options().dpi(),
                        request.options().graticule(), List.of(),
                        footer(request, "Sheet " + fp.number() + " of " + n + layer)));
            }
            Path file = dir.resolve(String.format(Locale.ROOT, "sheet-" + digits + ".pdf", fp.number()));
            save(file, pages);
            files.add(file);
        }
        Path index = dir.resolve("index.pdf");
        writeIndex(request, plan, index);
        return new SheetSet(index, files, plan.footprints(), plan.scale());
    }

    private static void writeIndex(SheetRequest full, SeriesPlan plan, Path file) {
        SheetRequest request = full.withoutRasters();
        double[] e = Footprints.extent(plan.footprints());
        double pad = 0.03 * Math.max(e[2] - e[0], e[3] - e[1]);
        SheetLayout layout = plan.indexLayout();
        PageRect f = layout.frame();
        int scale = StandardScales.fit(e[2] - e[0] + 2 * pad, e[3] - e[1] + 2 * pad, f.width(), f.height());
        MapWindow w = MapWindow.centred((e[0] + e[2]) / 2, (e[1] + e[3]) / 2, f, scale);
        int n = plan.footprints().size();
        String label = n == 1 ? "INDEX TO SHEET 1" : "INDEX TO SHEETS 1-" + n;
        List<PanelBlock> blocks = SheetBlocks.of(request, plan.crs(), label, w, null);
        save(file, List.of(new MapSheetPage(request.options().format(), layout, w, blocks, request.content(),
                plan.crs(), request.options().dpi(), request.options().graticule(), plan.footprints(),
                footer(request, "Index sheet"))));
    }

    private static String footer(SheetRequest r, String which) {
        return r.title().project() + " | " + r.title().area() + " | " + which + " | revision "
                + r.title().revision() + " | " + r.title().date();
    }

    private static void save(Path file, List<MapSheetPage> pages) {
        try (PDDocument doc = new PDDocument()) {
            doc.getDocumentInformation().setTitle(pages.get(0).footer());
            doc.getDocumentInformation().setCreator("Halyard");
            pages.forEach(p -> p.addTo(doc));
            doc.save(file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file + ": " + e.getMessage(), e);
        }
    }
}
