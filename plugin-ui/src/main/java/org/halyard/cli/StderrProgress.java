package org.halyard.cli;

import java.io.PrintStream;
import org.halyard.grid.Progress;

/**
 * Draws a kernel's progress on stderr: a self-overwriting percentage on a terminal, otherwise one line per
 * tenth so that logs stay short. Never cancels (Ctrl-C ends the process).
 */
final class StderrProgress implements Progress {

    private final PrintStream err;
    private final String label;
    private final boolean terminal;
    private int shown = -1;

    StderrProgress(String label) {
        this(System.err, label, System.console() != null);
    }

    StderrProgress(PrintStream err, String label, boolean terminal) {
        this.err = err;
        this.label = label;
        this.terminal = terminal;
    }

    @Override
    public void report(double percent) {
        int p = (int) Math.floor(Math.max(0, Math.min(100, percent)));
        int step = terminal ? p : p / 10 * 10;
        if (step <= shown) {
            return;
        }
        shown = step;
        if (terminal) {
            err.print("\r" + label + ": " + step + "%" + (step == 100 ? "\n" : ""));
        } else {
            err.println(label + ": " + step + "%");
        }
        err.flush();
    }

    @Override
    public boolean isCanceled() {
        return false;
    }
}
