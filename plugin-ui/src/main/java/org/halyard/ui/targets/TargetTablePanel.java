package org.halyard.ui.targets;

import java.awt.BorderLayout;
import java.awt.geom.Point2D;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.regex.Pattern;
import javax.swing.DefaultCellEditor;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.RowFilter;
import javax.swing.SwingUtilities;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.table.TableRowSorter;
import org.halyard.io.FeatureLayer;
import org.halyard.io.GeoPackageEdits;
import org.halyard.ui.Theme;
import org.halyard.ui.map.MapCanvas;
import org.halyard.ui.map.MapViewport;
import org.halyard.ui.map.TargetLayer;
import org.halyard.ui.map.TargetSymbols;

/**
 * The target table of the uppermost target layer: a filter box (matches any column), sortable columns,
 * selection shown on the map (and the map follows it when asked), interpretation edits saved to the
 * layer's GeoPackage on a background thread.
 */
public final class TargetTablePanel extends JPanel {

    /** Pick radius for selecting a target by clicking the map, pixels. */
    static final double PICK_PX = 10;

    private static final ExecutorService SAVER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "halyard-target-save");
        t.setDaemon(true);
        return t;
    });

    private final MapCanvas canvas;
    private final JTable table = new JTable();
    private final JTextField filter = new JTextField();
    private final JCheckBox follow = new JCheckBox("Map follows selection", true);
    private final JLabel status = new JLabel(" ");
    private TargetTableModel model;
    private TableRowSorter<TargetTableModel> sorter;
    private boolean selecting;

    public TargetTablePanel(MapCanvas canvas) {
        super(new BorderLayout());
        this.canvas = canvas;
        Theme.panel(this);
        table.setAutoCreateRowSorter(false);
        table.setFillsViewportHeight(true);
        table.setRowHeight(20);
        table.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && !selecting) {
                selectionToMap();
            }
        });
        filter.setToolTipText("Show only rows containing this text in any column");
        filter.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                applyFilter();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                applyFilter();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                applyFilter();
            }
        });
        follow.setOpaque(false);
        JPanel top = Theme.panel(new JPanel(new BorderLayout(4, 2)));
        top.add(Theme.caption("Targets: filter, sort by a header, edit the interpretation"), BorderLayout.NORTH);
        top.add(filter, BorderLayout.CENTER);
        top.add(follow, BorderLayout.EAST);
        status.setFont(Theme.SMALL);
        status.setForeground(Theme.MUTED);
        add(top, BorderLayout.NORTH);
        add(new JScrollPane(table), BorderLayout.CENTER);
        add(status, BorderLayout.SOUTH);
        canvas.onPick(this::pickNear);
    }

    /** Shows {@code layer} (or clears the table when {@code null}). */
    public void show(TargetLayer layer) {
        if (layer == null) {
            model = null;
            table.setModel(new javax.swing.table.DefaultTableModel());
            status.setText("No target layer open: open halyard.gpkg or a targets CSV.");
            return;
        }
        if (model != null && model.layer() == layer) {
            return;
        }
        model = new TargetTableModel(layer, this::save);
        sorter = new TableRowSorter<>(model);
        table.setModel(model);
        table.setRowSorter(sorter);
        JComboBox<String> classes = new JComboBox<>(TargetSymbols.CLASSES.stream().map(TargetSymbols.ClassStyle::name)
                .toArray(String[]::new));
        classes.setEditable(true);
        table.getColumnModel().getColumn(1).setCellEditor(new DefaultCellEditor(classes));
        table.getColumnModel().getColumn(2).setCellEditor(new DefaultCellEditor(new JComboBox<>(
                new String[] {"", "low", "medium", "high"})));
        table.getColumnModel().getColumn(0).setPreferredWidth(40);
        table.getColumnModel().getColumn(3).setPreferredWidth(160);
        applyFilter();
    }

    private void applyFilter() {
        if (sorter == null) {
            return;
        }
        String t = filter.getText().trim();
        sorter.setRowFilter(t.isEmpty() ? null : RowFilter.regexFilter("(?i)" + Pattern.quote(t)));
        Path src = model.layer().source();
        status.setText(table.getRowCount() + " of " + model.getRowCount() + " targets shown; "
                + (isGeoPackage(src) ? "edits are saved to " + src.getFileName()
                : "edits stay in this session (the source is not a GeoPackage)"));
    }

    private static boolean isGeoPackage(Path p) {
        return p != null && p.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".gpkg");
    }

    private void save(TargetTableModel.Edit e) {
        Path src = e.layer().source();
        canvas.repaint();
        if (!isGeoPackage(src)) {
            return;
        }
        java.util.Map<String, Object> values = new HashMap<>();
        values.put(e.column(), e.value());
        SAVER.submit(() -> {
            String msg;
            try {
                GeoPackageEdits.update(src, e.layer().data().name(), e.id(), values);
                msg = "saved target " + e.id() + " " + e.column() + " to " + src.getFileName();
            } catch (RuntimeException ex) {
                msg = "could not save target " + e.id() + ": " + ex.getMessage();
            }
            String m = msg;
            SwingUtilities.invokeLater(() -> status.setText(m));
        });
    }

    private void selectionToMap() {
        if (model == null) {
            return;
        }
        Set<Long> ids = new HashSet<>();
        org.locationtech.jts.geom.Envelope box = new org.locationtech.jts.geom.Envelope();
        for (int viewRow : table.getSelectedRows()) {
            FeatureLayer.Feature f = model.feature(table.convertRowIndexToModel(viewRow));
            ids.add(f.id());
            box.expandToInclude(f.geometry().getEnvelopeInternal());
        }
        model.layer().setSelection(ids);
        if (follow.isSelected() && !box.isNull()) {
            MapViewport v = canvas.viewport();
            double half = Math.max(40 * 1.0, Math.max(box.getWidth(), box.getHeight()));
            if (!v.visible().contains(box) || v.metresPerPixel() > 0.5) {
                box.expandBy(half);
                canvas.zoomTo(box);
            }
        }
        canvas.repaint();
    }

    /** Selects the target nearest to a map click, within {@value #PICK_PX} pixels. */
    private void pickNear(Point2D p) {
        if (model == null) {
            return;
        }
        double best = PICK_PX * canvas.viewport().metresPerPixel();
        long id = -1;
        List<FeatureLayer.Feature> fs = model.layer().data().features();
        for (FeatureLayer.Feature f : fs) {
            var c = f.geometry().getCoordinate();
            double d = Math.hypot(c.x - p.getX(), c.y - p.getY());
            if (d <= best) {
                best = d;
                id = f.id();
            }
        }
        select(id);
    }

    /** Selects target {@code id} in the table and on the map; a negative id clears the selection. */
    public void select(long id) {
        if (model == null) {
            return;
        }
        selecting = true;
        table.clearSelection();
        if (id >= 0 && model.rowOf(id) >= 0) {
            int viewRow = table.convertRowIndexToView(model.rowOf(id));
            if (viewRow >= 0) {
                table.setRowSelectionInterval(viewRow, viewRow);
                table.scrollRectToVisible(table.getCellRect(viewRow, 0, true));
            }
            model.layer().setSelection(Set.of(id));
        } else {
            model.layer().setSelection(Set.of());
        }
        selecting = false;
        canvas.repaint();
    }
}
