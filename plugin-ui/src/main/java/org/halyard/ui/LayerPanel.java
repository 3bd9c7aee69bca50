package org.halyard.ui;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.FlowLayout;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import javax.swing.BoxLayout;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JColorChooser;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSlider;
import javax.swing.ListSelectionModel;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.Layer;
import org.halyard.ui.map.LayerStack;
import org.halyard.ui.map.MapCanvas;
import org.halyard.ui.map.VectorLayer;

/**
 * The layer list: top of the list is drawn on top. Click the dot to show or hide; the buttons raise, lower,
 * zoom to and remove the selected layer; the slider sets its opacity; below, its style and colour bar.
 */
final class LayerPanel extends JPanel {

    private final LayerStack stack;
    private final DefaultListModel<Layer> model = new DefaultListModel<>();
    private final JList<Layer> list = new JList<>(model);
    private final JSlider opacity = new JSlider(0, 100, 100);
    private final GridStyleEditor gridStyle;
    private final ColourBarView colourBar = new ColourBarView();
    private final JButton vectorColour = new JButton("Line colour...");
    private final CardLayout styleCards = new CardLayout();
    private final JPanel styleArea = new JPanel(styleCards);
    private boolean syncing;

    LayerPanel(LayerStack stack, MapCanvas canvas) {
        super(new BorderLayout());
        this.stack = stack;
        Theme.panel(this);
        gridStyle = new GridStyleEditor(() -> {
            colourBar.repaint();
            stack.changed();
        });
        list.setCellRenderer(new LayerListRenderer());
        list.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        list.setBackground(Theme.PANEL);
        list.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                int i = list.locationToIndex(e.getPoint());
                if (i >= 0 && e.getX() < LayerListRenderer.TOGGLE_WIDTH) {
                    Layer l = model.get(i);
                    l.setVisible(!l.isVisible());
                    stack.changed();
                } else if (i >= 0 && e.getClickCount() == 2) {
                    canvas.zoomTo(model.get(i).bounds());
                }
            }
        });
        list.addListSelectionListener(e -> selectionChanged());

        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 3, 2));
        buttons.setOpaque(false);
        buttons.add(button("Raise", "Draw the selected layer above the one over it", () -> move(-1)));
        buttons.add(button("Lower", "Draw the selected layer below the one under it", () -> move(1)));
        buttons.add(button("Zoom to", "Fit the map to the selected layer", () -> selected(l -> canvas.zoomTo(l.bounds()))));
        buttons.add(button("Remove", "Take the selected layer off the map (files are not touched)", () -> selected(stack::remove)));

        opacity.setOpaque(false);
        opacity.setToolTipText("Opacity of the selected layer");
        opacity.addChangeListener(e -> {
            if (!syncing) {
                selected(l -> l.setOpacity(opacity.getValue() / 100f));
                stack.changed();
            }
        });
        JPanel gridCard = new JPanel();
        gridCard.setLayout(new BoxLayout(gridCard, BoxLayout.Y_AXIS));
        Theme.panel(gridCard);
        gridCard.add(colourBar);
        gridCard.add(gridStyle);
        JPanel vectorCard = Theme.panel(new JPanel(new FlowLayout(FlowLayout.LEFT)));
        vectorCard.add(vectorColour);
        vectorColour.addActionListener(e -> selected(l -> {
            if (l instanceof VectorLayer v) {
                var c = JColorChooser.showDialog(this, "Line colour of " + v.name(), v.style().stroke());
                if (c != null) {
                    v.setStyle(v.style().withStroke(c));
                    stack.changed();
                }
            }
        }));
        styleArea.add(Theme.panel(new JPanel()), "none");
        styleArea.add(gridCard, "grid");
        styleArea.add(vectorCard, "vector");

        JPanel controls = Theme.panel(new JPanel());
        controls.setLayout(new BoxLayout(controls, BoxLayout.Y_AXIS));
        controls.add(buttons);
        JPanel op = Theme.panel(new JPanel(new BorderLayout()));
        JLabel opl = new JLabel("Opacity ");
        opl.setFont(Theme.SMALL);
        op.add(opl, BorderLayout.WEST);
        op.add(opacity, BorderLayout.CENTER);
        controls.add(op);
        controls.add(Theme.caption("Style of the selected layer"));
        controls.add(styleArea);

        add(Theme.caption("Layers, top drawn first; click a dot to hide"), BorderLayout.NORTH);
        JScrollPane sp = new JScrollPane(list);
        sp.setBorder(javax.swing.BorderFactory.createMatteBorder(1, 0, 1, 0, Theme.RULE));
        add(sp, BorderLayout.CENTER);
        add(controls, BorderLayout.SOUTH);
        stack.addListener(this::sync);
        sync();
    }

    private JButton button(String text, String tip, Runnable r) {
        JButton b = new JButton(text);
        b.setFont(Theme.SMALL);
        b.setToolTipText(tip);
        b.addActionListener(e -> r.run());
        return b;
    }

    private void selected(java.util.function.Consumer<Layer> c) {
        Layer l = list.getSelectedValue();
        if (l != null) {
            c.accept(l);
        }
    }

    private void move(int delta) {
        selected(l -> {
            stack.move(l, delta);
            list.setSelectedValue(l, true);
        });
    }

    /** Rebuilds the list from the stack, keeping the selection. */
    private void sync() {
        Layer sel = list.getSelectedValue();
        syncing = true;
        model.clear();
        stack.snapshot().forEach(model::addElement);
        if (sel != null && model.contains(sel)) {
            list.setSelectedValue(sel, false);
        } else if (!model.isEmpty()) {
            list.setSelectedIndex(0);
        }
        syncing = false;
        list.repaint();
    }

    private void selectionChanged() {
        Layer l = list.getSelectedValue();
        if (l == null) {
            styleCards.show(styleArea, "none");
            return;
        }
        syncing = true;
        opacity.setValue(Math.round(l.opacity() * 100));
        syncing = false;
        if (l instanceof GridLayer g) {
            gridStyle.edit(g);
            colourBar.show(g);
            styleCards.show(styleArea, "grid");
        } else {
            styleCards.show(styleArea, "vector");
        }
    }
}
