package org.halyard.sheet;

/**
 * Everything a sheet series is made from.
 *
 * @param title    job title for the title blocks
 * @param crsCode  the projected CRS of every layer, e.g. {@code EPSG:32631}
 * @param content  map layers
 * @param coverage what the series must cover
 * @param options  paper, scale, overlap, resolution, graticule
 */
public record SheetRequest(SheetTitle title, String crsCode, MapContent content, Coverage coverage,
                           SheetOptions options) {

    public SheetRequest {
        if (title == null || content == null || coverage == null || options == null) {
            throw new IllegalArgumentException("sheet request needs a title, content, coverage and options");
        }
        if (crsCode == null || crsCode.isBlank()) {
            throw new IllegalArgumentException("sheet request needs the CRS code of its layers, e.g. EPSG:32631");
        }
    }

    /** A request covering all of {@code content} with {@link SheetOptions#defaults()}. */
    public static SheetRequest of(SheetTitle title, String crsCode, MapContent content) {
        return new SheetRequest(title, crsCode, content, new Coverage.AllContent(), SheetOptions.defaults());
    }

    /**
     * One request per raster layer, each with all vectors and targets, so that every grid gets its own page
     * (rasters are opaque: stacked, only the top one would show); the request itself when it has at most
     * one raster.
     */
    java.util.List<SheetRequest> perRaster() {
        if (content.rasters().size() <= 1) {
            return java.util.List.of(this);
        }
        return content.rasters().stream().map(r -> new SheetRequest(title, crsCode, new MapContent(
                java.util.List.of(r), content.vectors(), content.targets()), coverage, options)).toList();
    }

    /** The same request without its raster layers: the index sheet shows the sheet layout, not the data. */
    SheetRequest withoutRasters() {
        return new SheetRequest(title, crsCode, new MapContent(java.util.List.of(), content.vectors(),
                content.targets()), coverage, options);
    }
}
