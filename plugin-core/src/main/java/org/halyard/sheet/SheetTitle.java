package org.halyard.sheet;

/**
 * What the title block says about the job, the same on every sheet of a series.
 *
 * @param project  project name
 * @param area     survey area or site name
 * @param date     issue date as printed, e.g. {@code 2026-12-01}
 * @param revision revision letter or number, e.g. {@code A}
 */
public record SheetTitle(String project, String area, String date, String revision) {

    public SheetTitle {
        if (project == null || project.isBlank()) {
            throw new IllegalArgumentException("sheet title needs a project name");
        }
        area = area == null ? "" : area;
        date = date == null || date.isBlank() ? java.time.LocalDate.now().toString() : date;
        revision = revision == null || revision.isBlank() ? "0" : revision;
    }
}
