package org.halyard.survey;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.halyard.grid.Progress;
import org.locationtech.jts.geom.Geometry;

/**
 * The survey stage of a run: raw lines to positioned, corrected, cleaned, levelled line data, gradients,
 * tracks and QC, in that order:
 * <ol>
 *   <li>diurnal correction from the base station, if any ({@link DiurnalCorrection}); without a recipe
 *       field, the field from the base station ({@link FieldEstimate#fromBaseStation});</li>
 *   <li>spike repair and noise ({@link SpikeDetector}) per sensor;</li>
 *   <li>when asked for, the lag estimate from opposite-direction lines ({@link LagEstimator}) and a shift of
 *       the reference positions by a given or the estimated lag ({@link LagShift});</li>
 *   <li>positioning: distance and smoothed heading ({@link TrackPositioning}), each sensor offset;</li>
 *   <li>levelling on traverse/tie crossovers of the sensor mean ({@link CrossoverFinder},
 *       {@link LineLevelling}), the same correction applied to every sensor of a line;</li>
 *   <li>when asked for, micro-levelling of the sensor mean ({@link MicroLevelling}), again the same
 *       correction for every sensor;</li>
 *   <li>gradients of adjacent sensor pairs sorted port to starboard ({@link PairGradient});</li>
 *   <li>QC: per line figures, spacing ({@link LineSpacing}), coverage outline, tracks.</li>
 * </ol>
 *
 * <p>Conventions: x east, y north (m, recipe CRS); depth down, altitude up (m); nT; nT/m; degrees.
 *
 * <p><b>Thread safety:</b> stateless; the input arrays are read, never changed.
 */
public final class SurveyProcessing {

    /** How many spikes the QC summary lists individually. */
    public static final int MAX_LISTED_SPIKES = 1000;

    private SurveyProcessing() {
    }

