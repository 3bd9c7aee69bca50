package org.halyard.ui.toolbox;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.List;
import java.util.Map;
import java.util.function.BiConsumer;
import java.util.function.Supplier;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import org.halyard.process.ProcessSpec;
import org.halyard.ui.Theme;
import org.halyard.ui.map.GridLayer;

/**
 * The operator toolbox: search box, process tree, the generated form of the chosen process, and Run,
 * Stop, a progress bar and a log.
 */
public final class ToolboxPanel extends JPanel {

    private final ProcessTree tree;
    private final JPanel formHolder = Theme.panel(new JPanel(new BorderLayout()));
    private final JProgressBar bar = new JProgressBar(0, 100);
    private final JTextArea log = new JTextArea(6, 30);
    private final JButton run = new JButton("Run");
    private final JButton stop = new JButton("Stop");
    private final JLabel count = new JLabel();
    private final Supplier<List<GridLayer>> grids;
    private final BiConsumer<ProcessSpec, Map<String, Object>> onResult;
    private ParameterForm form;
    private ProcessJob job;

    /**
     * @param processes every process to list (from {@code ProcessCatalog.all()})
     * @param grids     the open grid layers, for grid parameters
     * @param onResult  receives the outputs of a finished run (on the event thread)
     */
    public ToolboxPanel(List<ProcessSpec> processes, Supplier<List<GridLayer>> grids,
                        BiConsumer<ProcessSpec, Map<String, Object>> onResult) {
        super(new BorderLayout());
        Theme.panel(this);
        this.grids = grids;
        this.onResult = onResult;
        tree = new ProcessTree(processes);
        tree.setBackground(Theme.PANEL);
        JTextField search = new JTextField();
        search.setToolTipText("Type part of a name or description to filter the operators");
        search.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                filter(search.getText());
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                filter(search.getText());
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                filter(search.getText());
            }
        });
        JPanel top = Theme.panel(new JPanel(new BorderLayout(4, 2)));
        top.add(Theme.caption("Operators: find by name"), BorderLayout.NORTH);
        top.add(search, BorderLayout.CENTER);
        count.setFont(Theme.SMALL);
        count.setForeground(Theme.MUTED);
        top.add(count, BorderLayout.SOUTH);
        filter("");
        tree.addTreeSelectionListener(e -> choose(tree.selectedProcess()));

        formHolder.add(hint("Choose an operator above to see its inputs."), BorderLayout.NORTH);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, new JScrollPane(tree), new JScrollPane(formHolder));
        split.setResizeWeight(0.4);
        split.setBorder(null);

        log.setEditable(false);
        log.setFont(Theme.MONO);
        log.setLineWrap(true);
        bar.setStringPainted(true);
        bar.setString("idle");
        run.setEnabled(false);
        stop.setEnabled(false);
        run.setToolTipText("Run the chosen operator in the background");
        stop.setToolTipText("Ask the running operator to stop");
        run.addActionListener(e -> start());
        stop.addActionListener(e -> {
            if (job != null) {
                job.requestCancel();
            }
        });
        JPanel buttons = Theme.panel(new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 2)));
        buttons.add(run);
        buttons.add(stop);
        JPanel bottom = Theme.panel(new JPanel(new BorderLayout(2, 2)));
        bottom.add(buttons, BorderLayout.NORTH);
        bottom.add(bar, BorderLayout.CENTER);
        bottom.add(new JScrollPane(log), BorderLayout.SOUTH);

        add(top, BorderLayout.NORTH);
        add(split, BorderLayout.CENTER);
        add(bottom, BorderLayout.SOUTH);
    }

    private static JLabel hint(String text) {
        JLabel l = new JLabel(text);
        l.setFont(Theme.SMALL);
        l.setForeground(Theme.MUTED);
        l.setBorder(javax.swing.BorderFactory.createEmptyBorder(8, 8, 8, 8));
        return l;
    }

    private void filter(String text) {
        int n = tree.filter(text);
        count.setText(n + " operators" + (text.isBlank() ? "" : " match"));
    }

    /** Shows the form of {@code p} (or the hint when {@code null}). */
    public void choose(ProcessSpec p) {
        formHolder.removeAll();
        if (p == null) {
            form = null;
            formHolder.add(hint("Choose an operator above to see its inputs."), BorderLayout.NORTH);
        } else {
            form = new ParameterForm(p, grids);
            formHolder.add(form, BorderLayout.NORTH);
        }
        run.setEnabled(form != null && job == null);
        formHolder.revalidate();
        formHolder.repaint();
    }

    private void start() {
        if (form == null) {
            return;
        }
        Map<String, Object> values;
        try {
            values = form.values();
        } catch (IllegalArgumentException e) {
            append("cannot run: " + e.getMessage());
            return;
        }
        job = new ProcessJob(form.spec(), values, this::append, onResult);
        job.addPropertyChangeListener(e -> {
            if ("progress".equals(e.getPropertyName())) {
                bar.setValue((Integer) e.getNewValue());
                bar.setString(bar.getValue() + " %");
            } else if ("state".equals(e.getPropertyName()) && job != null && job.isDone()) {
                job = null;
                run.setEnabled(form != null);
                stop.setEnabled(false);
                bar.setString("idle");
            }
        });
        run.setEnabled(false);
        stop.setEnabled(true);
        bar.setValue(0);
        bar.setString("0 %");
        job.execute();
    }

    private void append(String line) {
        log.append(line + "\n");
        log.setCaretPosition(log.getDocument().getLength());
    }
}
