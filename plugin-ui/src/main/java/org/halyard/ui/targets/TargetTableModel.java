package org.halyard.ui.targets;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import javax.swing.table.AbstractTableModel;
import org.halyard.io.FeatureLayer;
import org.halyard.ui.map.TargetLayer;

/**
 * Rows are the features of a {@link TargetLayer}; columns are id, the analyst's three interpretation
 * fields (editable), then the layer's own attributes. Numeric columns report {@code Double} so that
 * sorting is numeric.
 */
public final class TargetTableModel extends AbstractTableModel {

    /** The interpretation columns, in table order, with their header texts. */
    static final String[][] EDITABLE = {
        {TargetLayer.ANALYST_CLASS, "Interpretation"},
        {TargetLayer.ANALYST_CONFIDENCE, "Confidence"},
        {TargetLayer.ANALYST_NOTE, "Note"}};

    private final TargetLayer layer;
    private final List<String> columns = new ArrayList<>();
    private final List<String> headers = new ArrayList<>();
    private final List<Class<?>> types = new ArrayList<>();
    private final Consumer<Edit> onEdit;

    /** One edited cell: feature id, column name, new value. */
    public record Edit(TargetLayer layer, long id, String column, Object value) { }

    public TargetTableModel(TargetLayer layer, Consumer<Edit> onEdit) {
        this.layer = layer;
        this.onEdit = onEdit;
        add("fid", "Id", Long.class);
        for (String[] e : EDITABLE) {
            add(e[0], e[1], String.class);
        }
        for (FeatureLayer.Column c : layer.data().columns()) {
            if (!columns.contains(c.name())) {
                add(c.name(), c.name(), c.type() == FeatureLayer.ColumnType.TEXT ? String.class
                        : c.type() == FeatureLayer.ColumnType.REAL ? Double.class : Long.class);
            }
        }
    }

    private void add(String column, String header, Class<?> type) {
        columns.add(column);
        headers.add(header);
        types.add(type);
    }

    public TargetLayer layer() {
        return layer;
    }

    /** The feature shown in model row {@code row}. */
    public FeatureLayer.Feature feature(int row) {
        return layer.data().features().get(row);
    }

    /** Model row of feature {@code id}, or -1. */
    public int rowOf(long id) {
        List<FeatureLayer.Feature> fs = layer.data().features();
        for (int i = 0; i < fs.size(); i++) {
            if (fs.get(i).id() == id) {
                return i;
            }
        }
        return -1;
    }

    /** Column index of attribute {@code name}, or -1. */
    public int columnOf(String name) {
        return columns.indexOf(name);
    }

    @Override
    public int getRowCount() {
        return layer.data().features().size();
    }

    @Override
    public int getColumnCount() {
        return columns.size();
    }

    @Override
    public String getColumnName(int c) {
        return headers.get(c);
    }

    @Override
    public Class<?> getColumnClass(int c) {
        return types.get(c);
    }

    @Override
    public boolean isCellEditable(int row, int c) {
        return c >= 1 && c <= EDITABLE.length;
    }

    @Override
    public Object getValueAt(int row, int c) {
        FeatureLayer.Feature f = feature(row);
        if (c == 0) {
            return f.id();
        }
        Map<String, Object> a = layer.attributes(f);
        Object v = a.get(columns.get(c));
        return v instanceof Double d && d.isNaN() ? null : v;
    }

    @Override
    public void setValueAt(Object value, int row, int c) {
        if (!isCellEditable(row, c)) {
            return;
        }
        String v = value == null || value.toString().isBlank() ? null : value.toString().trim();
        FeatureLayer.Feature f = feature(row);
        layer.setAttribute(f.id(), columns.get(c), v);
        fireTableCellUpdated(row, c);
        onEdit.accept(new Edit(layer, f.id(), columns.get(c), v));
    }
}
