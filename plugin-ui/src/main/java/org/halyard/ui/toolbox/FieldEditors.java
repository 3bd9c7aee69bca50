package org.halyard.ui.toolbox;

import java.awt.BorderLayout;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import org.halyard.process.ParameterSpec;
import org.halyard.ui.Theme;
import org.halyard.ui.map.GridLayer;

/** Builds the editor that fits a parameter's kind, from its metadata (unit, range, default, choices). */
final class FieldEditors {

    /** Shown in a choice box for "let the process use its default". */
    static final String DEFAULT_CHOICE = "(process default)";

    private FieldEditors() {
    }

    static FieldEditor of(ParameterSpec p, Supplier<List<GridLayer>> grids) {
        return switch (p.kind()) {
            case GRID -> grid(p, grids);
            case NUMBER, INTEGER -> number(p);
            case BOOLEAN -> bool(p);
            case CHOICE -> choice(p);
            case FILE -> file(p);
            case TEXT -> text(p);
        };
    }

    private static FieldEditor grid(ParameterSpec p, Supplier<List<GridLayer>> grids) {
        JComboBox<Object> box = new JComboBox<>();
        if (!p.required()) {
            box.addItem("(none)");
        }
        grids.get().forEach(box::addItem);
        if (box.getItemCount() == 0) {
            box.addItem("(open a grid first)");
        }
        box.setToolTipText("A grid from the open layers");
        return new Simple(box, () -> box.getSelectedItem() instanceof GridLayer g ? g.grid() : null);
    }

    private static FieldEditor number(ParameterSpec p) {
        JTextField f = new JTextField(p.defaultValue() == null ? "" : p.defaultValue().toString(), 8);
        JPanel panel = new JPanel(new BorderLayout(4, 0));
        panel.setOpaque(false);
        panel.add(f, BorderLayout.CENTER);
        JLabel unit = new JLabel(p.unit() + rangeText(p));
        unit.setFont(Theme.SMALL);
        unit.setForeground(Theme.MUTED);
        panel.add(unit, BorderLayout.EAST);
        f.setToolTipText(p.description());
        return new Simple(panel, () -> {
            String t = f.getText().trim();
            if (t.isEmpty()) {
                return null;
            }
            double v;
            try {
                v = Double.parseDouble(t);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("'" + p.title() + "' must be a number, got '" + t + "'");
            }
            if (!p.inRange(v)) {
                throw new IllegalArgumentException("'" + p.title() + "' must be within" + rangeText(p) + ", got " + t);
            }
            if (p.kind() == ParameterSpec.Kind.INTEGER) {
                if (v != Math.rint(v)) {
                    throw new IllegalArgumentException("'" + p.title() + "' must be a whole number, got " + t);
                }
                return (long) v;
            }
            return v;
        });
    }

    /** " 0 to 90", " at least 0", " at most 10" or "". */
    static String rangeText(ParameterSpec p) {
        boolean lo = !Double.isNaN(p.min()), hi = !Double.isNaN(p.max());
        if (lo && hi) {
            return String.format(Locale.ROOT, "  %s to %s", num(p.min()), num(p.max()));
        }
        return lo ? "  at least " + num(p.min()) : hi ? "  at most " + num(p.max()) : "";
    }

    private static String num(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    private static FieldEditor bool(ParameterSpec p) {
        JCheckBox b = new JCheckBox("", Boolean.TRUE.equals(p.defaultValue()));
        b.setOpaque(false);
        b.setToolTipText(p.description());
        return new Simple(b, b::isSelected);
    }

    private static FieldEditor choice(ParameterSpec p) {
        JComboBox<String> box = new JComboBox<>();
        if (p.defaultValue() == null && !p.required()) {
            box.addItem(DEFAULT_CHOICE);
        }
        p.choices().forEach(box::addItem);
        if (p.defaultValue() != null) {
            box.setSelectedItem(p.defaultValue().toString());
        }
        box.setToolTipText(p.description());
        return new Simple(box, () -> DEFAULT_CHOICE.equals(box.getSelectedItem()) ? null : box.getSelectedItem());
    }

    private static FieldEditor file(ParameterSpec p) {
        JTextField f = new JTextField(p.defaultValue() == null ? "" : p.defaultValue().toString(), 12);
        JButton choose = new JButton("Choose...");
        choose.setFont(Theme.SMALL);
        choose.addActionListener(e -> {
            JFileChooser fc = new JFileChooser();
            if (fc.showOpenDialog(f) == JFileChooser.APPROVE_OPTION) {
                f.setText(fc.getSelectedFile().getPath());
            }
        });
        JPanel panel = new JPanel(new BorderLayout(4, 0));
        panel.setOpaque(false);
        panel.add(f, BorderLayout.CENTER);
        panel.add(choose, BorderLayout.EAST);
        return new Simple(panel, () -> f.getText().isBlank() ? null : Path.of(f.getText().trim()));
    }

    private static FieldEditor text(ParameterSpec p) {
        JTextField f = new JTextField(p.defaultValue() == null ? "" : p.defaultValue().toString(), 12);
        f.setToolTipText(p.description() + " (" + p.type().getSimpleName() + ", as text: WKT for geometries)");
        return new Simple(f, () -> f.getText().isBlank() ? null : f.getText().trim());
    }

    private record Simple(JComponent component, Supplier<Object> reader) implements FieldEditor {
        @Override
        public Object value() {
            return reader.get();
        }
    }
}
