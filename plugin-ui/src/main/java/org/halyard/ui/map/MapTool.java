package org.halyard.ui.map;

/** What a left-button drag on the map does. The wheel always zooms; shift-drag always box-zooms. */
public enum MapTool {
    /** Drag moves the map. */
    PAN("Move", "Drag to move the map; wheel to zoom; shift-drag to zoom to a box"),
    /** Drag a box to zoom into. */
    BOX_ZOOM("Zoom box", "Drag a box to zoom into it"),
    /** Click a target to select it. */
    SELECT("Pick target", "Click a target symbol to select it in the table"),
    /** Drag a line to profile the grids along it. */
    PROFILE("Profile line", "Drag a line across the grids to chart them along it");

    private final String label;
    private final String hint;

    MapTool(String label, String hint) {
        this.label = label;
        this.hint = hint;
    }

    public String label() {
        return label;
    }

    public String hint() {
        return hint;
    }
}
