package org.halyard.ui.profile;

import java.awt.BorderLayout;
import java.awt.geom.Line2D;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.halyard.ui.Theme;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.VectorLayer;
import org.jfree.chart.ChartPanel;

/** Shows the chart of the last profile line; the visible grids are charted, tracks within the buffer dotted. */
public final class ProfilePanel extends JPanel {

    /** Stations along the line. */
    static final int STATIONS = 400;
    /** Track samples this close to the line are shown, metres. */
    static final double BUFFER_M = 2.0;

    private final JLabel hint = new JLabel("Choose the Profile line tool and drag across the map.");

    public ProfilePanel() {
        super(new BorderLayout());
        Theme.panel(this);
        hint.setFont(Theme.SMALL);
        hint.setForeground(Theme.MUTED);
        add(hint, BorderLayout.NORTH);
    }

    /** Charts {@code grids} along {@code line} with samples of {@code tracks} near it. */
    public void show(Line2D line, List<GridLayer> grids, List<VectorLayer> tracks) {
        ProfileSampler.Profile p = ProfileSampler.sample(line, grids, tracks, STATIONS, BUFFER_M);
        removeAll();
        hint.setText(String.format(java.util.Locale.ROOT,
                "Profile A to B, %.1f m: %d grids; track samples within %.0f m of the line shown as dots",
                p.length(), p.grids().size(), BUFFER_M));
        add(hint, BorderLayout.NORTH);
        ChartPanel cp = new ChartPanel(ProfileChart.of(p));
        cp.setMouseWheelEnabled(true);
        add(cp, BorderLayout.CENTER);
        revalidate();
        repaint();
    }
}
