package org.halyard.sheet;

import java.util.ArrayList;
import java.util.List;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.halyard.render.ColourRamp;
import org.halyard.render.HistogramStretch;

/**
 * A small fictional survey ("Kelderbank cable approach", UTM zone 31N) for the sheet tests: a total-field
 * grid over three buried dipoles, a planned route and the targets at the dipoles.
 */
final class SheetFixture {

    static final String CRS = "EPSG:32631";
    static final FieldDirection FIELD = new FieldDirection(66, 1.5);
    /** Dipole positions (x, y, depth below sensor), metres; the targets sit on them. */
    static final double[][] SOURCES = {{512_123.4, 5_772_087.6, 2.5}, {512_310.0, 5_772_205.0, 3.0},
            {512_060.0, 5_772_240.0, 2.0}};

    private SheetFixture() {
    }

    static Grid totalField() {
        GridGeometry g = new GridGeometry(800, 600, 512_000, 5_772_300, 0.5, CRS);
        List<Dipole> ds = new ArrayList<>();
        for (double[] s : SOURCES) {
            ds.add(Dipole.along(s[0], s[1], s[2], 40, FIELD));
        }
        return Grid.sample(g, (x, y) -> ds.stream().mapToDouble(d -> d.totalField(x, y, 0, FIELD)).sum());
    }

    static MapContent content() {
        Grid tf = totalField();
        RasterLayer raster = new RasterLayer("Total field", tf, "nT",
                RenderColours.of(ColourRamp.named("shoal"), HistogramStretch.of(tf)));
        VectorLayer route = new VectorLayer("Planned cable route", LineStyle.dashed(0x111111, 1.2f, 6, 3),
                List.of(route()));
        List<TargetMark> marks = new ArrayList<>();
        for (int i = 0; i < SOURCES.length; i++) {
            marks.add(new TargetMark(String.format("T%03d", i + 1), SOURCES[i][0], SOURCES[i][1],
                    i == 2 ? "linear" : "discrete"));
        }
        return new MapContent(List.of(raster), List.of(route), marks);
    }

    static Polyline route() {
        return new Polyline(new double[] {511_980, 512_150, 512_260, 512_420},
                new double[] {5_772_020, 5_772_130, 5_772_160, 5_772_290});
    }

    static SheetTitle title() {
        return new SheetTitle("Kelderbank cable approach", "Nearshore block KB-2, fictional site", "2026-12-01", "B");
    }

    static SheetRequest request(Coverage coverage, SheetOptions options) {
        return new SheetRequest(title(), CRS, content(), coverage, options);
    }
}
