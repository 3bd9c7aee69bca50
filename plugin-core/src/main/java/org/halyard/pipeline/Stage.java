package org.halyard.pipeline;

import org.halyard.grid.Progress;

/** One step of a run: reads what earlier stages left in the context and adds its own results. */
interface Stage {

    /** Short name shown on the progress bar and in {@code report/run.log}. */
    String name();

    /** Runs the stage; writes only below {@link RunContext#work()}. */
    void run(RunContext ctx, Progress progress) throws Exception;
}
