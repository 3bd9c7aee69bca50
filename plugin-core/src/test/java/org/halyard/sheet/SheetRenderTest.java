package org.halyard.sheet;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Renders sheets and report pages with poppler's pdftoppm (an independent PDF renderer) and keeps the PNGs
 * in {@code target/sheet-previews} for a person to look at.
 */
@Tag("external")
class SheetRenderTest {

    static final Path OUT = Path.of("target", "sheet-previews");

    @Test
    void popplerRendersEverySheetAtPageSize() throws IOException {
        ExternalTools.require("pdftoppm");
        Files.createDirectories(OUT);
        List<Path> pdfs = new ArrayList<>();
        SheetSet a3 = SheetSeries.write(SheetFixture.request(new Coverage.AllContent(),
                SheetOptions.defaults().withScale(1000).withGraticule(true)), OUT.resolve("a3"));
        pdfs.add(a3.sheets().get(0));
        pdfs.add(a3.index());
        SheetSet a4 = SheetSeries.write(SheetFixture.request(new Coverage.Corridor(SheetFixture.route(), 20),
                SheetOptions.defaults().withFormat(new PageFormat(Paper.A4, Orientation.PORTRAIT)).withScale(1000)),
                OUT.resolve("a4"));
        pdfs.add(a4.sheets().get(0));
        pdfs.add(a4.index());
        Path table = OUT.resolve("targets.pdf");
        ReportPages.write(ReportPagesTest.targets(80), SheetFixture.title(),
                new PageFormat(Paper.A4, Orientation.PORTRAIT), table);
        pdfs.add(table);
        int dpi = 100;
        for (Path pdf : pdfs) {
            String stem = OUT.relativize(pdf).toString().replace('/', '-').replace(".pdf", "");
            Path png = OUT.resolve(stem);
            ExternalTools.run(List.of("pdftoppm", "-r", String.valueOf(dpi), "-png", "-singlefile",
                    pdf.toString(), png.toString()), null).orFail();
            BufferedImage img = ImageIO.read(OUT.resolve(stem + ".png").toFile());
            float[] size = pageSize(pdf);
            // Pixels = points / 72 * dpi (PDF points are 1/72 inch); poppler rounds up.
            assertThat(img.getWidth()).isBetween((int) (size[0] / 72 * dpi) - 1, (int) (size[0] / 72 * dpi) + 2);
            assertThat(img.getHeight()).isBetween((int) (size[1] / 72 * dpi) - 1, (int) (size[1] / 72 * dpi) + 2);
            assertThat(distinctColours(img)).as("%s is not blank", stem).isGreaterThan(20);
        }
    }

    private static float[] pageSize(Path pdf) throws IOException {
        try (var d = org.apache.pdfbox.Loader.loadPDF(pdf.toFile())) {
            var b = d.getPage(0).getMediaBox();
            return new float[] {b.getWidth(), b.getHeight()};
        }
    }

    private static long distinctColours(BufferedImage img) {
        java.util.Set<Integer> c = new java.util.HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 3) {
            for (int x = 0; x < img.getWidth(); x += 3) {
                c.add(img.getRGB(x, y));
            }
        }
        return c.size();
    }
}
