package org.halyard.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.halyard.model.FieldDirection;
import org.halyard.simulate.Detectability;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code halyard detectability}: the smallest reliably detectable steel mass for a line plan, worst case
 * midway between lines, as a CSV table and a PNG plot (method in docs/simulation.md).
 */
@Command(name = "detectability", description = "Survey design: worst-case (midway between lines) peak anomaly and "
        + "analytic signal of an induced steel object against the sensor noise, and the smallest reliably "
        + "detectable mass, over burial, sensor altitude and line spacing. Writes OUT.csv and OUT.png.")
final class DetectabilityCommand implements Callable<Integer> {

    @Option(names = "--burial", split = ",", defaultValue = "0,0.5,1,2", description = "Burials below the seabed, m.")
    double[] burials;

    @Option(names = "--altitude", split = ",", defaultValue = "1,2,3,4", description = "Sensor altitudes over the seabed, m.")
    double[] altitudes;

    @Option(names = "--spacing", split = ",", defaultValue = "1,2,3,4,5,6,8,10,12,15,20",
            description = "Line spacings, m.")
    double[] spacings;

    @Option(names = "--inclination", defaultValue = "66", description = "Field inclination, degrees, positive down.")
    double inclination;

    @Option(names = "--declination", defaultValue = "1.5", description = "Field declination, degrees east of north.")
    double declination;

    @Option(names = "--intensity", defaultValue = "49000", description = "Field intensity, nT.")
    double intensity;

    @Option(names = "--line-azimuth", defaultValue = "90", description = "Line direction, degrees clockwise from north.")
    double azimuth;

    @Option(names = "--noise", defaultValue = "0.05", description = "Total-field noise (standard deviation), nT.")
    double noise;

    @Option(names = "--separation", defaultValue = "1.5",
            description = "Transverse sensor separation, m; gradient noise = sqrt(2) noise / separation.")
    double separation;

    @Option(names = "--snr", defaultValue = "5", description = "Peak over noise needed for a reliable detection.")
    double snr;

    @Option(names = "--out", required = true, paramLabel = "OUT",
            description = "Output path without extension: OUT.csv and OUT.png are written.")
    Path out;

    @Override
    public Integer call() {
        if (!(separation > 0)) {
            throw new IllegalArgumentException("--separation must be a positive number of metres, got " + separation);
        }
        var survey = new Detectability.Survey(new FieldDirection(inclination, declination), intensity, azimuth, noise,
                Math.sqrt(2) * noise / separation, snr);
        List<Detectability.Case> cases = Detectability.table(survey, burials, altitudes, spacings);
        Path csv = Path.of(out + ".csv"), png = Path.of(out + ".png");
        try {
            if (csv.toAbsolutePath().getParent() != null) {
                Files.createDirectories(csv.toAbsolutePath().getParent());
            }
            try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
                w.write("burial_m,altitude_m,line_spacing_m,distance_m,peak_nt_per_kg,peak_as_nt_per_m_per_kg,"
                        + "min_mass_field_kg,min_mass_as_kg\n");
                for (var c : cases) {
                    w.write(String.format(Locale.ROOT, "%.2f,%.2f,%.2f,%.3f,%.6g,%.6g,%.4g,%.4g%n", c.burialM(),
                            c.altitudeM(), c.lineSpacingM(), c.distanceM(), c.peakNtPerKg(), c.peakAsNtPerMPerKg(),
                            c.minMassFieldKg(), c.minMassAsKg()));
                }
            }
            ChartUtils.saveChartAsPNG(png.toFile(), chart(cases), 900, 600);
        } catch (IOException e) {
            throw new UncheckedIOException(out + ": " + e.getMessage(), e);
        }
        double b0 = burials[0];
        System.out.printf(Locale.ROOT, "smallest reliably detectable mass (snr %.1f, noise %.3f nT), burial %.2f m:%n",
                snr, noise, b0);
        System.out.print("altitude_m \\ spacing_m");
        for (double s : spacings) {
            System.out.printf(Locale.ROOT, "%9.1f", s);
        }
        System.out.println();
        for (double a : altitudes) {
            System.out.printf(Locale.ROOT, "%-23.1f", a);
            for (var c : cases) {
                if (c.burialM() == b0 && c.altitudeM() == a) {
                    System.out.printf(Locale.ROOT, "%9.3g", Math.min(c.minMassFieldKg(), c.minMassAsKg()));
                }
            }
            System.out.println();
        }
        System.out.println("wrote " + csv + " and " + png);
        return 0;
    }

    /** Smallest mass (better of field and analytic signal) against line spacing, one curve per altitude, first burial. */
    private JFreeChart chart(List<Detectability.Case> cases) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (double a : altitudes) {
            XYSeries s = new XYSeries(String.format(Locale.ROOT, "altitude %.1f m", a));
            for (var c : cases) {
                if (c.burialM() == burials[0] && c.altitudeM() == a) {
                    s.add(c.lineSpacingM(), Math.min(c.minMassFieldKg(), c.minMassAsKg()));
                }
            }
            data.addSeries(s);
        }
        LogAxis y = new LogAxis("smallest detectable steel mass, kg");
        y.setSmallestValue(1e-3);
        y.setNumberFormatOverride(new java.text.DecimalFormat("0.###"));
        XYPlot plot = new XYPlot(data, new NumberAxis("line spacing, m (object midway between lines)"), y,
                new XYLineAndShapeRenderer(true, true));
        return new JFreeChart(String.format(Locale.ROOT, "Detectability: burial %.1f m, noise %.3f nT, snr %.0f",
                burials[0], noise, snr), JFreeChart.DEFAULT_TITLE_FONT, plot, true);
    }
}
