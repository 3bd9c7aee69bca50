package org.halyard.ui.profile;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.LinkedHashMap;
import java.util.Map;
import org.halyard.ui.Theme;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A JFreeChart of a {@link ProfileSampler.Profile}: one line per grid, one value axis per unit, track
 * samples as dots on the axis of their unit. Distance along the line (A to B) in metres.
 */
final class ProfileChart {

    /** Series colours, our own set: distinct in hue and lightness. */
    private static final Color[] COLOURS = {
        new Color(0x0B, 0x6E, 0x8E), new Color(0xC8, 0x5A, 0x19), new Color(0x4E, 0x7A, 0x32),
        new Color(0x8E, 0x3B, 0xA6), new Color(0x9C, 0x7A, 0x10), new Color(0x2F, 0x3A, 0x40)};

    private ProfileChart() {
    }

    static JFreeChart of(ProfileSampler.Profile p) {
        XYPlot plot = new XYPlot();
        NumberAxis x = new NumberAxis(String.format(java.util.Locale.ROOT, "distance from A, m (line %.1f m)", p.length()));
        plot.setDomainAxis(x);
        Map<String, Integer> axisOfUnit = new LinkedHashMap<>();
        int ds = 0;
        for (ProfileSampler.Series s : p.grids()) {
            add(plot, ds, s, axis(plot, axisOfUnit, s.unit()), COLOURS[ds % COLOURS.length], true);
            ds++;
        }
        for (ProfileSampler.Series s : p.tracks()) {
            add(plot, ds, s, axis(plot, axisOfUnit, s.unit()), COLOURS[ds % COLOURS.length], false);
            ds++;
        }
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Theme.RULE);
        plot.setRangeGridlinePaint(Theme.RULE);
        JFreeChart chart = new JFreeChart(null, Theme.SMALL, plot, true);
        chart.setBackgroundPaint(Theme.PANEL);
        return chart;
    }

    private static int axis(XYPlot plot, Map<String, Integer> axisOfUnit, String unit) {
        return axisOfUnit.computeIfAbsent(unit, u -> {
            int i = axisOfUnit.size();
            NumberAxis a = new NumberAxis(u);
            a.setAutoRangeIncludesZero(false);
            plot.setRangeAxis(i, a);
            return i;
        });
    }

    private static void add(XYPlot plot, int index, ProfileSampler.Series s, int axis, Color colour, boolean line) {
        XYSeries xy = new XYSeries(s.name() + (line ? "" : " (track samples)"), true, true);
        for (int i = 0; i < s.distance().length; i++) {
            if (!Double.isNaN(s.values()[i])) {
                xy.add(s.distance()[i], s.values()[i]);
            }
        }
        plot.setDataset(index, new XYSeriesCollection(xy));
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(line, !line);
        r.setSeriesPaint(0, colour);
        r.setSeriesStroke(0, new BasicStroke(1.8f));
        r.setSeriesShape(0, new java.awt.geom.Ellipse2D.Double(-2, -2, 4, 4));
        plot.setRenderer(index, r);
        plot.mapDatasetToRangeAxis(index, axis);
    }
}
