package org.halyard.simulate;

import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.stream.IntStream;
import org.halyard.grid.Grid;
import org.halyard.grid.GridGeometry;
import org.halyard.grid.Progress;
import org.halyard.io.FeatureLayer;
import org.halyard.io.GeoPackageWriter;
import org.halyard.io.GeoTiffGrids;
import org.halyard.io.Iaga2002Writer;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * Forward-models a marine magnetic survey from a {@link Scenario} and writes what a survey delivers, plus
 * the truth and a recipe to process it.
 *
 * <p><b>Model:</b> each sensor reads F0 + g (y - y0) + dT(sources) + dF(t) + heading error + line offset +
 * noise, with dT the sum of the dipole, dipole-line and prism anomalies of {@link SourceModel} at the sensor
 * (its position from the array reference point, the heading and its offsets; its depth the seabed depth
 * under the reference point less the altitude), dF the {@link ExternalFieldVariation}, the heading error
 * A cos(h - h0), a random level offset per line, white Gaussian noise, then spikes added and gaps cut out.
 * Methods and references: {@code docs/simulation.md}.
 *
 * <p><b>Determinism:</b> every random draw comes from {@link Random} streams seeded from the scenario seed,
 * drawn in a fixed order; sample values are computed in parallel but independently, so the same scenario
 * gives the same bytes.
 */
public final class SurveySimulator {

    /** File names written into the output directory. */
    public static final String LINES = "lines.csv", BASE = "base.iaga2002", BATHYMETRY = "bathymetry.tif",
            ASSETS = "assets.gpkg", TRUTH = "truth.csv", RECIPE = "recipe.json";
    /** Layer names of {@link #ASSETS}. */
    public static final String ASSET_LINES = "infrastructure_lines", ASSET_AREAS = "infrastructure_areas";

