package org.halyard.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.halyard.grid.Grid;
import org.halyard.grid.GridRows;
import org.halyard.io.GeoTiffGrids;
import org.halyard.model.FieldDirection;
import org.halyard.spectral.FilterBank;
import org.halyard.spectral.FilterOperation;
import org.halyard.spectral.FilterSettings;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code halyard filter OP IN.tif OUT.tif}: one wavenumber filter on a GeoTIFF grid. */
@Command(name = "filter", description = {"Run one potential-field filter on a total-field GeoTIFF (nT).",
        "OP: reduce-to-pole | upward | downward | vertical-derivative | dx | dy | total-horizontal-gradient",
        "    | analytic-signal | tilt | tilt-horizontal-derivative"})
final class FilterCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "OP", description = "The filter (see above).")
    String op;

    @Parameters(index = "1", paramLabel = "IN.tif", description = "Input grid: float GeoTIFF, projected CRS in metres.")
    Path in;

    @Parameters(index = "2", paramLabel = "OUT.tif", description = "Output grid (float32 GeoTIFF).")
    Path out;

    @Option(names = "--inclination", paramLabel = "DEG", description = "Earth-field inclination, degrees, positive down.")
    Double inclination;

    @Option(names = "--declination", paramLabel = "DEG", description = "Earth-field declination, degrees clockwise from north.")
    Double declination;

    @Option(names = "--magnetisation-inclination", paramLabel = "DEG",
            description = "Source magnetisation inclination, degrees; default: induced (along the field).")
    Double magInclination;

    @Option(names = "--magnetisation-declination", paramLabel = "DEG",
            description = "Source magnetisation declination, degrees; default: induced.")
    Double magDeclination;

    @Option(names = "--height", paramLabel = "M", defaultValue = "1",
            description = "Continuation distance in metres (upward: above the grid; downward: below). Default ${DEFAULT-VALUE}.")
    double height;

    @Option(names = "--order", paramLabel = "N", defaultValue = "1",
            description = "Vertical-derivative order, fractional allowed. Default ${DEFAULT-VALUE}.")
    double order;

    @Option(names = "--damping", paramLabel = "A", defaultValue = "0.001",
            description = "Downward-continuation damping; the gain stays below 1/(2 sqrt(A)). Default ${DEFAULT-VALUE}.")
    double damping;

    @Option(names = "--stabilising-inclination", paramLabel = "DEG", defaultValue = "20",
            description = "Reduction to pole: inclination below which the amplitude is stabilised. Default ${DEFAULT-VALUE}.")
    double stabilising;

    @Option(names = "--pad-factor", paramLabel = "F", defaultValue = "1.5",
            description = "Padded size over grid size per side, at least 1.5. Default ${DEFAULT-VALUE}.")
    double padFactor;

    @Override
    public Integer call() {
        FilterOperation operation = FilterOperation.ofCliName(op);
        FieldDirection field = FieldDirection.ofOptional(inclination, declination, "--inclination and --declination");
        FieldDirection mag = FieldDirection.ofOptional(magInclination, magDeclination, "--magnetisation-inclination and --magnetisation-declination");
        if (operation == FilterOperation.REDUCE_TO_POLE && field == null) {
            throw new IllegalArgumentException("reduce-to-pole needs --inclination and --declination (degrees)");
        }
        FilterSettings settings = new FilterSettings(field, mag, height, order, damping, stabilising, padFactor);
        // The file's values are read straight into the transform's rows, and the filter works in that array.
        GridRows grid = GeoTiffGrids.open(in);
        TerminalProgress bar = new TerminalProgress(operation.cliName());
        Grid result = FilterBank.once(grid, settings).apply(operation, bar);
        GeoTiffGrids.write(result, out);
        bar.done();
        System.err.println("wrote " + out + " (" + operation.title() + ", " + operation.unit() + ")");
        return 0;
    }
}
