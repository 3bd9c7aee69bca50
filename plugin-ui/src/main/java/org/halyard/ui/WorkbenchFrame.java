package org.halyard.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JOptionPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.SwingWorker;
import org.halyard.grid.Grid;
import org.halyard.process.ProcessCatalog;
import org.halyard.process.ProcessSpec;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.LayerStack;
import org.halyard.ui.map.MapCanvas;
import org.halyard.ui.map.MapPainter;
import org.halyard.ui.map.TargetLayer;
import org.halyard.ui.map.VectorLayer;
import org.halyard.ui.profile.ProfilePanel;
import org.halyard.ui.targets.TargetTablePanel;
import org.halyard.ui.toolbox.ToolboxPanel;

/**
 * The workbench window: header with tools, the map with targets and profile below it, layers and
 * operators at the right, status along the bottom. Create and use on the event thread.
 */
public final class WorkbenchFrame extends JFrame {

    /** Title prefix (CONTRACT: the window title starts with "Halyard"). */
    public static final String TITLE = "Halyard workbench";

    private final LayerStack stack = new LayerStack();
    private final MapCanvas canvas = new MapCanvas(stack);
    private final HeaderBar header;
    private final StatusStrip status = new StatusStrip(stack);
    private final TargetTablePanel targets = new TargetTablePanel(canvas);
    private final ProfilePanel profile = new ProfilePanel();
    private final JTabbedPane bottom = new JTabbedPane();
    private final CountDownLatch loaded = new CountDownLatch(1);
    private final ToolboxPanel toolbox;
    private final JTabbedPane right;

