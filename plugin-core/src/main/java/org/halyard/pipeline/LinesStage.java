package org.halyard.pipeline;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.halyard.grid.Progress;
import org.halyard.io.Iaga2002Reader;
import org.halyard.io.SurveyCsvReader;
import org.halyard.io.TrackLayer;
import org.halyard.survey.BaseStation;
import org.halyard.survey.FieldEstimate;
import org.halyard.survey.ProcessedSurvey;
import org.halyard.survey.SensorTrack;
import org.halyard.survey.SurveyColumns;
import org.halyard.survey.SurveyInput;
import org.halyard.survey.SurveyLines;
import org.halyard.survey.SurveyOptions;
import org.halyard.survey.SurveyProcessing;
import org.halyard.targets.LineSamples;

/**
 * Survey lines to corrected, levelled line data: import, positioning, diurnal correction, spikes,
 * levelling, gradients, QC report ({@code report/qc.html}, {@code report/qc_lines.csv}) and tracks.
 * Settles the Earth field for later stages: the recipe's, else the base station's.
 */
final class LinesStage implements Stage {

    @Override
    public String name() {
        return "lines";
    }

    @Override
    public void run(RunContext ctx, Progress p) {
        Recipe r = ctx.recipe();
        SurveyColumns cols = SurveyColumns.fromRecipe(r.survey().columns(), r.survey().sensors());
        SurveyLines lines = SurveyCsvReader.read(r.survey().file(), cols, r.crs(), r.survey().skipBadRows(),
                ctx::note, p.slice(0, 40));
        BaseStation base = null;
        if (r.baseStation() != null) {
            base = Iaga2002Reader.read(r.baseStation());
        } else {
            ctx.note("base_station block absent: no diurnal correction");
        }
        Optional<FieldEstimate> field = r.field() == null ? Optional.empty()
                : Optional.of(new FieldEstimate(r.field().direction(), r.field().intensityNt(), "the recipe's field block"));
        SurveyOptions options = SurveyOptions.defaults().withField(field).withLag(r.survey().lag())
                .withMicroLevelling(r.survey().microLevelling());
        ProcessedSurvey ps = SurveyProcessing.run(new SurveyInput(lines, Set.copyOf(r.survey().tieLines())), options,
                base, p.slice(40, 90));
        ps.messages().forEach(m -> ctx.log().note(m));
        if (ps.field().isPresent()) {
            FieldEstimate f = ps.field().get();
            ctx.field = f.direction();
            ctx.fieldIntensityNt = f.intensityNt();
            if (r.field() == null) {
                ctx.note(f.source()); // the estimate's own sentence names the station and the numbers
            }
        } else {
            ctx.note("field direction unknown: no field block and no usable base station; reduction to pole skipped");
        }
        ctx.survey = ps;
        ctx.tracks = TrackLayer.of(ps.tracks(), r.crs());
        ctx.samples = samples(ps.sensors());
        ctx.qcSummary = QcChecks.summary(ps);
        if (lines.hasTime() && lines.size() > 0) {
            ctx.firstSampleMillis = Math.round(lines.time()[0] * 1000);
        }
        org.halyard.survey.QcReportWriter.write(ps, ctx.work().resolve("report"));
        ctx.log().param("samples", lines.size());
        ctx.log().param("crossover rms before levelling (nT)", ps.qc().before().rmsNt());
        ctx.log().param("crossover rms after levelling (nT)", ps.qc().after().rmsNt());
        ps.lag().ifPresent(l -> {
            if (!Double.isNaN(l.estimatedS())) {
                ctx.log().param("lag estimated (s)", l.estimatedS());
                ctx.log().param("lag estimate pairs of opposite lines", l.pairs());
            }
            if (!Double.isNaN(l.appliedS())) {
                ctx.log().param("lag applied (s)", l.appliedS());
                ctx.log().param("opposite-line misfit before lag shift (nT^2)", l.misfitBefore());
                ctx.log().param("opposite-line misfit after lag shift (nT^2)", l.misfitAfter());
            }
        });
        ps.microLevelling().ifPresent(m -> {
            ctx.log().param("micro-levelling lines", m.linesCorrected());
            ctx.log().param("micro-levelling across wavelength (m)", m.acrossWavelengthM());
            ctx.log().param("micro-levelling along wavelength (m)", m.alongWavelengthM());
            ctx.log().param("micro-levelling limit (nT)", m.limitNt());
            ctx.log().param("micro-levelling correction rms (nT)", m.rmsNt());
            ctx.log().param("micro-levelling correction max (nT)", m.maxAbsNt());
        });
        p.report(100);
    }

    /**
     * Every sensor's usable readings pooled for the dipole fits, as anomalies about the median level of the
     * survey (the fits also solve for a local background).
     */
    static LineSamples samples(List<SensorTrack> sensors) {
        int n = 0;
        for (SensorTrack s : sensors) {
            for (double v : s.value()) {
                n += Double.isFinite(v) ? 1 : 0;
            }
        }
        double[] x = new double[n], y = new double[n], z = new double[n], a = new double[n], alt = new double[n];
        int k = 0;
        for (SensorTrack s : sensors) {
            for (int i = 0; i < s.size(); i++) {
                if (Double.isFinite(s.value()[i])) {
                    x[k] = s.x()[i];
                    y[k] = s.y()[i];
                    z[k] = s.depth()[i];
                    a[k] = s.value()[i];
                    alt[k] = s.altitude()[i];
                    k++;
                }
            }
        }
        double level = median(a);
        for (int i = 0; i < n; i++) {
            a[i] -= level;
        }
        return new LineSamples(x, y, z, a, alt);
    }

    static double median(double[] v) {
        if (v.length == 0) {
            return 0;
        }
        double[] c = v.clone();
        Arrays.sort(c);
        return c[c.length / 2];
    }
}