    /**
     * Processes the survey.
     *
     * @param input    the lines and tie-line names
     * @param options  processing settings
     * @param base     the base station, or null for none (the diurnal correction is then skipped)
     * @param progress progress (0..100) and cancellation, or null
     * @return positions, corrected values, gradients, crossovers, tracks, QC and messages
     * @throws IllegalArgumentException for inconsistent input (a base station not covering the survey, ...)
     */
    public static ProcessedSurvey run(SurveyInput input, SurveyOptions options, BaseStation base, Progress progress) {
        Progress p = Progress.orNone(progress);
        SurveyLines lines = input.lines(); // replaced by the shifted lines when a lag is applied
        boolean[] isTie = input.tieMask();
        List<String> messages = new ArrayList<>();
        java.util.Map<String, Double> stages = new java.util.LinkedHashMap<>();
        long clock = cpuNanos();
        int n = lines.size();
        int ns = lines.sensors().size();
        messages.add(String.format(Locale.ROOT, "survey %s: %d lines (%d tie), %d samples, %d sensors",
                lines.source(), lines.lineCount(), input.tieLines().size(), n, ns));

        // diurnal (times only: positions may still move by a lag shift)
        double[] diurnal = null;
        double datum = Double.NaN;
        int baseGaps = 0;
        if (base != null && !lines.hasTime()) {
            messages.add("diurnal correction skipped: the survey has no time column");
        } else if (base != null) {
            double gap = Double.isNaN(options.baseGapLimitS()) ? 3 * base.cadenceSeconds() : options.baseGapLimitS();
            DiurnalCorrection.Result d = DiurnalCorrection.compute(lines.source(), lines.time(), base,
                    options.diurnalDatumNt(), gap);
            diurnal = d.correction();
            datum = d.datumNt();
            baseGaps = d.flagged();
            messages.add(String.format(Locale.ROOT, "diurnal correction from %s (%s, %.0f s cadence) about a datum of "
                            + "%.2f nT (%s); gaps over %.0f s not bridged", base.source(), base.reported(),
                    base.cadenceSeconds(), datum, Double.isNaN(options.diurnalDatumNt()) ? "median base F over the survey"
                            : "stated", gap));
            if (baseGaps > 0) {
                messages.add(String.format(Locale.ROOT, "%d samples fall in base-station gaps and are flagged base_gap "
                        + "(first at line %s, %s)", baseGaps, lines.lineId(lines.lineOfRow(d.firstFlaggedRow())),
                        java.time.Instant.ofEpochMilli(Math.round(lines.time()[d.firstFlaggedRow()] * 1000))));
            }
        } else {
            messages.add("no base station: diurnal correction skipped");
        }
        Optional<FieldEstimate> field = options.field();
        if (field.isEmpty() && base != null && lines.hasTime()) {
            double[] span = span(lines.time());
            FieldEstimate f = FieldEstimate.fromBaseStation(base, span[0], span[1]);
            messages.add(f.source());
            field = Optional.of(f);
        } else if (field.isEmpty()) {
            messages.add("no field block and no base station: the field direction is unknown to this stage");
        }
        clock = lap(stages, "diurnal", clock);
        p.report(25);
        p.checkCanceled();

        // corrected copies and spikes per sensor
        double[][] values = new double[ns][];
        byte[][] sensorFlags = new byte[ns][];
        int[][] spikeRows = new int[ns][];
        List<double[]> noise = new ArrayList<>();
        for (int s = 0; s < ns; s++) {
            double[] v = lines.values(s).clone();
            byte[] flags = new byte[n];
            for (int i = 0; i < n; i++) {
                if (Double.isNaN(v[i])) {
                    flags[i] |= SampleFlags.MISSING;
                }
                if (diurnal != null) {
                    if (Double.isNaN(diurnal[i])) {
                        flags[i] |= SampleFlags.BASE_GAP;
                    }
                    v[i] -= diurnal[i];
                }
            }
            SpikeDetector.Result sp = SpikeDetector.clean(lines, v, flags, options.spikeThresholdSigmas());
            noise.add(sp.noiseNt());
            values[s] = v;
            sensorFlags[s] = flags;
            spikeRows[s] = sp.spikeRows();
            p.report(25 + 15.0 * (s + 1) / ns);
            p.checkCanceled();
        }
        clock = lap(stages, "spikes", clock);

        // lag: estimated on the cleaned sensor mean, applied by moving the reference positions along track
        Optional<LagOutcome> lag = Optional.empty();
        if (options.lag().any()) {
            LagResult lr = lag(lines, sensorMean(values, n), isTie, options.lag(), messages);
            lines = lr.lines();
            lag = Optional.of(lr.outcome());
            clock = lap(stages, "lag", clock);
        }

        double[] dist = new double[n];
        float[] heading = new float[n];
        TrackPositioning.compute(lines, options.headingSmoothingM(), dist, heading);
        List<SensorTrack> tracks = new ArrayList<>(ns);
        List<SpikeAt> spikeList = new ArrayList<>();
        int[] spikesPerLine = new int[lines.lineCount()];
        int spikeCount = 0;
        for (int s = 0; s < ns; s++) {
            SensorSpec spec = lines.sensors().get(s);
            double[] sx = new double[n], sy = new double[n];
            TrackPositioning.offset(lines.x(), lines.y(), heading, spec.acrossM(), spec.alongM(), sx, sy);
            spikeCount += spikeRows[s].length;
            for (int r : spikeRows[s]) {
                int l = lines.lineOfRow(r);
                spikesPerLine[l]++;
                if (spikeList.size() < MAX_LISTED_SPIKES) {
                    spikeList.add(new SpikeAt(lines.lineId(l), spec.column(), r, sx[r], sy[r], lines.time()[r]));
                }
            }
            tracks.add(new SensorTrack(spec, sx, sy, lines.depth(), lines.altitude(), values[s], sensorFlags[s]));
        }
        p.report(45);
        p.checkCanceled();
        messages.add(spikeCount == 0 ? "no spikes found" : String.format(Locale.ROOT,
                "%d spikes found and repaired (threshold %.1f MAD sigmas of the fourth difference)%s", spikeCount,
                options.spikeThresholdSigmas(), spikeList.isEmpty() ? "" : "; first at line " + spikeList.get(0).line()
                        + ", sensor " + spikeList.get(0).sensor() + ", row " + spikeList.get(0).row()));
        clock = lap(stages, "positioning", clock);

        // levelling
        List<Crossover> crossovers = List.of();
        CrossoverStats before = CrossoverStats.of(List.of(), Crossover::misfit), after = before;
        Optional<LineLevelling.Solution> solution = Optional.empty();
        double[] levelPerLine = new double[lines.lineCount()];
        Arrays.fill(levelPerLine, Double.NaN);
        if (options.trend() == LevellingTrend.NONE) {
            messages.add("levelling off");
        } else if (input.tieLines().isEmpty()) {
            messages.add("no tie lines in the recipe: levelling skipped");
        } else {
            double[] mean = sensorMean(tracks, n);
            crossovers = CrossoverFinder.find(lines, mean, isTie);
            LineLevelling.Solution sol = LineLevelling.solve(lines, isTie, crossovers, options.trend(),
                    options.adjustTies());
            solution = Optional.of(sol);
            before = CrossoverStats.of(crossovers, Crossover::misfit);
            after = CrossoverStats.of(crossovers, c -> c.misfit() + sol.correction(c.traverseLine(), c.traverseTime())
                    - sol.correction(c.tieLine(), c.tieTime()));
            List<String> unlevelled = new ArrayList<>();
            double[] t = lines.time();
            for (int l = 0; l < lines.lineCount(); l++) {
                int s0 = lines.start(l), e0 = lines.end(l);
                boolean adjustable = !isTie[l] || options.adjustTies();
                if (adjustable && sol.order()[l] < 0) {
                    unlevelled.add(lines.lineId(l));
                    for (SensorTrack st : tracks) {
                        for (int i = s0; i < e0; i++) {
                            st.flags()[i] |= SampleFlags.UNLEVELLED;
                        }
                    }
                    continue;
                }
                if (sol.order()[l] < 0) {
                    continue;
                }
                double sum = 0;
                for (int i = s0; i < e0; i++) {
                    double c = sol.correction(l, t[i]);
                    sum += c;
                    for (SensorTrack st : tracks) {
                        st.value()[i] += c;
                    }
                }
                levelPerLine[l] = e0 > s0 ? sum / (e0 - s0) : 0;
            }
            messages.add(String.format(Locale.ROOT, "levelling (%s, tie lines %s): %d crossovers, misfit RMS %.3f nT "
                            + "before, %.3f nT after", options.trend().name().toLowerCase(Locale.ROOT),
                    options.adjustTies() ? "adjusted, zero mean" : "fixed as datum", crossovers.size(), before.rmsNt(),
                    after.rmsNt()));
            if (!unlevelled.isEmpty()) {
                messages.add(unlevelled.size() + " lines have no crossover and were not levelled (flagged unlevelled): "
                        + String.join(", ", unlevelled.subList(0, Math.min(10, unlevelled.size())))
                        + (unlevelled.size() > 10 ? ", ..." : ""));
            }
        }
        clock = lap(stages, "levelling", clock);
        Optional<MicroLevelling.Result> micro = Optional.empty();
        if (options.microLevelling().isPresent()) {
            MicroLevelling.Result m = MicroLevelling.compute(lines, sensorMean(tracks, n), isTie,
                    options.microLevelling().get());
            double[] c = m.correctionNt();
            for (SensorTrack st : tracks) {
                double[] v = st.value();
                for (int i = 0; i < n; i++) {
                    v[i] += c[i];
                }
            }
            messages.add(m.note());
            micro = Optional.of(m);
            clock = lap(stages, "micro-levelling", clock);
        }
        p.report(70);
        p.checkCanceled();

        // gradients of adjacent pairs, port to starboard
        List<GradientPoints> grads = new ArrayList<>();
        if (options.gradients() && ns >= 2) {
            List<SensorTrack> sorted = new ArrayList<>(tracks);
            sorted.sort(Comparator.comparingDouble(st -> st.spec().acrossM()));
            for (int k = 0; k + 1 < sorted.size(); k++) {
                grads.add(PairGradient.compute(lines, sorted.get(k), sorted.get(k + 1), dist, heading));
            }
        } else if (ns < 2) {
            messages.add("one sensor: no transverse gradient");
        }
        clock = lap(stages, "gradients", clock);
        p.report(80);
        p.checkCanceled();

        // QC
        LineSpacing.Result spacing = null;
        double areaOver = Double.NaN;
        if (!Double.isNaN(options.lineSpacingLimitM())) {
            spacing = LineSpacing.compute(lines, dist, heading, isTie, options.lineSpacingLimitM(),
                    Math.max(1, options.lineSpacingLimitM() / 2));
            areaOver = spacing.areaOverLimit();
            messages.add(Double.isNaN(areaOver)
                    ? "line spacing not measured: no traverse line has a neighbour within reach"
                    : String.format(Locale.ROOT, "line spacing over %.1f m on %.1f%% of the area between traverse lines",
                    options.lineSpacingLimitM(), 100 * areaOver));
        }
        List<LineQc> lineQc = LineStatistics.compute(lines, isTie, dist, options, spikesPerLine,
                LineStatistics.maxNoise(noise, lines.lineCount()), spacing, levelPerLine);
        Geometry outline = TrackBuilder.outline(lines, tracks, dist, options.lineSpacingLimitM());
        List<TrackFeature> trackFeatures = TrackBuilder.tracks(lines, tracks, lineQc, options.trackToleranceM());
        SurveyQc qc = new SurveyQc(lineQc, spikeList, spikeCount, baseGaps, options.altitudeLimitM(),
                options.lineSpacingLimitM(), areaOver, outline, outline.getArea(), before, after, datum);
        lap(stages, "qc and tracks", clock);
        p.report(100);
        return new ProcessedSurvey(lines, isTie, dist, heading, tracks, grads, crossovers, solution, field, qc,
                trackFeatures, messages, stages, lag, micro);
    }

