package org.halyard.survey;

import java.util.Locale;

/** The HTML page of the QC report (see {@link QcReportWriter}). */
final class QcHtml {

    private QcHtml() {
    }

    static String page(ProcessedSurvey s, boolean altitude, boolean crossovers) {
        SurveyQc qc = s.qc();
        StringBuilder h = new StringBuilder(1 << 14);
        h.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>Survey QC: ")
                .append(esc(s.lines().source())).append("</title>\n<style>body{font-family:sans-serif;margin:2em}"
                + "table{border-collapse:collapse}td,th{border:1px solid #bbb;padding:2px 6px;text-align:right}"
                + "th{background:#eee}td.t{text-align:left}.warn{color:#b00}</style></head><body>\n");
        h.append("<h1>Survey QC: ").append(esc(s.lines().source())).append("</h1>\n<h2>Run notes</h2>\n<ul>\n");
        for (String m : s.messages()) {
            h.append("<li>").append(esc(m)).append("</li>\n");
        }
        h.append("</ul>\n<h2>Summary</h2>\n<table>\n");
        row(h, "lines", Integer.toString(s.lines().lineCount()));
        row(h, "samples", Integer.toString(s.lines().size()));
        row(h, "sensors", Integer.toString(s.sensors().size()));
        row(h, "spikes repaired", Integer.toString(qc.spikeCount()));
        row(h, "samples in base-station gaps", Integer.toString(qc.baseGapSamples()));
        row(h, "diurnal datum (nT)", QcReportWriter.num(qc.diurnalDatumNt(), 2));
        row(h, "coverage outline area (m\u00b2)", QcReportWriter.num(qc.coverageAreaM2(), 0));
        row(h, "altitude limit (m)", QcReportWriter.num(qc.altitudeLimitM(), 2));
        row(h, "line spacing limit (m)", QcReportWriter.num(qc.spacingLimitM(), 2));
        row(h, "area with spacing over the limit (%)", QcReportWriter.num(100 * qc.areaOverSpacing(), 1));
        h.append("</table>\n");
        if (crossovers) {
            h.append("<h2>Crossovers</h2>\n<table><tr><th></th><th>count</th><th>mean (nT)</th><th>RMS (nT)</th>"
                    + "<th>max |misfit| (nT)</th></tr>\n");
            stats(h, "before levelling", qc.before());
            stats(h, "after levelling", qc.after());
            h.append("</table>\n<p><img src=\"crossovers.png\" alt=\"crossover misfits\"></p>\n");
        }
        s.lag().ifPresent(l -> {
            h.append("<h2>Lag</h2>\n<table>\n");
            row(h, "estimated lag (s)", QcReportWriter.num(l.estimatedS(), 3));
            row(h, "pairs of opposite-direction lines", Integer.toString(l.pairs()));
            row(h, "lag applied to the positions (s)", QcReportWriter.num(l.appliedS(), 3));
            row(h, "opposite-line misfit before the shift (nT\u00b2)", QcReportWriter.num(l.misfitBefore(), 4));
            row(h, "opposite-line misfit after the shift (nT\u00b2)", QcReportWriter.num(l.misfitAfter(), 4));
            h.append("</table>\n");
        });
        s.microLevelling().ifPresent(m -> {
            h.append("<h2>Micro-levelling</h2>\n<table>\n");
            row(h, "traverse lines micro-levelled", Integer.toString(m.linesCorrected()));
            row(h, "traverse lines left alone", Integer.toString(m.linesSkipped()));
            row(h, "line spacing (m)", QcReportWriter.num(m.lineSpacingM(), 2));
            row(h, "across-line wavelength (m)", QcReportWriter.num(m.acrossWavelengthM(), 1));
            row(h, "along-line wavelength (m)", QcReportWriter.num(m.alongWavelengthM(), 1));
            row(h, "limit (nT)", QcReportWriter.num(m.limitNt(), 2));
            row(h, "RMS of the applied correction (nT)", QcReportWriter.num(m.rmsNt(), 3));
            row(h, "largest correction (nT)", QcReportWriter.num(m.maxAbsNt(), 3));
            row(h, "stations at the limit (%)", QcReportWriter.num(100 * m.clippedFraction(), 1));
            h.append("</table>\n");
        });
        h.append("<h2>Tracks</h2>\n<p><img src=\"tracks.png\" alt=\"track plot\"></p>\n");
        h.append("<h2>Noise</h2>\n<p><img src=\"noise.png\" alt=\"noise per line\"></p>\n");
        if (altitude) {
            h.append("<h2>Altitude</h2>\n<p><img src=\"altitude.png\" alt=\"altitude per line\"></p>\n");
        }
        h.append("<h2>Lines</h2>\n<p>Also in <a href=\"qc_lines.csv\">qc_lines.csv</a>.</p>\n<table><tr>");
        for (String c : QcReportWriter.LINES_HEADER.split(",")) {
            h.append("<th>").append(esc(c.replace('_', ' '))).append("</th>");
        }
        h.append("</tr>\n");
        for (LineQc q : qc.lines()) {
            boolean altBad = q.altitudeOverLimit() > 0;
            boolean spBad = q.spacingOverLimit() > 0;
            h.append("<tr><td class=\"t\">").append(esc(q.line())).append("</td><td class=\"t\">")
                    .append(q.tie() ? "tie" : "traverse").append("</td>");
            cell(h, Integer.toString(q.samples()), false);
            cell(h, QcReportWriter.num(q.lengthM(), 1), false);
            cell(h, QcReportWriter.num(q.durationS(), 1), false);
            cell(h, QcReportWriter.num(q.meanSpeedMs(), 2), false);
            cell(h, QcReportWriter.num(q.medianIntervalS(), 3), false);
            cell(h, Integer.toString(q.gaps()), q.gaps() > 0);
            cell(h, QcReportWriter.num(q.altitudeMeanM(), 2), false);
            cell(h, QcReportWriter.num(q.altitudeMaxM(), 2), altBad);
            cell(h, QcReportWriter.num(q.altitudeOverLimit(), 3), altBad);
            cell(h, Integer.toString(q.spikes()), q.spikes() > 0);
            cell(h, QcReportWriter.num(q.noiseNt(), 4), false);
            cell(h, QcReportWriter.num(q.spacingMedianM(), 2), false);
            cell(h, QcReportWriter.num(q.spacingOverLimit(), 3), spBad);
            cell(h, QcReportWriter.num(q.levellingNt(), 3), false);
            h.append("</tr>\n");
        }
        h.append("</table>\n");
        if (!qc.spikes().isEmpty()) {
            h.append("<h2>Spikes</h2>\n<p>").append(qc.spikeCount()).append(" found")
                    .append(qc.spikeCount() > qc.spikes().size() ? ", first " + qc.spikes().size() + " listed" : "")
                    .append(".</p>\n<table><tr><th>line</th><th>sensor</th><th>row</th><th>x (m)</th><th>y (m)</th>"
                            + "<th>time (UTC)</th></tr>\n");
            for (SpikeAt sp : qc.spikes()) {
                h.append("<tr><td class=\"t\">").append(esc(sp.line())).append("</td><td class=\"t\">")
                        .append(esc(sp.sensor())).append("</td>");
                cell(h, Integer.toString(sp.row()), false);
                cell(h, QcReportWriter.num(sp.x(), 2), false);
                cell(h, QcReportWriter.num(sp.y(), 2), false);
                h.append("<td class=\"t\">").append(java.time.Instant.ofEpochMilli(Math.round(sp.time() * 1000)))
                        .append("</td></tr>\n");
            }
            h.append("</table>\n");
        }
        return h.append("</body></html>\n").toString();
    }

    private static void row(StringBuilder h, String k, String v) {
        h.append("<tr><td class=\"t\">").append(esc(k)).append("</td><td>").append(esc(v)).append("</td></tr>\n");
    }

    private static void stats(StringBuilder h, String k, CrossoverStats s) {
        h.append(String.format(Locale.ROOT, "<tr><td class=\"t\">%s</td><td>%d</td><td>%.3f</td><td>%.3f</td>"
                + "<td>%.3f</td></tr>\n", esc(k), s.count(), s.meanNt(), s.rmsNt(), s.maxAbsNt()));
    }

    private static void cell(StringBuilder h, String v, boolean warn) {
        h.append(warn ? "<td class=\"warn\">" : "<td>").append(esc(v)).append("</td>");
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
