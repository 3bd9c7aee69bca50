package org.halyard.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Locale;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.testing.ExternalTools;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

class GridRendererTest {

    private static final GridGeometry G = new GridGeometry(5, 3, 0, 30, 10, null);

    @Test
    void knownValueGetsTheRampColourAtItsPosition() {
        // values 0..140 row-major; cell (2, 1) holds 70, the middle of a min-max stretch, so it must be drawn
        // with SHOAL at 0.5, which is exactly its third control point (five points at 0, .25, .5, .75, 1).
        float[] v = new float[15];
        for (int i = 0; i < v.length; i++) {
            v[i] = 10 * i;
        }
        Grid g = Grid.of(G, v);
        BufferedImage img = GridRenderer.render(g, style(g));
        assertThat(img.getWidth()).isEqualTo(5);
        assertThat(img.getHeight()).isEqualTo(3);
        assertThat(img.getRGB(2, 1)).isEqualTo(Oklab.toArgb(Oklab.fromLch(0.60, 0.085, 165)));
        assertThat(img.getRGB(0, 0)).isEqualTo(ColourRamp.SHOAL.argb(0)); // north-west cell, value 0
        assertThat(img.getRGB(4, 2)).isEqualTo(ColourRamp.SHOAL.argb(1)); // south-east cell, value 140
    }

    @Test
    @Tag("external")
    void middleOfShoalMatchesAnIndependentNumpyConversion() {
        // Ottosson 2020 OKLab -> linear sRGB -> IEC 61966-2-1 encoding, written again in NumPy.
        ExternalTools.require(ExternalTools.PYTHON);
        String py = String.join("\n",
                "import numpy as np",
                "L,C,h=0.60,0.085,np.radians(165)",
                "lab=np.array([L,C*np.cos(h),C*np.sin(h)])",
                "M1=np.array([[1,0.3963377774,0.2158037573],[1,-0.1055613458,-0.0638541728],[1,-0.0894841775,-1.2914855480]])",
                "M2=np.array([[4.0767416621,-3.3077115913,0.2309699292],[-1.2684380046,2.6097574011,-0.3413193965],[-0.0041960863,-0.7034186147,1.7076147010]])",
                "rgb=M2@((M1@lab)**3)",
                "enc=np.where(rgb<=0.0031308,12.92*rgb,1.055*np.power(np.clip(rgb,0,1),1/2.4)-0.055)",
                "print(' '.join(str(int(round(c*255))) for c in enc))");
        String[] out = ExternalTools.run(List.of(ExternalTools.PYTHON, "-c", py), null).orFail().trim().split(" ");
        int rgb = ColourRamp.SHOAL.argb(0.5);
        assertThat(String.format(Locale.ROOT, "%d %d %d", (rgb >> 16) & 255, (rgb >> 8) & 255, rgb & 255))
                .isEqualTo(String.join(" ", out));
    }

    @Test
    void blanksAreTransparent() {
        float[] v = new float[15];
        v[7] = Float.NaN;
        Grid g = Grid.of(G, v);
        assertThat(GridRenderer.render(g, style(g)).getRGB(2, 1) >>> 24).isZero();
    }

    @Test
    void shadingDarkensTheSideAwayFromTheSun() {
        // A ridge running north-south along column 4 of 9: with the sun in the west, the west flank
        // (column 2) is drawn brighter than the east flank (column 6), although both have the same value.
        GridGeometry geo = new GridGeometry(9, 5, 0, 50, 10, null);
        Grid ridge = Grid.sample(geo, (x, y) -> 100 - 2 * Math.abs(x - 45));
        RasterStyle s = new RasterStyle(ColourRamp.PEWTER, new LinearStretch(0, 200, "fixed"),
                new Shading(new SunPosition(270, 30), 1, 1));
        BufferedImage img = GridRenderer.render(ridge, s);
        assertThat(ridge.get(2, 2)).isEqualTo(ridge.get(6, 2));
        assertThat(img.getRGB(2, 2) & 0xFF).isGreaterThan((img.getRGB(6, 2) & 0xFF) + 40);
    }

    @Test
    void windowsSampleEveryStepCellsAndClipToTheGrid() {
        float[] v = new float[15];
        for (int i = 0; i < v.length; i++) {
            v[i] = i;
        }
        Grid g = Grid.of(G, v);
        RasterStyle s = style(g);
        BufferedImage img = GridRenderer.render(g, s, new GridRenderer.Window(1, 0, 6, 3, 2));
        assertThat(img.getWidth()).isEqualTo(3);
        assertThat(img.getHeight()).isEqualTo(2);
        assertThat(img.getRGB(1, 1)).isEqualTo(s.ramp().argb(s.stretch().position(g.get(3, 2))));
        assertThat(img.getRGB(2, 0) >>> 24).as("column 5 lies outside the grid").isZero();
    }

    private static RasterStyle style(Grid g) {
        return new RasterStyle(ColourRamp.SHOAL, LinearStretch.minMax(g), Shading.NONE);
    }
}