    private static final java.lang.management.ThreadMXBean THREADS = java.lang.management.ManagementFactory.getThreadMXBean();

    /** Records the CPU seconds of this thread since {@code since} (ns) under {@code name}; wall time on a
     * shared machine says more about the neighbours than about the stage. */
    private static long lap(java.util.Map<String, Double> stages, String name, long since) {
        long now = cpuNanos();
        stages.put(name, (now - since) / 1e9);
        return now;
    }

    private static long cpuNanos() {
        return THREADS.isCurrentThreadCpuTimeSupported() ? THREADS.getCurrentThreadCpuTime() : System.nanoTime();
    }

    /** Mean of the sensors' values per row, NaN where any is missing. */
    static double[] sensorMean(List<SensorTrack> tracks, int n) {
        double[][] v = new double[tracks.size()][];
        for (int s = 0; s < v.length; s++) {
            v[s] = tracks.get(s).value();
        }
        return sensorMean(v, n);
    }

    /** Mean of the sensors' values per row ({@code values[sensor][row]}), NaN where any is missing. */
    static double[] sensorMean(double[][] values, int n) {
        double[] m = new double[n];
        for (double[] v : values) {
            for (int i = 0; i < n; i++) {
                m[i] += v[i];
            }
        }
        for (int i = 0; i < n; i++) {
            m[i] /= values.length;
        }
        return m;
    }

