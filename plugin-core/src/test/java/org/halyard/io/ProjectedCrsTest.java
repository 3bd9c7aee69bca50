package org.halyard.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** CRS facts for sheets, checked against PROJ's command-line tools. */
class ProjectedCrsTest {

    static final ProjectedCrs UTM31 = ProjectedCrs.decode("EPSG:32631");

    @Test
    void namesDatumAndUnit() {
        // Names from the EPSG dataset (EPSG:32631, datum EPSG:6326).
        assertThat(UTM31.name()).isEqualTo("WGS 84 / UTM zone 31N");
        assertThat(UTM31.datum()).isEqualTo("World Geodetic System 1984");
        assertThat(UTM31.axisUnit()).isEqualTo("m");
    }

    @Test
    void geographicCrsIsRefused() {
        assertThatThrownBy(() -> ProjectedCrs.decode("EPSG:4326")).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("not a projected CRS");
    }

    @Test
    void convergenceOnTheCentralMeridianIsZero() {
        // Transverse Mercator: the central meridian (3 degrees E for zone 31) maps to grid north exactly
        // (Snyder 1987, Map Projections: A Working Manual, ch. 8).
        double[] p = UTM31.fromLonLat(3.0, 52.0);
        assertThat(p[0]).isCloseTo(500_000, within(1e-6));
        assertThat(UTM31.convergenceDeg(p[0], p[1])).isCloseTo(0, within(1e-9));
    }

    @Tag("external")
    @Test
    void convergenceMatchesProj() {
        ExternalTools.require("proj");
        for (double[] ll : new double[][] {{3.9, 52.1}, {1.2, 51.4}, {5.8, 60.0}, {0.5, 10.0}}) {
            String out = ExternalTools.run(List.of("sh", "-c", String.format(Locale.ROOT,
                    "echo '%s %s' | proj -V +proj=utm +zone=31 +datum=WGS84", ll[0], ll[1])), null).orFail();
            Matcher m = Pattern.compile("Convergence : .*\\[\\s*(-?[0-9.]+)\\s*]").matcher(out);
            assertThat(m.find()).as(out).isTrue();
            double[] p = UTM31.fromLonLat(ll[0], ll[1]);
            // PROJ 'proj -V' meridian convergence, degrees (same sign convention: positive east of the CM, north).
            assertThat(UTM31.convergenceDeg(p[0], p[1])).as("at %s", ll[0] + "," + ll[1])
                    .isCloseTo(Double.parseDouble(m.group(1)), within(1e-5));
        }
    }

    @Tag("external")
    @Test
    void inverseMatchesProj() {
        ExternalTools.require("proj");
        String out = ExternalTools.run(List.of("sh", "-c",
                "echo '512123.4 5772087.6' | proj -I -f %.9f +proj=utm +zone=31 +datum=WGS84"), null).orFail();
        String[] f = out.trim().split("\\s+");
        double[] ll = UTM31.toLonLat(512_123.4, 5_772_087.6);
        // PROJ inverse UTM; 1e-8 degree is about 1 mm.
        assertThat(ll[0]).isCloseTo(Double.parseDouble(f[0]), within(1e-8));
        assertThat(ll[1]).isCloseTo(Double.parseDouble(f[1]), within(1e-8));
    }
}
