package org.halyard.ui.toolbox;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.swing.JTree;
import javax.swing.tree.DefaultMutableTreeNode;
import javax.swing.tree.DefaultTreeModel;
import javax.swing.tree.TreeSelectionModel;
import org.halyard.process.ProcessSpec;

/**
 * The processes as a tree of groups by namespace, Halyard's group first, filtered by a search text that
 * matches title, name or description.
 */
public final class ProcessTree extends JTree {

    private final List<ProcessSpec> all;

    public ProcessTree(List<ProcessSpec> processes) {
        super(new DefaultTreeModel(new DefaultMutableTreeNode("Operators")));
        this.all = List.copyOf(processes);
        setRootVisible(false);
        setShowsRootHandles(true);
        getSelectionModel().setSelectionMode(TreeSelectionModel.SINGLE_TREE_SELECTION);
        filter("");
    }

    /** The group label of a namespace. */
    static String groupOf(ProcessSpec p) {
        return p.isHalyard() ? "Halyard marine magnetics" : "GeoTools: " + p.namespace();
    }

    /** Shows only processes matching {@code text} (case-insensitive; empty shows all); returns how many. */
    public int filter(String text) {
        String q = text.trim().toLowerCase(Locale.ROOT);
        Map<String, DefaultMutableTreeNode> groups = new LinkedHashMap<>();
        int n = 0;
        for (ProcessSpec p : all) {
            String hay = (p.title() + " " + p.qualifiedName() + " " + p.description()).toLowerCase(Locale.ROOT);
            if (!q.isEmpty() && !hay.contains(q)) {
                continue;
            }
            groups.computeIfAbsent(groupOf(p), DefaultMutableTreeNode::new).add(new DefaultMutableTreeNode(new Entry(p)));
            n++;
        }
        DefaultMutableTreeNode root = new DefaultMutableTreeNode("Operators");
        groups.values().forEach(root::add);
        setModel(new DefaultTreeModel(root));
        for (DefaultMutableTreeNode g : groups.values()) {
            // a search shows every hit; the full list opens only Halyard's group
            if (!q.isEmpty() || g.getUserObject().toString().startsWith("Halyard")) {
                expandPath(new javax.swing.tree.TreePath(new Object[] {root, g}));
            }
        }
        return n;
    }

    /** The selected process, or {@code null} when a group or nothing is selected. */
    public ProcessSpec selectedProcess() {
        var path = getSelectionPath();
        if (path != null && ((DefaultMutableTreeNode) path.getLastPathComponent()).getUserObject() instanceof Entry e) {
            return e.spec();
        }
        return null;
    }

    /** A leaf: shows the title and the qualified name. */
    record Entry(ProcessSpec spec) {
        @Override
        public String toString() {
            return spec.title() + "   " + spec.qualifiedName();
        }
    }
}
