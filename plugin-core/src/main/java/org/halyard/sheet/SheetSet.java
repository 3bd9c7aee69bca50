package org.halyard.sheet;

import java.nio.file.Path;
import java.util.List;

/**
 * The files a sheet series was written to.
 *
 * @param index            the index sheet
 * @param sheets           numbered sheets, sheet 1 first
 * @param footprints       ground rectangle of each numbered sheet
 * @param scaleDenominator the scale used
 */
public record SheetSet(Path index, List<Path> sheets, List<SheetFootprint> footprints, int scaleDenominator) {

    public SheetSet {
        sheets = List.copyOf(sheets);
        footprints = List.copyOf(footprints);
    }
}
