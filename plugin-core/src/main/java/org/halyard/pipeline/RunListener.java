package org.halyard.pipeline;

import org.halyard.grid.Progress;

/** What a front end (the CLI's progress bars, the workbench) hears of a run. */
public interface RunListener {

    /** A listener that shows nothing. */
    RunListener SILENT = new RunListener() {
        @Override
        public Progress stageStarted(String stage, int index, int count) {
            return Progress.NONE;
        }

        @Override
        public void stageFinished(String stage, long millis) {
        }

        @Override
        public void note(String message) {
        }
    };

    /** A stage begins; returns where it reports its progress (0 to 100). */
    Progress stageStarted(String stage, int index, int count);

    /** A stage ended after {@code millis} milliseconds. */
    void stageFinished(String stage, long millis);

    /** Something the user should read: a skipped block, a default taken, a warning. */
    void note(String message);
}
