package org.halyard.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.halyard.model.Dipole;
import org.halyard.model.DipoleLine;
import org.halyard.model.FieldDirection;
import org.halyard.model.Prism;
import org.halyard.model.SteelSphere;

/**
 * Every magnetic source of a scenario, placed in the projected CRS: objects as dipoles, cables and pipes
 * as dipole lines, geology as prisms. Depths are below the sea surface, positive down.
 *
 * <p><b>Thread safety:</b> immutable after construction; {@link #anomaly} may be called from many threads.
 */
final class SourceModel {

    /** One discrete object as placed, with what the truth file reports. */
    record Placed(String id, double x, double y, double depth, double burial, double massKg, Dipole dipole) { }

    /** One cable or pipe as placed (true position, world coordinates). */
    record PlacedLine(Scenario.Linear spec, double[] xyz, DipoleLine model) { }

    final List<Placed> objects = new ArrayList<>();
    final List<PlacedLine> lines = new ArrayList<>();
    final List<Prism> prisms = new ArrayList<>();
    final FieldDirection field;
    private final double fe, fn, fd;

    /** Spacing of the dipoles along cables and pipes, m: a third of the closest sensor distance or less. */
    static final double LINE_DIPOLE_SPACING = 0.25;

    SourceModel(Scenario s, AnalyticSeabed seabed, Random rng) {
        Scenario.Field f = s.field();
        field = new FieldDirection(f.inclinationDeg(), f.declinationDeg());
        fe = field.east();
        fn = field.north();
        fd = field.down();
        double oe = s.origin()[0], on = s.origin()[1];
        for (Scenario.Target t : s.objects()) {
            place(t, oe, on, seabed, f);
        }
        Scenario.RandomTargets r = s.randomObjects();
        if (r != null) {
            Scenario.Area a = s.area();
            double az = Math.toRadians(a.lineAzimuthDeg());
            for (int i = 0; i < r.count(); i++) {
                double u = rng.nextDouble() * a.lengthM(), v = rng.nextDouble() * a.widthM();
                double x = u * Math.sin(az) + v * Math.cos(az), y = u * Math.cos(az) - v * Math.sin(az);
                double mass = r.massMinKg() * Math.pow(r.massMaxKg() / r.massMinKg(), rng.nextDouble());
                double burial = rng.nextDouble() * r.burialMaxM();
                double q = rng.nextDouble() * r.remanentRatioMax();
                double inc = Math.toDegrees(Math.asin(2 * rng.nextDouble() - 1)), dec = 360 * rng.nextDouble();
                place(new Scenario.Target(String.format("R%03d", i + 1), x, y, burial, mass, q, inc, dec), oe, on, seabed, f);
            }
        }
        for (Scenario.Linear l : s.linears()) {
            double[] xyz = followSeabed(l, oe, on, seabed);
            double mpm = DipoleLine.inducedMomentPerMetre(l.massPerMetreKg(), f.intensityNt());
            lines.add(new PlacedLine(l, xyz, new DipoleLine(xyz, mpm, field, LINE_DIPOLE_SPACING)));
        }
        for (Scenario.Body b : s.geology()) {
            prisms.add(Prism.induced(oe + b.xMin(), oe + b.xMax(), on + b.yMin(), on + b.yMax(), b.topM(), b.bottomM(),
                    b.susceptibility(), f.intensityNt(), field));
        }
    }

    private void place(Scenario.Target t, double oe, double on, AnalyticSeabed seabed, Scenario.Field f) {
        double e = oe + t.x(), n = on + t.y();
        double depth = seabed.depth(e, n) + t.burialM();
        double mi = SteelSphere.inducedMoment(t.massKg(), f.intensityNt());
        FieldDirection rem = new FieldDirection(t.remanenceInclinationDeg(), t.remanenceDeclinationDeg());
        double mr = t.remanentRatio() * mi;
        Dipole d = new Dipole(e, n, depth, mi * field.east() + mr * rem.east(), mi * field.north() + mr * rem.north(),
                mi * field.down() + mr * rem.down());
        objects.add(new Placed(t.id(), e, n, depth, t.burialM(), t.massKg(), d));
    }

    /**
     * Total-field anomaly of every source at a sensor, nT.
     *
     * @param e easting, m; @param n northing, m; @param z sensor depth below the sea surface, m, positive down
     */
    double anomaly(double e, double n, double z) {
        double sum = 0;
        for (Placed p : objects) {
            Dipole d = p.dipole();
            sum += Dipole.totalField(e - d.x(), n - d.y(), z - d.z(), d.mx(), d.my(), d.mz(), fe, fn, fd);
        }
        for (PlacedLine l : lines) {
            sum += l.model().totalField(e, n, z, field);
        }
        for (Prism p : prisms) {
            sum += p.totalField(e, n, z, field);
        }
        return sum;
    }

    /** Vertex spacing of a buried line, metres: fine enough to follow channels and sand waves. */
    static final double LINE_VERTEX_SPACING_M = 1.0;

    /**
     * The path of a cable or pipe, densified to {@link #LINE_VERTEX_SPACING_M} and laid {@code burialM} below
     * the seabed at every vertex, as {x, y, depth} triples. Interpolating the depth between far-apart chart
     * vertices instead would leave the line hanging in the water over a channel, where the towed sensors,
     * which follow the seabed, would pass through it.
     */
    static double[] followSeabed(Scenario.Linear l, double oe, double on, AnalyticSeabed seabed) {
        java.util.List<double[]> pts = new java.util.ArrayList<>();
        java.util.List<double[]> path = l.path();
        for (int i = 0; i + 1 < path.size(); i++) {
            double e0 = oe + path.get(i)[0], n0 = on + path.get(i)[1];
            double e1 = oe + path.get(i + 1)[0], n1 = on + path.get(i + 1)[1];
            int steps = Math.max(1, (int) Math.ceil(Math.hypot(e1 - e0, n1 - n0) / LINE_VERTEX_SPACING_M));
            for (int k = 0; k < steps; k++) {
                double t = (double) k / steps;
                pts.add(new double[] {e0 + t * (e1 - e0), n0 + t * (n1 - n0)});
            }
        }
        double[] last = path.get(path.size() - 1);
        pts.add(new double[] {oe + last[0], on + last[1]});
        double[] xyz = new double[pts.size() * 3];
        for (int i = 0; i < pts.size(); i++) {
            double e = pts.get(i)[0], n = pts.get(i)[1];
            xyz[3 * i] = e;
            xyz[3 * i + 1] = n;
            xyz[3 * i + 2] = seabed.depth(e, n) + l.burialM();
        }
        return xyz;
    }
}
