package org.halyard.sheet;

/**
 * One row of a legend: a small drawn sample and its label.
 *
 * @param label  text beside the sample
 * @param swatch draws the sample inside a small page rectangle
 */
public record LegendEntry(String label, Swatch swatch) {

    /** Draws a legend sample inside {@code r} (points). */
    @FunctionalInterface
    public interface Swatch {
        void draw(SheetCanvas c, PageRect r);
    }

    /** The entry for a vector layer: a short line in its style. */
    public static LegendEntry of(VectorLayer layer) {
        LineStyle s = layer.style();
        return new LegendEntry(layer.name(), (c, r) -> {
            c.stroke(s.rgb(), s.width(), s.dash());
            c.line(r.x(), r.y() + r.height() / 2, r.right(), r.y() + r.height() / 2);
        });
    }
}
