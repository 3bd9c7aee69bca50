package org.halyard.cli;

import java.io.PrintStream;
import org.halyard.grid.Progress;

/**
 * A progress bar on stderr for one stage of work. Drawn only when stderr is a terminal (a console is
 * attached), so logs and pipes stay clean; {@link #done()} ends the line.
 */
final class TerminalProgress implements Progress {

    private static final int WIDTH = 30;
    private final String label;
    private final PrintStream err;
    private final boolean draw;
    private int lastDrawn = -1;

    TerminalProgress(String label) {
        this(label, System.err, System.console() != null);
    }

    TerminalProgress(String label, PrintStream err, boolean draw) {
        this.label = label;
        this.err = err;
        this.draw = draw;
    }

    @Override
    public synchronized void report(double percent) {
        int pc = (int) Math.max(0, Math.min(100, percent));
        if (!draw || pc == lastDrawn) {
            return;
        }
        lastDrawn = pc;
        int filled = pc * WIDTH / 100;
        err.print("\r" + label + " [" + "#".repeat(filled) + " ".repeat(WIDTH - filled) + "] " + pc + "%");
        err.flush();
    }

    @Override
    public boolean isCanceled() {
        return false;
    }

    /** Completes the bar and ends its line. */
    void done() {
        if (draw) {
            report(100);
            err.println();
        }
    }
}
