package org.halyard.sheet;

/**
 * One boxed item of a sheet's information panel (title, scale, north, colour bar, legend, key map,
 * cautions). {@link PanelFlow} stacks blocks into columns and draws the heading band; the block draws its
 * body.
 */
public interface PanelBlock {

    /** Heading printed in the block's band, upper case by convention. */
    String heading();

    /** Height the body needs at {@code width} points, points. */
    float bodyHeight(float width);

    /** Draws the body inside {@code body} (points). */
    void drawBody(SheetCanvas c, PageRect body);
}
