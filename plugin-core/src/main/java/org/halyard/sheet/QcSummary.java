package org.halyard.sheet;

import java.util.List;

/**
 * The QC summary of a survey for its report page: one row per check, and notes.
 *
 * @param checks checks in print order
 * @param notes  paragraphs after the table (what was skipped, assumptions), may be empty
 */
public record QcSummary(List<Check> checks, List<String> notes) {

    /**
     * One QC check.
     *
     * @param name    what was checked, e.g. {@code Fourth-difference noise, mag_port}
     * @param value   measured value with unit, e.g. {@code 0.021 nT}
     * @param limit   the acceptance limit with unit, e.g. {@code < 0.05 nT}, may be empty
     * @param verdict e.g. {@code pass}, {@code warn}, {@code fail}, may be empty
     */
    public record Check(String name, String value, String limit, String verdict) { }

    public QcSummary {
        checks = List.copyOf(checks);
        notes = List.copyOf(notes);
    }

    /** The summary as a table for {@link ReportPages}. */
    public TableModel toTable() {
        return new TableModel("QC summary", List.of("Check", "Value", "Limit", "Verdict"),
                checks.stream().map(c -> List.of(c.name(), c.value(), c.limit(), c.verdict())).toList(), notes);
    }
}
