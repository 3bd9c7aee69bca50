package org.halyard.sheet;

/**
 * A paper size in an orientation.
 *
 * @param paper       ISO 216 size
 * @param orientation portrait or landscape
 */
public record PageFormat(Paper paper, Orientation orientation) {

    public PageFormat {
        if (paper == null || orientation == null) {
            throw new IllegalArgumentException("page format needs a paper size and an orientation");
        }
    }

    /** Page width in PDF points (1/72 inch). */
    public float widthPt() {
        int mm = orientation == Orientation.PORTRAIT ? paper.shortSideMm() : paper.longSideMm();
        return (float) (mm * Paper.POINTS_PER_MM);
    }

    /** Page height in PDF points (1/72 inch). */
    public float heightPt() {
        int mm = orientation == Orientation.PORTRAIT ? paper.longSideMm() : paper.shortSideMm();
        return (float) (mm * Paper.POINTS_PER_MM);
    }

    /** The whole page as a rectangle, points. */
    public PageRect page() {
        return new PageRect(0, 0, widthPt(), heightPt());
    }

    /** Short label such as {@code A3 landscape}. */
    public String label() {
        return paper + " " + orientation.name().toLowerCase(java.util.Locale.ROOT);
    }
}
