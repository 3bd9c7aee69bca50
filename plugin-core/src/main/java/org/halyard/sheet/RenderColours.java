package org.halyard.sheet;

import org.halyard.render.ColourRamp;
import org.halyard.render.Stretch;

/**
 * A {@link ColourScale} from the shared {@code org.halyard.render} ramp and stretch, so that sheets show
 * the same colours as the workbench.
 *
 * @param ramp    colour ramp over positions 0 to 1
 * @param stretch value (layer unit) to ramp position, and back for the colour bar labels
 */
public record RenderColours(ColourRamp ramp, Stretch stretch) implements ColourScale {

    public RenderColours {
        if (ramp == null || stretch == null) {
            throw new IllegalArgumentException("a colour scale needs a ramp and a stretch");
        }
    }

    /** The colour scale of {@code ramp} under {@code stretch}. */
    public static RenderColours of(ColourRamp ramp, Stretch stretch) {
        return new RenderColours(ramp, stretch);
    }

    @Override
    public int rgb(double value) {
        return ramp.argb(stretch.position(value)) & 0xFFFFFF;
    }

    @Override
    public double valueAt(double fraction) {
        return stretch.value(fraction);
    }
}
