package org.halyard.sheet;

/**
 * How sheets are printed.
 *
 * @param format           paper and orientation
 * @param scaleDenominator N of 1:N, or 0 to fit the coverage on one sheet at the largest standard scale
 *                         ({@link StandardScales}); for a corridor, 0 picks the largest standard scale at
 *                         which the corridor's width fits the frame's shorter side
 * @param overlap          overlap between neighbouring sheets, fraction of a sheet side, 0 to 0.5
 * @param dpi              raster resolution, dots per inch (300 is print resolution)
 * @param graticule        whether to draw latitude and longitude lines
 */
public record SheetOptions(PageFormat format, int scaleDenominator, double overlap, int dpi, boolean graticule) {

    public SheetOptions {
        if (format == null) {
            throw new IllegalArgumentException("sheet options need a page format");
        }
        if (scaleDenominator < 0) {
            throw new IllegalArgumentException("scale denominator must be positive (or 0 to fit), got "
                    + scaleDenominator);
        }
        if (!(overlap >= 0 && overlap <= 0.5)) {
            throw new IllegalArgumentException("sheet overlap must be 0 to 0.5, got " + overlap);
        }
        if (dpi < 36 || dpi > 1200) {
            throw new IllegalArgumentException("raster resolution must be 36 to 1200 dpi, got " + dpi);
        }
    }

    /** A3 landscape, fitted scale, 10% overlap, 300 dpi, no graticule. */
    public static SheetOptions defaults() {
        return new SheetOptions(new PageFormat(Paper.A3, Orientation.LANDSCAPE), 0, 0.1, 300, false);
    }

    public SheetOptions withFormat(PageFormat f) {
        return new SheetOptions(f, scaleDenominator, overlap, dpi, graticule);
    }

    public SheetOptions withScale(int denominator) {
        return new SheetOptions(format, denominator, overlap, dpi, graticule);
    }

    public SheetOptions withOverlap(double fraction) {
        return new SheetOptions(format, scaleDenominator, fraction, dpi, graticule);
    }

    public SheetOptions withDpi(int d) {
        return new SheetOptions(format, scaleDenominator, overlap, d, graticule);
    }

    public SheetOptions withGraticule(boolean g) {
        return new SheetOptions(format, scaleDenominator, overlap, dpi, g);
    }
}