    private static final DateTimeFormatter ISO_MS =
            DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT).withZone(ZoneOffset.UTC);

    /**
     * What a simulation produced.
     *
     * @param samples    rows of lines.csv
     * @param lines      survey and tie lines
     * @param objects    discrete objects in the truth
     * @param durationMs time from first to last sample, ms
     */
    public record Summary(int samples, int lines, int objects, long durationMs) { }

    private SurveySimulator() {
    }

    /**
     * Simulates {@code s} and writes {@value #LINES}, {@value #BASE}, {@value #BATHYMETRY}, {@value #ASSETS},
     * {@value #TRUTH} and {@value #RECIPE} into {@code outDir} (created if needed; files replaced).
     *
     * @param progress receives 0 to 100 percent (may be null)
     */
    public static Summary run(Scenario s, Path outDir, Progress progress) {
        Progress p = Progress.orNone(progress);
        try {
            Files.createDirectories(outDir);
        } catch (IOException e) {
            throw new UncheckedIOException(outDir + ": cannot create the output directory", e);
        }
        Instant start = s.startInstant();
        double oe = s.origin()[0], on = s.origin()[1];
        AnalyticSeabed seabed = new AnalyticSeabed(s.seabed(), oe, on);
        SourceModel sources = new SourceModel(s, seabed, new Random(s.seed() * 31 + 2));
        checkGeologyBelowSeabed(s, seabed);
        TowPath path = TowPath.plan(s, new Random(s.seed() * 31 + 1));
        ExternalFieldVariation dF = new ExternalFieldVariation(start, s.baseStation());
        p.report(5);

        int n = path.size;
        List<Scenario.Sensor> sensors = s.array().sensors();
        int ns = sensors.size();
        Scenario.Noise noise = s.noise();
        Random nr = new Random(s.seed() * 31 + 3);
        double[][] white = new double[ns][n];
        for (int j = 0; j < ns; j++) {
            for (int i = 0; i < n; i++) {
                white[j][i] = noise.sigmaNt() * nr.nextGaussian();
            }
        }
        double[] lineOffset = new double[path.lineNames.size()];
        double[] altPhase = new double[path.lineNames.size()];
        for (int k = 0; k < lineOffset.length; k++) {
            lineOffset[k] = noise.lineOffsetSigmaNt() * nr.nextGaussian();
            altPhase[k] = 2 * Math.PI * nr.nextDouble();
        }
        Scenario.Array arr = s.array();
        double[] altitude = new double[n], depth = new double[n];
        double[][] value = new double[ns][n];
        double f0 = s.field().intensityNt(), grad = s.field().gradientNtPerKmNorth() / 1000;
        long t0 = start.toEpochMilli();
        int chunk = Math.max(1, n / 90);
        java.util.concurrent.atomic.AtomicInteger done = new java.util.concurrent.atomic.AtomicInteger();
        IntStream.range(0, (n + chunk - 1) / chunk).parallel().forEach(c -> {
            for (int i = c * chunk; i < Math.min(n, (c + 1) * chunk); i++) {
                double alt = arr.altitudeM() + arr.altitudeWanderM()
                        * Math.sin(2 * Math.PI * path.timeMs[i] / 1000.0 / arr.altitudePeriodS() + altPhase[path.line[i]]);
                double z = seabed.depth(path.x[i], path.y[i]) - alt;
                altitude[i] = alt;
                depth[i] = z;
                double h = Math.toRadians(path.heading[i]);
                double ae = Math.sin(h), an = Math.cos(h), se = Math.cos(h), sn = -Math.sin(h);
                double common = f0 + dF.deltaF(t0 + path.timeMs[i]) + lineOffset[path.line[i]]
                        + noise.headingErrorNt() * Math.cos(h - Math.toRadians(noise.headingErrorAzimuthDeg()));
                for (int j = 0; j < ns; j++) {
                    Scenario.Sensor sr = sensors.get(j);
                    double e = path.x[i] + sr.alongM() * ae + sr.acrossM() * se;
                    double nn = path.y[i] + sr.alongM() * an + sr.acrossM() * sn;
                    value[j][i] = common + grad * (nn - on) + sources.anomaly(e, nn, z) + white[j][i];
                }
            }
            if (done.incrementAndGet() % 9 == 0) {
                p.checkCanceled();
            }
        });
        p.report(85);
        double km = n * s.area().speedMps() / s.area().sampleHz() / 1000;
        Random spikes = new Random(s.seed() * 31 + 4);
        for (int j = 0; j < ns; j++) {
            long count = Math.round(noise.spikesPerKm() * km);
            for (long k = 0; k < count; k++) {
                int i = spikes.nextInt(n);
                value[j][i] += (spikes.nextBoolean() ? 1 : -1) * noise.spikeNt() * (0.5 + spikes.nextDouble());
            }
        }
        boolean[] keep = new boolean[n];
        java.util.Arrays.fill(keep, true);
        Random gaps = new Random(s.seed() * 31 + 5);
        long gapCount = Math.round(noise.gapsPerKm() * km);
        for (long k = 0; k < gapCount; k++) {
            int i0 = gaps.nextInt(n);
            int len = 1 + (int) (gaps.nextDouble() * noise.gapMaxS() * s.area().sampleHz());
            for (int i = i0; i < Math.min(n, i0 + len); i++) {
                keep[i] = false;
            }
        }
        int rows = writeLines(outDir.resolve(LINES), s, path, altitude, depth, value, keep, t0);
        writeBase(outDir.resolve(BASE), s, dF, t0 + path.timeMs[0], t0 + path.timeMs[n - 1]);
        p.report(90);
        writeBathymetry(outDir.resolve(BATHYMETRY), s, seabed);
        writeAssets(outDir.resolve(ASSETS), s, sources, start);
        writeTruth(outDir.resolve(TRUTH), sources, f0);
        writeRecipe(outDir.resolve(RECIPE), s, path);
        p.report(100);
        return new Summary(rows, path.lineNames.size(), sources.objects.size(), path.durationMs());
    }

    private static void checkGeologyBelowSeabed(Scenario s, AnalyticSeabed seabed) {
        double oe = s.origin()[0], on = s.origin()[1];
        for (Scenario.Body b : s.geology()) {
            for (double x : new double[] {b.xMin(), b.xMax(), (b.xMin() + b.xMax()) / 2}) {
                for (double y : new double[] {b.yMin(), b.yMax(), (b.yMin() + b.yMax()) / 2}) {
                    if (b.topM() <= seabed.depth(oe + x, on + y)) {
                        throw new IllegalArgumentException("geology " + b.id() + ": top_m " + b.topM()
                                + " is above the seabed (" + String.format(Locale.ROOT, "%.2f", seabed.depth(oe + x, on + y))
                                + " m there); put the prism top below the seabed");
                    }
                }
            }
        }
    }

    private static int writeLines(Path file, Scenario s, TowPath path, double[] alt, double[] depth, double[][] value,
                                  boolean[] keep, long t0) {
        int rows = 0;
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            StringBuilder sb = new StringBuilder("line,time,x,y,altitude,depth");
            for (Scenario.Sensor sr : s.array().sensors()) {
                sb.append(',').append(sr.column());
            }
            w.write(sb.append('\n').toString());
            for (int i = 0; i < path.size; i++) {
                if (!keep[i]) {
                    continue;
                }
                sb.setLength(0);
                sb.append(path.lineNames.get(path.line[i])).append(',')
                        .append(ISO_MS.format(Instant.ofEpochMilli(t0 + path.timeMs[i]))).append(',');
                fixed(sb, path.x[i], 2).append(',');
                fixed(sb, path.y[i], 2).append(',');
                fixed(sb, alt[i], 2).append(',');
                fixed(sb, depth[i], 2);
                for (double[] v : value) {
                    fixed(sb.append(','), v[i], 3);
                }
                w.write(sb.append('\n').toString());
                rows++;
            }
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), e);
        }
        return rows;
    }

    /** Appends {@code v} rounded half-even to {@code decimals} places, without locale or exponent. */
    static StringBuilder fixed(StringBuilder sb, double v, int decimals) {
        return sb.append(new java.math.BigDecimal(v).setScale(decimals, java.math.RoundingMode.HALF_EVEN).toPlainString());
    }

    private static void writeBase(Path file, Scenario s, ExternalFieldVariation dF, long firstMs, long lastMs) {
        Scenario.BaseStation b = s.baseStation();
        long step = b.cadenceS() * 1000L;
        long from = Math.floorDiv(firstMs - 600_000, step) * step, to = Math.floorDiv(lastMs + 600_000, step) * step + step;
        int n = (int) ((to - from) / step) + 1;
        long[] t = new long[n];
        double[] x = new double[n], y = new double[n], z = new double[n], f = new double[n];
        var dir = new org.halyard.model.FieldDirection(s.field().inclinationDeg(), s.field().declinationDeg());
        long missFrom = s.startInstant().toEpochMilli() + Math.round(b.missingStartMin() * 60_000);
        long missTo = missFrom + Math.round(b.missingSeconds() * 1000);
        for (int i = 0; i < n; i++) {
            t[i] = from + i * step;
            double total = s.field().intensityNt() + dF.deltaF(t[i]);
            boolean missing = t[i] >= missFrom && t[i] < missTo;
            x[i] = missing ? Double.NaN : total * dir.north();
            y[i] = missing ? Double.NaN : total * dir.east();
            z[i] = missing ? Double.NaN : total * dir.down();
            f[i] = missing ? Double.NaN : total;
        }
        Iaga2002Writer.write(file, new Iaga2002Writer.Header("Halyard simulator (synthetic data)", b.stationName(),
                b.code(), b.latitudeDeg(), b.longitudeDeg(), b.elevationM(), b.cadenceS() + " second",
                b.cadenceS() + "-second (instantaneous)", "Provisional",
                List.of("Synthetic base station of scenario " + clip(s.name(), 30) + ".",
                        "Not real data; the code is used by no real observatory.",
                        "Quiet daily variation plus one disturbed interval.")), t, x, y, z, f);
    }

    private static String clip(String text, int max) {
        return text.length() <= max ? text : text.substring(0, max);
    }

    private static void writeBathymetry(Path file, Scenario s, AnalyticSeabed seabed) {
        double[] box = surveyBox(s);
        double m = s.seabed().marginM();
        GridGeometry g = GridGeometry.covering(box[0] - m, box[1] - m, box[2] + m, box[3] + m, s.seabed().cellM(), s.crs());
        GeoTiffGrids.write(Grid.sample(g, seabed::depth), file);
    }

    /** The surveyed rectangle with run-ins, as {xmin, ymin, xmax, ymax} in the CRS. */
    static double[] surveyBox(Scenario s) {
        Scenario.Area a = s.area();
        double az = Math.toRadians(a.lineAzimuthDeg());
        double[] box = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (double u : new double[] {-a.runInM(), a.lengthM() + a.runInM()}) {
            for (double v : new double[] {-a.runInM(), a.widthM() + a.runInM()}) {
                double e = s.origin()[0] + u * Math.sin(az) + v * Math.cos(az);
                double n = s.origin()[1] + u * Math.cos(az) - v * Math.sin(az);
                box[0] = Math.min(box[0], e);
                box[1] = Math.min(box[1], n);
                box[2] = Math.max(box[2], e);
                box[3] = Math.max(box[3], n);
            }
        }
        return box;
    }

    private static void writeAssets(Path file, Scenario s, SourceModel sources, Instant when) {
        GeometryFactory gf = new GeometryFactory();
        List<FeatureLayer.Column> cols = List.of(new FeatureLayer.Column("asset", FeatureLayer.ColumnType.TEXT),
                new FeatureLayer.Column("kind", FeatureLayer.ColumnType.TEXT),
                new FeatureLayer.Column("name", FeatureLayer.ColumnType.TEXT));
        List<FeatureLayer.Feature> lines = new ArrayList<>();
        for (SourceModel.PlacedLine l : sources.lines) {
            if (l.spec().asset() == null) {
                continue; // an uncharted line: in the truth, not on the chart
            }
            double[] v = chartVertices(l.spec(), s.origin());
            double de = v[3] - v[0], dn = v[4] - v[1], len = Math.hypot(de, dn);
            double re = dn / len * l.spec().chartShiftM(), rn = -de / len * l.spec().chartShiftM();
            Coordinate[] cs = new Coordinate[v.length / 3];
            for (int i = 0; i < cs.length; i++) {
                cs[i] = new Coordinate(round2(v[3 * i] + re), round2(v[3 * i + 1] + rn));
            }
            lines.add(new FeatureLayer.Feature(lines.size() + 1, gf.createLineString(cs),
                    attributes(l.spec().asset(), l.spec().kind(), l.spec().name())));
        }
        List<FeatureLayer.Feature> areas = new ArrayList<>();
        Scenario.Quay q = s.quay();
        if (q != null) {
            Coordinate[] cs = new Coordinate[q.outline().size() + 1];
            for (int i = 0; i < q.outline().size(); i++) {
                cs[i] = new Coordinate(s.origin()[0] + q.outline().get(i)[0], s.origin()[1] + q.outline().get(i)[1]);
            }
            cs[cs.length - 1] = cs[0];
            areas.add(new FeatureLayer.Feature(1, gf.createPolygon(cs), attributes(q.asset(), "quay", q.name())));
        }
        GeoPackageWriter.write(file, List.of(new FeatureLayer(ASSET_LINES, "LineString", s.crs(), cols, lines),
                new FeatureLayer(ASSET_AREAS, "Polygon", s.crs(), cols, areas)), when);
    }

    private static Map<String, Object> attributes(String asset, String kind, String name) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("asset", asset);
        m.put("kind", kind);
        m.put("name", name);
        return m;
    }

    private static double round2(double v) {
        return Math.round(v * 100) / 100.0;
    }

    private static void writeTruth(Path file, SourceModel sources, double f0) {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("id,class,x,y,depth_m,burial_m,mass_kg,moment_am2,mass_per_m_kg,moment_per_m_am2,length_m,asset,wkt\n");
            StringBuilder sb = new StringBuilder();
            for (SourceModel.Placed o : sources.objects) {
                sb.setLength(0);
                sb.append(o.id()).append(",discrete,");
                fixed(sb, o.x(), 2).append(',');
                fixed(sb, o.y(), 2).append(',');
                fixed(sb, o.depth(), 2).append(',');
                fixed(sb, o.burial(), 2).append(',');
                fixed(sb, o.massKg(), 2).append(',');
                fixed(sb, o.dipole().moment(), 5).append(",,,,,");
                w.write(sb.append('\n').toString());
            }
            for (SourceModel.PlacedLine l : sources.lines) {
                double[] v = l.xyz();
                double len = l.model().length();
                double[] mid = pointAlong(v, len / 2);
                sb.setLength(0);
                sb.append(l.spec().id()).append(",linear,");
                fixed(sb, mid[0], 2).append(',');
                fixed(sb, mid[1], 2).append(',');
                fixed(sb, mid[2], 2).append(',');
                fixed(sb, l.spec().burialM(), 2).append(',');
                fixed(sb, l.spec().massPerMetreKg() * len, 1).append(',');
                fixed(sb, l.model().momentPerMetre() * len, 4).append(',');
                fixed(sb, l.spec().massPerMetreKg(), 2).append(',');
                fixed(sb, l.model().momentPerMetre(), 5).append(',');
                fixed(sb, len, 2).append(',');
                sb.append(l.spec().asset() == null ? "" : l.spec().asset()).append(",\"LINESTRING (");
                for (int i = 0; i < v.length; i += 3) {
                    fixed(sb.append(i == 0 ? "" : ", "), v[i], 2).append(' ');
                    fixed(sb, v[i + 1], 2);
                }
                w.write(sb.append(")\"\n").toString());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), e);
        }
    }

    /** The point {@code dist} metres along a 3-D polyline given as x, y, z triples. */
    private static double[] pointAlong(double[] v, double dist) {
        double left = dist;
        for (int i = 0; i + 5 < v.length; i += 3) {
            double dx = v[i + 3] - v[i], dy = v[i + 4] - v[i + 1], dz = v[i + 5] - v[i + 2];
            double len = Math.sqrt(dx * dx + dy * dy + dz * dz);
            if (left <= len || i + 6 >= v.length) {
                double t = len == 0 ? 0 : Math.min(1, left / len);
                return new double[] {v[i] + t * dx, v[i + 1] + t * dy, v[i + 2] + t * dz};
            }
            left -= len;
        }
        return new double[] {v[0], v[1], v[2]};
    }

    private static void writeRecipe(Path file, Scenario s, TowPath path) {
        var mapper = Scenario.mapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode r = mapper.createObjectNode();
        r.put("name", s.name());
        r.put("crs", s.crs());
        ObjectNode survey = r.putObject("survey");
        survey.put("file", LINES);
        ObjectNode cols = survey.putObject("columns");
        for (String c : new String[] {"line", "time", "x", "y", "altitude", "depth"}) {
            cols.put(c, c);
        }
        ArrayNode sens = survey.putArray("sensors");
        for (Scenario.Sensor sr : s.array().sensors()) {
            sens.addObject().put("column", sr.column()).put("across_m", sr.acrossM()).put("along_m", sr.alongM());
        }
        ArrayNode ties = survey.putArray("tie_lines");
        path.tieNames.forEach(ties::add);
        r.putObject("base_station").put("file", BASE);
        r.putObject("field").put("inclination_deg", s.field().inclinationDeg())
                .put("declination_deg", s.field().declinationDeg()).put("intensity_nt", s.field().intensityNt());
        r.putObject("grid").put("cell_m", 0.5);
        r.putObject("bathymetry").put("file", BATHYMETRY);
        r.putObject("infrastructure").put("file", ASSETS);
        try {
            Files.writeString(file, mapper.writeValueAsString(r) + "\n", StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), e);
        }
    }

    /** A line's chart vertices (the scenario's path, not the densified model), as {x, y, 0} triples. */
    private static double[] chartVertices(Scenario.Linear l, double[] origin) {
        double[] v = new double[l.path().size() * 3];
        for (int i = 0; i < l.path().size(); i++) {
            v[3 * i] = origin[0] + l.path().get(i)[0];
            v[3 * i + 1] = origin[1] + l.path().get(i)[1];
        }
        return v;
    }
}