    private record LagResult(SurveyLines lines, LagOutcome outcome) {
    }

    /** Estimates and/or applies the lag as asked; says what it did in {@code messages}. */
    private static LagResult lag(SurveyLines lines, double[] mean, boolean[] isTie, LagOptions o, List<String> messages) {
        if (!lines.hasTime()) {
            throw new IllegalArgumentException(lines.source() + ": the lag estimate and shift need a time column");
        }
        double estimated = Double.NaN;
        int pairs = 0;
        if (o.estimate()) {
            try {
                LagEstimator.Result r = LagEstimator.estimate(lines, mean, isTie, o.maxLagS());
                estimated = r.lagS();
                pairs = r.pairs();
                messages.add(String.format(Locale.ROOT, "lag estimated from %d pairs of opposite-direction lines: "
                        + "%.3f s (readings %s; searched +-%.2f s)", pairs, estimated,
                        estimated >= 0 ? "late" : "early", o.maxLagS()));
                if (Math.abs(estimated) >= o.maxLagS() * 0.999) {
                    messages.add("the lag estimate is at the edge of the search range: widen it before trusting it");
                }
            } catch (IllegalArgumentException e) {
                if (o.applyEstimate()) {
                    throw e;
                }
                messages.add("lag not estimated: " + e.getMessage());
            }
        }
        double applied = o.applyEstimate() ? estimated : o.givenLagS();
        if (Double.isNaN(applied)) {
            return new LagResult(lines, new LagOutcome(estimated, pairs, Double.NaN, Double.NaN, Double.NaN));
        }
        SurveyLines shifted = LagShift.apply(lines, applied);
        double before = Double.NaN, after = Double.NaN;
        try {
            before = LagEstimator.meanMisfit(lines, mean, isTie, 0);
            after = LagEstimator.meanMisfit(shifted, mean, isTie, 0);
        } catch (IllegalArgumentException e) {
            // no opposite-direction pairs: nothing to compare, the shift still applies
        }
        messages.add(String.format(Locale.ROOT, "positions shifted along track by a lag of %.3f s (%s)%s", applied,
                o.applyEstimate() ? "estimated" : "given", Double.isNaN(before) ? ""
                        : String.format(Locale.ROOT, "; opposite-line misfit %.4f nT^2 before, %.4f nT^2 after", before,
                        after)));
        return new LagResult(shifted, new LagOutcome(estimated, pairs, applied, before, after));
    }

    private static double[] span(double[] t) {
        double a = Double.POSITIVE_INFINITY, b = Double.NEGATIVE_INFINITY;
        for (double v : t) {
            a = Math.min(a, v);
            b = Math.max(b, v);
        }
        return new double[] {a, b};
    }
}