    public WorkbenchFrame() {
        super(TITLE);
        setDefaultCloseOperation(JFrame.DISPOSE_ON_CLOSE);
        header = new HeaderBar(canvas, this::chooseFiles, this::chooseExport, canvas::zoomToAll);
        canvas.setPreferredSize(new Dimension(900, 560));
        canvas.onCursor(status::cursor);
        canvas.onViewChange(() -> status.viewChanged(canvas.viewport()));
        canvas.onProfile(this::showProfile);
        List<ProcessSpec> processes = ProcessCatalog.all();
        toolbox = new ToolboxPanel(processes, () -> stack.ofType(GridLayer.class), this::addOutputs);

        right = new JTabbedPane();
        right.addTab("Layers", new LayerPanel(stack, canvas));
        right.addTab("Operators (" + processes.size() + ")", toolbox);
        right.setPreferredSize(new Dimension(360, 600));
        bottom.addTab("Targets", targets);
        bottom.addTab("Profile", profile);
        bottom.setPreferredSize(new Dimension(900, 210));
        JSplitPane mapAndBelow = new JSplitPane(JSplitPane.VERTICAL_SPLIT, canvas, bottom);
        mapAndBelow.setResizeWeight(0.75);
        mapAndBelow.setBorder(null);
        JSplitPane main = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, mapAndBelow, right);
        main.setResizeWeight(1.0);
        main.setBorder(null);
        getContentPane().setBackground(Theme.PANEL);
        add(header, BorderLayout.NORTH);
        add(main, BorderLayout.CENTER);
        add(status, BorderLayout.SOUTH);
        stack.addListener(() -> targets.show(stack.ofType(TargetLayer.class).stream().findFirst().orElse(null)));
        targets.show(null);
        pack();
        setLocationByPlatform(true);
    }

    public LayerStack layers() {
        return stack;
    }

    public MapCanvas canvas() {
        return canvas;
    }

    /** Charts the visible grids along {@code line} (map metres) with nearby track samples. */
    public void showProfile(java.awt.geom.Line2D line) {
        profile.show(line, visibleGrids(), stack.ofType(VectorLayer.class).stream()
                .filter(l -> !(l instanceof TargetLayer) && l.isVisible()).toList());
        bottom.setSelectedComponent(profile);
    }

    /** Shows the side tab whose title starts with {@code title} ("Layers", "Operators"). */
    public void showSideTab(String title) {
        for (int i = 0; i < right.getTabCount(); i++) {
            if (right.getTitleAt(i).startsWith(title)) {
                right.setSelectedIndex(i);
            }
        }
    }

    /** Shows the form of the operator called {@code qualifiedName} in the toolbox. */
    public void showOperator(String qualifiedName) {
        showSideTab("Operators");
        toolbox.choose(ProcessCatalog.find(qualifiedName));
    }

    /** Shows the target table and selects target {@code id}. */
    public void selectTarget(long id) {
        bottom.setSelectedComponent(targets);
        targets.select(id);
    }

    private List<GridLayer> visibleGrids() {
        return stack.ofType(GridLayer.class).stream().filter(GridLayer::isVisible).toList();
    }

    /** Reads {@code files} in the background and adds them as layers; errors are shown in a dialog. */
    public void open(List<Path> files) {
        if (files.isEmpty()) {
            loaded.countDown();
            return;
        }
        header.setWorkspace("loading " + files.size() + " file(s)...");
        String crs = stack.crsCode();
        new SwingWorker<List<WorkspaceLoader.Loaded>, Void>() {
            @Override
            protected List<WorkspaceLoader.Loaded> doInBackground() {
                return WorkspaceLoader.read(files, crs);
            }

            @Override
            protected void done() {
                try {
                    WorkspaceLoader.addAll(stack, get());
                    canvas.zoomToAll();
                    String names = String.join(", ", files.stream().map(p -> p.getFileName().toString()).toList());
                    header.setWorkspace(names + "   |   map CRS " + (stack.crsCode() == null ? "unknown" : stack.crsCode()));
                    setTitle(TITLE + " - " + names);
                } catch (java.util.concurrent.ExecutionException e) {
                    header.setWorkspace("could not open: " + e.getCause().getMessage());
                    JOptionPane.showMessageDialog(WorkbenchFrame.this, e.getCause().getMessage(), "Could not open",
                            JOptionPane.WARNING_MESSAGE);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } finally {
                    loaded.countDown();
                }
            }
        }.execute();
    }

    /** Waits until the files given to the first {@link #open} are on the map (for tests and scripts). */
    public boolean awaitLoaded(long timeout, TimeUnit unit) throws InterruptedException {
        return loaded.await(timeout, unit);
    }

    private void addOutputs(ProcessSpec spec, Map<String, Object> outputs) {
        outputs.forEach((key, value) -> {
            if (value instanceof Grid g) {
                stack.adoptCrs(g.geometry().crsCode());
                stack.addTop(new GridLayer(spec.title() + " " + key, g, null, null));
            }
        });
    }

    private void chooseFiles() {
        JFileChooser fc = new JFileChooser();
        fc.setMultiSelectionEnabled(true);
        fc.setDialogTitle("Add grids, GeoPackages, GeoJSON, CSV points or a recipe");
        if (fc.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            List<Path> ps = new ArrayList<>();
            for (File f : fc.getSelectedFiles()) {
                ps.add(f.toPath());
            }
            open(ps);
        }
    }

    private void chooseExport() {
        JFileChooser fc = new JFileChooser();
        fc.setDialogTitle("Save the current map view as PNG");
        fc.setSelectedFile(new File("halyard-view.png"));
        if (fc.showSaveDialog(this) == JFileChooser.APPROVE_OPTION) {
            Path out = fc.getSelectedFile().toPath();
            var view = canvas.viewport().copy();
            var layers = stack.snapshot();
            new SwingWorker<Void, Void>() {
                @Override
                protected Void doInBackground() throws Exception {
                    ViewExport.writePng(MapPainter.image(view, layers), out);
                    return null;
                }

                @Override
                protected void done() {
                    try {
                        get();
                        header.setWorkspace("saved the view to " + out);
                    } catch (Exception e) {
                        JOptionPane.showMessageDialog(WorkbenchFrame.this, e.getMessage(), "Could not save",
                                JOptionPane.WARNING_MESSAGE);
                    }
                }
            }.execute();
        }
    }
}
