package org.halyard.ui;

import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;
import org.halyard.render.ColourRamp;
import org.halyard.render.HistogramStretch;
import org.halyard.render.LinearStretch;
import org.halyard.render.RasterStyle;
import org.halyard.render.Shading;
import org.halyard.render.Stretch;
import org.halyard.render.SunPosition;
import org.halyard.ui.map.GridLayer;

/** Ramp, stretch and relief-shading controls for one grid layer; changes apply at once. */
final class GridStyleEditor extends JPanel {

    /** Stretch choices offered, in menu order. */
    enum StretchChoice {
        CLIP("Linear, clip 2% each end"), MINMAX("Linear, full range"), SYMMETRIC("Linear, centred on zero"),
        EQUALISED("Histogram-equalised");

        private final String label;

        StretchChoice(String label) {
            this.label = label;
        }

        Stretch of(GridLayer l) {
            return switch (this) {
                case CLIP -> LinearStretch.percentiles(l.grid(), 2, 98);
                case MINMAX -> LinearStretch.minMax(l.grid());
                case SYMMETRIC -> LinearStretch.symmetric(l.grid(), 98);
                case EQUALISED -> HistogramStretch.of(l.grid());
            };
        }

        @Override
        public String toString() {
            return label;
        }
    }

    private final JComboBox<ColourRamp> ramp = new JComboBox<>(ColourRamp.all().toArray(new ColourRamp[0]));
    private final JComboBox<StretchChoice> stretch = new JComboBox<>(StretchChoice.values());
    private final JCheckBox shade = new JCheckBox("Relief shading");
    private final JSpinner azimuth = new JSpinner(new SpinnerNumberModel(315.0, 0.0, 360.0, 15.0));
    private final JSpinner elevation = new JSpinner(new SpinnerNumberModel(45.0, 0.0, 90.0, 5.0));
    private final JSpinner zFactor = new JSpinner(new SpinnerNumberModel(0.2, 0.001, 1000.0, 0.05));
    private final Runnable onChange;
    private GridLayer layer;
    private boolean loading;

    GridStyleEditor(Runnable onChange) {
        super(new GridBagLayout());
        this.onChange = onChange;
        Theme.panel(this);
        shade.setOpaque(false);
        azimuth.setToolTipText("Direction the light comes from, degrees clockwise from grid north (315 = north-west)");
        elevation.setToolTipText("Height of the light above the horizon, degrees");
        zFactor.setToolTipText("Metres of relief per unit of the grid value: larger exaggerates the shading");
        row(0, "Colours", ramp);
        row(1, "Stretch", stretch);
        add(shade, Theme.cell(0, 2, 2));
        row(3, "Light from (° from N)", azimuth);
        row(4, "Light height (°)", elevation);
        row(5, "Relief exaggeration", zFactor);
        ramp.addActionListener(e -> apply());
        stretch.addActionListener(e -> apply());
        shade.addActionListener(e -> apply());
        azimuth.addChangeListener(e -> apply());
        elevation.addChangeListener(e -> apply());
        zFactor.addChangeListener(e -> apply());
    }

    private void row(int r, String label, JComponent editor) {
        JLabel l = new JLabel(label);
        l.setFont(Theme.SMALL);
        add(l, Theme.cell(0, r, 1));
        GridBagConstraints c = Theme.cell(1, r, 1);
        c.weightx = 1;
        add(editor, c);
    }

    void edit(GridLayer l) {
        loading = true;
        layer = l;
        RasterStyle s = l.style();
        ramp.setSelectedItem(s.ramp());
        stretch.setSelectedItem(s.stretch() instanceof HistogramStretch ? StretchChoice.EQUALISED
                : s.stretch().label().startsWith("symmetric") ? StretchChoice.SYMMETRIC
                : s.stretch().label().contains("min-max") ? StretchChoice.MINMAX : StretchChoice.CLIP);
        shade.setSelected(s.shading().isOn());
        azimuth.setValue(s.shading().sun().azimuthDeg());
        elevation.setValue(s.shading().sun().elevationDeg());
        zFactor.setValue(s.shading().zFactor());
        loading = false;
    }

    private void apply() {
        if (loading || layer == null) {
            return;
        }
        Shading sh = shade.isSelected()
                ? new Shading(new SunPosition((Double) azimuth.getValue(), (Double) elevation.getValue()),
                        (Double) zFactor.getValue(), 0.65)
                : Shading.NONE;
        layer.setStyle(new RasterStyle((ColourRamp) ramp.getSelectedItem(),
                ((StretchChoice) stretch.getSelectedItem()).of(layer), sh));
        onChange.run();
    }
}
