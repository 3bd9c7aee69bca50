package org.halyard.pipeline;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.halyard.sheet.QcSummary;
import org.halyard.survey.LineQc;
import org.halyard.survey.ProcessedSurvey;
import org.halyard.survey.SurveyQc;

/** The survey's QC figures as the checks of the QC summary page. */
final class QcChecks {

    private QcChecks() {
    }

    static QcSummary summary(ProcessedSurvey ps) {
        SurveyQc q = ps.qc();
        List<QcSummary.Check> checks = new ArrayList<>();
        int ties = 0;
        double length = 0, noise = 0;
        int gaps = 0;
        for (LineQc l : q.lines()) {
            ties += l.tie() ? 1 : 0;
            length += l.lengthM();
            gaps += l.gaps();
            noise = Math.max(noise, Double.isFinite(l.noiseNt()) ? l.noiseNt() : 0);
        }
        checks.add(new QcSummary.Check("lines (tie lines)", q.lines().size() + " (" + ties + ")", "", ""));
        checks.add(new QcSummary.Check("line length", fmt("%.0f m", length), "", ""));
        checks.add(new QcSummary.Check("coverage area", fmt("%.0f m2", q.coverageAreaM2()), "", ""));
        checks.add(new QcSummary.Check("gaps in lines", Integer.toString(gaps), "", gaps == 0 ? "ok" : "review"));
        checks.add(new QcSummary.Check("spikes repaired", Integer.toString(q.spikeCount()), "", ""));
        checks.add(new QcSummary.Check("largest line noise (4th difference)", fmt("%.3f nT", noise), "", ""));
        checks.add(new QcSummary.Check("samples in base-station gaps", Integer.toString(q.baseGapSamples()), "",
                q.baseGapSamples() == 0 ? "ok" : "flagged"));
        if (Double.isFinite(q.spacingLimitM())) {
            checks.add(new QcSummary.Check("area over line-spacing limit", fmt("%.1f %%", 100 * q.areaOverSpacing()),
                    fmt("%.1f m", q.spacingLimitM()), q.areaOverSpacing() == 0 ? "ok" : "review"));
        }
        checks.add(new QcSummary.Check("crossovers", Integer.toString(q.before().count()), "", ""));
        checks.add(new QcSummary.Check("crossover RMS before levelling", fmt("%.3f nT", q.before().rmsNt()), "", ""));
        checks.add(new QcSummary.Check("crossover RMS after levelling", fmt("%.3f nT", q.after().rmsNt()), "", ""));
        ps.lag().filter(l -> !Double.isNaN(l.estimatedS())).ifPresent(l -> checks.add(new QcSummary.Check(
                "lag estimated from opposite-direction lines", fmt("%.3f s", l.estimatedS()), "", "")));
        ps.lag().filter(l -> !Double.isNaN(l.appliedS())).ifPresent(l -> checks.add(new QcSummary.Check(
                "lag applied to the positions", fmt("%.3f s", l.appliedS()), "", "")));
        ps.microLevelling().ifPresent(m -> checks.add(new QcSummary.Check("micro-levelling correction RMS",
                fmt("%.3f nT", m.rmsNt()), fmt("%.2f nT", m.limitNt()), "")));
        return new QcSummary(checks, List.of("Per-line figures: report/qc_lines.csv and report/qc.html."));
    }

    private static String fmt(String f, Object... a) {
        return String.format(Locale.ROOT, f, a);
    }
}
