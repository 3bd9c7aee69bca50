package org.halyard.ui.toolbox;

import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.halyard.process.ParameterSpec;
import org.halyard.process.ProcessSpec;
import org.halyard.ui.Theme;
import org.halyard.ui.map.GridLayer;

/**
 * A form generated from a process's parameter metadata: one labelled editor per input, required ones
 * marked with a bullet, the description as the tooltip and as grey help text.
 */
public final class ParameterForm extends JPanel {

    private final ProcessSpec spec;
    private final Map<String, FieldEditor> editors = new LinkedHashMap<>();

    /** Builds the form for {@code spec}; grid parameters offer the layers {@code grids} supplies. */
    public ParameterForm(ProcessSpec spec, Supplier<List<GridLayer>> grids) {
        super(new GridBagLayout());
        this.spec = spec;
        Theme.panel(this);
        int row = 0;
        JLabel about = new JLabel("<html><body style='width:250px'><b>" + esc(spec.title()) + "</b><br>"
                + esc(spec.description()) + "<br><span style='color:#6a7276'>" + esc(spec.qualifiedName())
                + "</span></body></html>");
        about.setFont(Theme.BODY);
        add(about, Theme.cell(0, row++, 2));
        for (ParameterSpec p : spec.inputs()) {
            FieldEditor e = FieldEditors.of(p, grids);
            editors.put(p.name(), e);
            JLabel label = new JLabel((p.required() ? "\u2022 " : "") + p.title());
            label.setFont(p.required() ? Theme.HEADING : Theme.BODY);
            label.setToolTipText(p.description());
            add(label, Theme.cell(0, row, 1));
            GridBagConstraints c = Theme.cell(1, row++, 1);
            c.weightx = 1;
            add(e.component(), c);
            if (!p.description().isBlank() && !p.description().equals(p.title())) {
                JLabel help = new JLabel("<html><body style='width:230px'>" + esc(p.description()) + "</body></html>");
                help.setFont(Theme.SMALL);
                help.setForeground(Theme.MUTED);
                add(help, Theme.cell(1, row++, 1));
            }
        }
        JLabel key = new JLabel("\u2022 bold: needs a value");
        key.setFont(Theme.SMALL);
        key.setForeground(Theme.MUTED);
        GridBagConstraints c = Theme.cell(0, row, 2);
        c.weighty = 1;
        c.anchor = GridBagConstraints.NORTHWEST;
        add(key, c);
    }

    public ProcessSpec spec() {
        return spec;
    }

    /** Number of parameter editors (one per input). */
    public int editorCount() {
        return editors.size();
    }

    /**
     * The entered values by parameter name; empty entries are left out so the process uses its defaults.
     *
     * @throws IllegalArgumentException naming the parameter for an unusable entry
     */
    public Map<String, Object> values() {
        Map<String, Object> out = new LinkedHashMap<>();
        editors.forEach((name, e) -> {
            Object v = e.value();
            if (v != null) {
                out.put(name, v);
            }
        });
        return out;
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
