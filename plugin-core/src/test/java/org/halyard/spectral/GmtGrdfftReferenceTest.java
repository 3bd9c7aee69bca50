package org.halyard.spectral;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.io.GeoTiffGrids;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Upward continuation and first vertical derivative against GMT {@code grdfft} (-C and -D, which
 * multiply by exp(-k h) and by k) on the same grid, a dipole field (DipoleFilterTest's). GMT pads and
 * tapers its own way, so agreement is required on the interior only: RMS difference within 0.5% of the
 * peak.
 */
@Tag("external")
class GmtGrdfftReferenceTest {

    @TempDir
    Path dir;

    @Test
    void upwardContinuationAndVerticalDerivativeAgreeWithGmt() {
        ExternalTools.require("gmt");
        Grid obs = DipoleFilterTest.observed();
        Path in = dir.resolve("in.tif");
        GeoTiffGrids.write(obs, in);
        FilterBank bank = new FilterBank(obs, FilterSettings.defaults().withHeight(2));
        Grid up = bank.apply(FilterOperation.UPWARD, Progress.NONE);
        Grid vd = bank.apply(FilterOperation.VERTICAL_DERIVATIVE, Progress.NONE);
        // grdfft reading the GeoTIFF straight through GDAL (=gd) gave results that disagree with its own
        // netCDF path and with a cosine check here (GMT 6.4), so the grid is converted to netCDF first.
        Path nc = dir.resolve("in.nc");
        ExternalTools.run(List.of("gmt", "grdconvert", in + "=gd", nc.toString()), dir).orFail();
        assertThat(interiorDifference(up, gmt(nc, "-C2", "up"))).isLessThan(0.005);
        assertThat(interiorDifference(vd, gmt(nc, "-D", "vd"))).isLessThan(0.005);
    }

    /** Runs grdfft and reads its grid back through grd2xyz (x y z per node, rows north to south). */
    private float[] gmt(Path in, String option, String name) {
        Path out = dir.resolve(name + ".nc");
        ExternalTools.run(List.of("gmt", "grdfft", in.toString(), option, "-G" + out), dir).orFail();
        String xyz = ExternalTools.run(List.of("gmt", "grd2xyz", out.toString()), dir).orFail();
        GridGeometry g = DipoleFilterTest.GEOMETRY;
        float[] v = new float[g.size()];
        java.util.Arrays.fill(v, Float.NaN);
        for (String line : xyz.split("\n")) {
            String[] f = line.trim().split("\\s+");
            if (f.length < 3) {
                continue;
            }
            int c = (int) Math.round(g.column(Double.parseDouble(f[0])));
            int r = (int) Math.round(g.row(Double.parseDouble(f[1])));
            v[g.index(c, r)] = Float.parseFloat(f[2]);
        }
        return v;
    }

    private static double interiorDifference(Grid ours, float[] theirs) {
        GridGeometry g = ours.geometry();
        double se = 0, peak = 0;
        int n = 0;
        for (int r = g.rows() / 4; r < 3 * g.rows() / 4; r++) {
            for (int c = g.columns() / 4; c < 3 * g.columns() / 4; c++) {
                double t = theirs[g.index(c, r)];
                double d = ours.get(c, r) - t;
                se += d * d;
                peak = Math.max(peak, Math.abs(t));
                n++;
            }
        }
        return Math.sqrt(se / n) / peak;
    }
}
