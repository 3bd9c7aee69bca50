package org.halyard.sheet;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** Paper sizes in points against ISO 216 millimetres. */
class PageFormatTest {

    @Test
    void isoSizesInPoints() {
        // ISO 216: A4 210 x 297 mm, A3 297 x 420 mm, A1 594 x 841 mm; 1 pt = 25.4 / 72 mm (PDF 32000-1, 8.3.2.3).
        PageFormat a4 = new PageFormat(Paper.A4, Orientation.PORTRAIT);
        assertThat(a4.widthPt()).isCloseTo(595.276f, within(0.001f));
        assertThat(a4.heightPt()).isCloseTo(841.890f, within(0.001f));
        PageFormat a3 = new PageFormat(Paper.A3, Orientation.LANDSCAPE);
        assertThat(Math.round(a3.widthPt())).isEqualTo(1191);
        assertThat(Math.round(a3.heightPt())).isEqualTo(842);
        PageFormat a1 = new PageFormat(Paper.A1, Orientation.PORTRAIT);
        assertThat(a1.widthPt()).isCloseTo(1683.780f, within(0.001f));
        assertThat(a1.heightPt()).isCloseTo(2383.937f, within(0.001f));
    }

    @Test
    void everyLayoutFitsTheDefaultPanel() {
        for (Paper p : Paper.values()) {
            for (Orientation o : Orientation.values()) {
                SheetLayout l = SheetLayout.plan(new PageFormat(p, o), java.util.List.of(Cautions.block()));
                assertThat(l.frame().width()).as("%s %s", p, o).isPositive();
                assertThat(l.border().contains(l.frame().x(), l.frame().y())).isTrue();
                assertThat(l.border().contains(l.frame().right(), l.frame().top())).isTrue();
            }
        }
    }

    @Test
    void unknownPaperNamesTheChoices() {
        assertThatThrownBy(() -> Paper.parse("B5")).hasMessageContaining("a4");
        assertThatThrownBy(() -> StandardScales.parse("1:abc")).hasMessageContaining("1:1000");
    }
}
