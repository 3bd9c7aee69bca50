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
            double[] xyz = new double[l.path().size() * 3];
            for (int i = 0; i < l.path().size(); i++) {
                double e = oe + l.path().get(i)[0], n = on + l.path().get(i)[1];
                xyz[3 * i] = e;
                xyz[3 * i + 1] = n;
                xyz[3 * i + 2] = seabed.depth(e, n) + l.burialM();
            }
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
}
