package org.halyard.ui.toolbox;

import javax.swing.JComponent;

/** The editor of one process parameter in a generated form. */
interface FieldEditor {

    /** The Swing component to place in the form. */
    JComponent component();

    /**
     * The entered value in the form the invoker takes (Grid, Double, Long, Boolean, enum name, Path, text),
     * or {@code null} when left empty.
     *
     * @throws IllegalArgumentException naming the parameter for an entry that cannot be used
     */
    Object value();
}
