package org.halyard.pipeline;

import java.nio.file.Path;
import org.halyard.grid.Grid;
import org.halyard.model.FieldDirection;

/** What the stages of one run share: the recipe, the staging folder, the log and the results so far. */
final class RunContext {

    private final Recipe recipe;
    private final Path work;
    private final RunLog log;
    private final RunListener listener;

    /** Earth-field direction once known (recipe, base station), else null. */
    FieldDirection field;
    /** Earth-field intensity in nT once known, else NaN. */
    double fieldIntensityNt = Double.NaN;
    /** The processed survey lines. */
    org.halyard.survey.ProcessedSurvey survey;
    /** The levelled total-field anomaly grid, nT. */
    Grid totalField;
    /** Derivatives of the total-field grid, nT/m (x east, y north, z down). */
    Grid eastDerivative, northDerivative, verticalDerivative;
    /** Analytic-signal amplitude of the total-field grid, nT/m. */
    Grid analyticSignal;
    /** Corrected line samples of every sensor, for the dipole fits. */
    org.halyard.targets.LineSamples samples = org.halyard.targets.LineSamples.NONE;
    /** The {@code tracks} layer: one line string per survey line and sensor. */
    org.halyard.io.FeatureLayer tracks;
    /** Time of the first survey sample, ms since 1970 (0 when the survey has no times). */
    long firstSampleMillis;
    /** The QC checks of the survey for the summary page, or null. */
    org.halyard.sheet.QcSummary qcSummary;
    /** The target analysis. */
    org.halyard.targets.TargetResult targets;

    RunContext(Recipe recipe, Path work, RunLog log, RunListener listener) {
        this.recipe = recipe;
        this.work = work;
        this.log = log;
        this.listener = listener;
    }

    Recipe recipe() {
        return recipe;
    }

    /** The staging folder; moved to the output folder only when every stage has succeeded. */
    Path work() {
        return work;
    }

    RunLog log() {
        return log;
    }

    /** A note for the user, shown on the terminal and kept in the run log. */
    void note(String message) {
        log.note(message);
        listener.note(message);
    }
}
