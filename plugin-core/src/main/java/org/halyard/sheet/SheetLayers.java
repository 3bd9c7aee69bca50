package org.halyard.sheet;

import java.util.Locale;
import org.halyard.grid.Grid;
import org.halyard.render.ColourRamp;
import org.halyard.render.HistogramStretch;
import org.halyard.render.LinearStretch;
import org.halyard.render.Stretch;

/**
 * Default names, units and colours for the layers a survey delivers, shared by {@code halyard sheet} and
 * the {@code run} pipeline so that both print the same sheets.
 *
 * <p>Signed layers (tilt in degrees, and any grid with both signs in strength, such as derivatives) get the
 * diverging {@link ColourRamp#WAKE} ramp, stretched symmetrically so zero is its centre; one-signed layers
 * get {@link ColourRamp#SHOAL} between the 2nd and 98th percentiles.
 */
public final class SheetLayers {

    /** Share of the larger side a grid's other sign must reach to count as signed. */
    static final double SIGNED_SHARE = 0.2;

    private SheetLayers() {
    }

    /** How values are stretched onto the ramp. */
    public enum StretchKind { LINEAR, HISTOGRAM }

    /**
     * A raster layer with the default colours for its unit and values.
     *
     * @param name display name, e.g. {@code Analytic signal}
     * @param unit {@code nT}, {@code nT/m}, {@code degrees} ...
     */
    public static RasterLayer raster(String name, Grid grid, String unit, StretchKind kind) {
        double[] r = grid.range();
        if (Double.isNaN(r[0])) {
            throw new IllegalArgumentException("grid '" + name + "' has no values to draw (every cell blank)");
        }
        boolean signed = unit.startsWith("deg")
                || (r[0] < 0 && r[1] > 0 && Math.min(-r[0], r[1]) > SIGNED_SHARE * Math.max(-r[0], r[1]));
        Stretch s;
        if (kind == StretchKind.HISTOGRAM) {
            s = HistogramStretch.of(grid);
        } else {
            s = signed ? LinearStretch.symmetric(grid, 98) : LinearStretch.percentiles(grid, 2, 98);
        }
        return new RasterLayer(name, grid, unit, RenderColours.of(signed ? ColourRamp.WAKE : ColourRamp.SHOAL, s));
    }

    /** A display name from a file stem: {@code analytic_signal} becomes {@code Analytic signal}. */
    public static String displayName(String stem) {
        String s = stem.replace('_', ' ').replace('-', ' ').trim();
        return s.isEmpty() ? "Layer" : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /**
     * The unit of a Halyard grid from its file stem ({@code halyard run} names): derivatives, gradients and
     * the analytic signal in nT/m, tilt in degrees, bathymetry in metres, anything else nT.
     */
    public static String unitFromName(String stem) {
        String s = stem.toLowerCase(Locale.ROOT);
        if (s.contains("tilt")) {
            return "degrees";
        }
        if (s.contains("bathym") || s.contains("depth")) {
            return "m";
        }
        if (s.contains("analytic") || s.contains("deriv") || s.contains("gradient") || s.matches(".*\\bd[xyz]\\b.*")
                || s.matches("(^|.*_)d[xyz]($|_.*)")) {
            return "nT/m";
        }
        return "nT";
    }
}
