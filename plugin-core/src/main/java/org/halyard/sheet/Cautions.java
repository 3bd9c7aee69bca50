package org.halyard.sheet;

/**
 * The safety cautions printed on every map sheet and report page.
 */
public final class Cautions {

    /** The caution text, printed in full. */
    public static final String TEXT = "A target list and these sheets are an aid to interpretation, never a"
            + " clearance certificate. Magnetometry detects ferrous material only: an area without targets is"
            + " not shown to be free of hazards. Defer to local regulations, qualified explosive-ordnance"
            + " specialists and licensed practice before any intrusive work.";

    private Cautions() {
    }

    /** The cautions as a panel block. */
    static PanelBlock block() {
        return new PanelBlock() {
            private static final float PT = 6.2f;

            @Override
            public String heading() {
                return "CAUTION";
            }

            @Override
            public float bodyHeight(float width) {
                return TextWrap.height(TEXT, width, PT, false);
            }

            @Override
            public void drawBody(SheetCanvas c, PageRect body) {
                c.begin("Cautions");
                c.fill(0x7A1010);
                TextWrap.draw(c, TEXT, body, PT, false);
                c.end();
            }
        };
    }
}
