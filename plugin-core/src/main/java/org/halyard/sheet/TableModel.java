package org.halyard.sheet;

import java.util.List;

/**
 * A plain table for report pages: a title, column names, rows of strings and notes printed after the
 * last row.
 *
 * @param title   e.g. {@code Target list}
 * @param columns column names
 * @param rows    each as many cells as there are columns
 * @param notes   paragraphs printed after the table, may be empty
 */
public record TableModel(String title, List<String> columns, List<List<String>> rows, List<String> notes) {

    public TableModel {
        if (title == null || columns == null || columns.isEmpty()) {
            throw new IllegalArgumentException("a table needs a title and at least one column");
        }
        columns = List.copyOf(columns);
        rows = rows.stream().map(List::copyOf).toList();
        notes = List.copyOf(notes);
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).size() != columns.size()) {
                throw new IllegalArgumentException("table '" + title + "' row " + (i + 1) + " has "
                        + rows.get(i).size() + " cells, expected " + columns.size());
            }
        }
    }

    /** Whether every non-empty cell of column {@code c} is a number (printed right-aligned). */
    boolean numeric(int c) {
        boolean any = false;
        for (List<String> r : rows) {
            String s = r.get(c).trim();
            if (s.isEmpty()) {
                continue;
            }
            try {
                Double.parseDouble(s);
                any = true;
            } catch (NumberFormatException e) {
                return false;
            }
        }
        return any;
    }
}
