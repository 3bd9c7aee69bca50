package org.halyard.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.model.Dipole;
import org.halyard.model.FieldDirection;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Hillshade against GDAL's {@code gdaldem hillshade}, which uses the same Horn gradient. */
@Tag("external")
class HillshadeGdalTest {

    @Test
    void matchesGdaldemOnADipoleField(@TempDir Path dir) throws IOException {
        ExternalTools.require("gdaldem");
        GridGeometry geo = new GridGeometry(40, 30, 500_000, 6_000_000, 1, null);
        FieldDirection f = new FieldDirection(66, 1.5);
        Dipole d = Dipole.along(500_020, 5_999_985, 4, 2000, f);
        Grid field = Grid.sample(geo, (x, y) -> d.totalField(x, y, 0, f));
        Path asc = dir.resolve("field.asc");
        writeAsciiGrid(field, asc);
        SunPosition sun = new SunPosition(300, 35);
        double z = 0.2;
        ExternalTools.run(List.of("gdaldem", "hillshade", "-q", "-of", "AAIGrid", "-az", "300", "-alt", "35",
                "-z", String.valueOf(z), asc.toString(), dir.resolve("shade.asc").toString()), dir).orFail();
        double[][] gdal = readAsciiGrid(dir.resolve("shade.asc"), geo.columns(), geo.rows());
        float[] ours = Hillshade.shade(field, sun, z);
        int compared = 0;
        for (int r = 1; r < geo.rows() - 1; r++) {
            for (int c = 1; c < geo.columns() - 1; c++) {
                // GDAL writes 1 + 254 cos(angle), 1 where unlit (gdaldem_lib.cpp; from memory, checked here)
                double expected = gdal[r][c];
                double mine = ours[geo.index(c, r)] <= 0 ? 1 : 1 + 254 * ours[geo.index(c, r)];
                assertThat(mine).as("cell %d,%d", c, r).isCloseTo(expected, org.assertj.core.api.Assertions.within(1.0));
                compared++;
            }
        }
        assertThat(compared).isEqualTo(38 * 28);
    }

    private static void writeAsciiGrid(Grid g, Path p) throws IOException {
        StringBuilder sb = new StringBuilder();
        GridGeometry geo = g.geometry();
        sb.append("ncols ").append(geo.columns()).append("\nnrows ").append(geo.rows())
                .append("\nxllcorner ").append(geo.west()).append("\nyllcorner ").append(geo.south())
                .append("\ncellsize ").append(geo.cellSize()).append("\nNODATA_value -99999\n");
        for (int r = 0; r < geo.rows(); r++) {
            for (int c = 0; c < geo.columns(); c++) {
                sb.append(String.format(Locale.ROOT, "%.9g ", g.get(c, r)));
            }
            sb.append('\n');
        }
        Files.writeString(p, sb);
    }

    private static double[][] readAsciiGrid(Path p, int cols, int rows) throws IOException {
        List<String> lines = Files.readAllLines(p);
        double[][] out = new double[rows][cols];
        int r = 0;
        for (String line : lines) {
            String t = line.trim();
            if (t.isEmpty() || Character.isLetter(t.charAt(0))) {
                continue;
            }
            String[] parts = t.split("\\s+");
            for (int c = 0; c < cols; c++) {
                out[r][c] = Double.parseDouble(parts[c]);
            }
            r++;
        }
        assertThat(r).isEqualTo(rows);
        return out;
    }
}
