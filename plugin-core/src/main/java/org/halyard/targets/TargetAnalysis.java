package org.halyard.targets;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.halyard.grid.Grid;
import org.halyard.grid.Progress;
import org.halyard.model.Dipole;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.linearref.LengthIndexedLine;

/**
 * The target stage of the pipeline: from field grids and line samples to characterised targets and linear
 * features matched to charted infrastructure.
 *
 * <p><b>Algorithm:</b> linear features first ({@link LinearFeatureDetector}), each with a median Euler
 * depth (structural index 2) from stations every {@value #FEATURE_STEP_M} m along it and an asset match; a
 * ridge where fewer stations than {@link LinearFeatureOptions#minEulerShare} give an accepted depth is not a
 * line source (the texture of gridded, levelled lines) and is dropped with a note; then peaks
 * ({@link PeakPicker}). A peak within the label distance of a feature, and not much stronger than it, is
 * class {@code linear} (Euler SI 2, the feature's asset); any other is {@code discrete}: Euler SI 3, a
 * dipole fit to the line samples started from the Euler solution (the fields of stronger picks already
 * fitted removed first), a mass range from the moment, and the
 * nearest asset within the buffer. Position and depth come from the dipole fit where it succeeded, else
 * from Euler, else the pick.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class TargetAnalysis {

    /** Spacing of Euler solutions along a linear feature, m. */
    static final double FEATURE_STEP_M = 5;

    private TargetAnalysis() {
    }

    /**
     * Runs the whole target stage.
     *
     * @param progress reports 0 to 100; cancellation throws {@link java.util.concurrent.CancellationException}
     * @return targets (x, y in the grids' CRS, depths in m positive down, amplitudes nT/m, moments A m2,
     *         masses kg) and features
     */
    public static TargetResult run(TargetInputs in, TargetOptions o, Progress progress) {
        Progress p = Progress.orNone(progress);
        List<String> notes = new ArrayList<>();
        Grid as = in.pickGrid();
        AssetMatcher matcher = new AssetMatcher(in.assets(), o.assetBufferM(), o.assetMinShare());
        List<LinearFeature> features = new ArrayList<>();
        List<LinearFeature> texture = new ArrayList<>();
        NoiseEstimate noise = NoiseEstimate.of(as);
        for (LinearFeature f : LinearFeatureDetector.detect(as, noise, o.linear(), p.slice(0, 30))) {
            double[] depths = stationDepths(in.grids(), f.line(), o.linearEuler());
            if (depths.length < o.linear().minEulerShare() * stationCount(f.line())) {
                texture.add(f);
                continue;
            }
            features.add(new LinearFeature(features.size() + 1, f.line(), f.amplitude(),
                    depths.length == 0 ? Double.NaN : NoiseEstimate.median(depths), matcher.match(f.line())));
        }
        GeometryFactory gf = new GeometryFactory();
        PeakPicker.Result peaks = PeakPicker.pick(as, noise, o.peaks(), p.slice(30, 40));
        // Maxima strung along a texture ridge are beads of that ridge: dropped like the ridge, unless they
        // stand out of it as an object on a cable does.
        List<Peak> list = peaks.peaks().stream()
                .filter(pk -> nearestFeature(pk, texture, o.linear(), gf).isEmpty()).toList();
        if (!texture.isEmpty()) {
            notes.add(String.format(java.util.Locale.ROOT, "%d analytic-signal ridge%s and the %d peaks along them"
                    + " dropped: Euler deconvolution (SI %.0f) accepted a depth at fewer than %.0f%% of the stations"
                    + " along each (not a line source: texture of the gridded lines)", texture.size(),
                    texture.size() == 1 ? "" : "s", peaks.peaks().size() - list.size(),
                    o.linearEuler().structuralIndex(), 100 * o.linear().minEulerShare()));
        }
        if (list.isEmpty()) {
            notes.add(String.format(java.util.Locale.ROOT,
                    "no peaks: the analytic signal nowhere exceeds the threshold %.4g nT/m (median %.4g + %.3g x noise %.4g)",
                    peaks.threshold(), peaks.noise().background(), o.peaks().thresholdFactor(), peaks.noise().sigma()));
        }
        if (in.bathymetry().isEmpty()) {
            notes.add(in.samples().size() > 0 && hasAltitude(in.samples())
                    ? "no bathymetry grid: burial from the sensor altitude"
                    : "no bathymetry grid and no sensor altitude: burial left empty");
        }
        if (in.samples().size() == 0) {
            notes.add("no line samples: no dipole fits, so no moments or masses");
        }
        List<Target> targets = new ArrayList<>();
        SampleIndex index = new SampleIndex(in.samples(), o.fit().radiusM());
        List<Dipole> fitted = new ArrayList<>();
        for (int k = 0; k < list.size(); k++) {
            p.slice(40, 100).report(100.0 * k / list.size());
            p.checkCanceled();
            Target t = characterise(k + 1, list.get(k), nearestFeature(list.get(k), features, o.linear(), gf),
                    in, index, o, matcher, fitted);
            t.fit().ifPresent(f -> fitted.add(f.dipole()));
            targets.add(t);
        }
        p.report(100);
        return new TargetResult(targets, features, peaks.noise(), peaks.threshold(), notes, o);
    }

    private static Target characterise(int id, Peak pk, Optional<LinearFeature> feature, TargetInputs in,
                                       SampleIndex index, TargetOptions o, AssetMatcher matcher, List<Dipole> fitted) {
        boolean linear = feature.isPresent();
        EulerOptions eo = linear ? o.linearEuler() : o.discreteEuler();
        Optional<EulerSolution> euler = linear
                ? EulerDeconvolution.solveAcross(in.grids(), pk.x(), pk.y(), strikeAt(feature.get().line(), pk.x(), pk.y()), eo)
                : EulerDeconvolution.solve(in.grids(), pk.x(), pk.y(), eo);
        Optional<DipoleFitResult> fit = linear || in.samples().size() == 0 ? Optional.empty()
                : fitDipole(pk, euler, in, index, o, near(fitted, pk, 4 * o.fit().radiusM()));
        double x = fit.map(f -> f.dipole().x()).orElse(euler.map(EulerSolution::x).orElse(pk.x()));
        double y = fit.map(f -> f.dipole().y()).orElse(euler.map(EulerSolution::y).orElse(pk.y()));
        double depth = fit.map(DipoleFitResult::depthBelowSensor).orElse(euler.map(EulerSolution::depth).orElse(Double.NaN));
        String method = fit.isPresent() ? "dipole-fit" : euler.map(e -> "euler-si" + (int) e.structuralIndex()).orElse("none");
        int[] near = index.near(x, y, o.fit().radiusM());
        Burial burial = Burial.of(in.bathymetry().orElse(null), x, y, depth,
                LineSamples.medianAt(in.samples().z(), near), LineSamples.medianAt(in.samples().altitude(), near));
        Optional<MassRange> mass = fit.map(f -> o.mass().massRange(f.dipole().moment(), in.fieldIntensityNt()));
        Optional<String> asset = linear ? feature.get().asset() : matcher.match(x, y);
        return new Target(id, x, y, linear ? TargetClass.LINEAR : TargetClass.DISCRETE, depth, method, burial,
                pk.amplitude(), euler, fit, mass, asset);
    }

    /** Start depths below the sensors tried from the pick besides the Euler solution, m. */
    static final double[] START_DEPTHS = {1.5, 3, 5};

    /**
     * The best fit from the Euler solution and from the pick at several depths, among those that land near
     * the peak (samples selected around the pick).
     */
    private static Optional<DipoleFitResult> fitDipole(Peak pk, Optional<EulerSolution> euler, TargetInputs in,
                                                       SampleIndex index, TargetOptions o, List<Dipole> known) {
        List<double[]> starts = new ArrayList<>();
        euler.ifPresent(e -> starts.add(new double[] {e.x(), e.y(), e.depth()}));
        starts.add(new double[] {pk.x(), pk.y(), o.startDepthM()});
        for (double d : START_DEPTHS) {
            starts.add(new double[] {pk.x(), pk.y(), d});
        }
        return DipoleFit.fit(index, in.field(), pk.x(), pk.y(), starts, o.fit(), known,
                r -> Math.hypot(r.dipole().x() - pk.x(), r.dipole().y() - pk.y())
                        <= Math.max(1, o.fit().maxShiftFactor() * r.depthBelowSensor()));
    }

    private static List<Dipole> near(List<Dipole> dipoles, Peak pk, double radius) {
        return dipoles.stream().filter(d -> Math.hypot(d.x() - pk.x(), d.y() - pk.y()) <= radius).toList();
    }

    /** The feature a peak lies on, if it is close enough and not much stronger than the feature. */
    static Optional<LinearFeature> nearestFeature(Peak pk, List<LinearFeature> features, LinearFeatureOptions o,
                                                  GeometryFactory gf) {
        Point pt = gf.createPoint(new Coordinate(pk.x(), pk.y()));
        LinearFeature best = null;
        double bestD = Double.POSITIVE_INFINITY;
        for (LinearFeature f : features) {
            double d = f.line().distance(pt);
            if (d <= o.labelDistanceM() && d < bestD && pk.amplitude() <= o.dominance() * f.amplitude()) {
                best = f;
                bestD = d;
            }
        }
        return Optional.ofNullable(best);
    }

    /** Number of Euler stations along a line: its ends and every {@value #FEATURE_STEP_M} m or so between. */
    static int stationCount(LineString line) {
        return Math.max(1, (int) Math.floor(line.getLength() / FEATURE_STEP_M)) + 1;
    }

    /**
     * Accepted Euler depths (m below the observation level, positive down) at the {@link #stationCount}
     * stations along the line, across its local strike.
     */
    static double[] stationDepths(FieldGrids grids, LineString line, EulerOptions eo) {
        LengthIndexedLine idx = new LengthIndexedLine(line);
        double len = line.getLength();
        int n = stationCount(line) - 1;
        List<Double> depths = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            Coordinate c = idx.extractPoint(len * i / n);
            EulerDeconvolution.solveAcross(grids, c.x, c.y, strikeAt(line, c.x, c.y), eo)
                    .ifPresent(s -> depths.add(s.depth()));
        }
        return depths.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Azimuth of the line's segment nearest (x, y), degrees clockwise from north. */
    static double strikeAt(LineString line, double x, double y) {
        LengthIndexedLine idx = new LengthIndexedLine(line);
        double at = idx.project(new Coordinate(x, y));
        double len = line.getLength();
        double step = Math.min(1, 0.5 * len);
        Coordinate a = idx.extractPoint(Math.max(0, at - step));
        Coordinate b = idx.extractPoint(Math.min(len, at + step));
        return Math.toDegrees(Math.atan2(b.x - a.x, b.y - a.y));
    }

    private static boolean hasAltitude(LineSamples s) {
        for (double a : s.altitude()) {
            if (!Double.isNaN(a)) {
                return true;
            }
        }
        return false;
    }
}
