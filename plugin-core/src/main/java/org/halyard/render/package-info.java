/**
 * Turning grids into pictures: Halyard's own colour ramps, value stretches, hillshading and a renderer
 * from {@link org.halyard.grid.Grid} to {@link java.awt.image.BufferedImage}. Shared by the map sheets and
 * the desktop workbench so that a grid looks the same on paper and on screen.
 *
 * <p>Pure Java2D image code: depends on the JDK and {@code org.halyard.grid} only, never on Swing,
 * GeoTools or PDFBox. Method notes and references are in {@code docs/rendering.md}.
 */
package org.halyard.render;
