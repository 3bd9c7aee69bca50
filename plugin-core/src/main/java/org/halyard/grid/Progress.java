package org.halyard.grid;

/**
 * Where a long kernel reports how far it has got and learns whether to stop. Kept free of GeoTools so
 * kernels stay testable without a GIS; {@code org.halyard.process} adapts GeoTools' {@code ProgressListener}
 * to it and the CLI draws a bar from it.
 *
 * <p>Percent runs from 0 to 100. A kernel that sees {@link #isCanceled()} return true throws
 * {@link java.util.concurrent.CancellationException}.
 */
public interface Progress {

    /** A progress sink that ignores reports and never cancels. */
    Progress NONE = new Progress() {
        @Override
        public void report(double percent) {
        }

        @Override
        public boolean isCanceled() {
            return false;
        }
    };

    /** Reports the completed fraction of the work, 0 to 100. */
    void report(double percent);

    /** Whether the user asked to stop. */
    boolean isCanceled();

    /** Throws {@link java.util.concurrent.CancellationException} when the user asked to stop. */
    default void checkCanceled() {
        if (isCanceled()) {
            throw new java.util.concurrent.CancellationException("cancelled by the user");
        }
    }

    /**
     * A view of this sink for a sub-task covering {@code [from, to]} percent of the whole: the sub-task
     * reports 0 to 100 and the parent sees {@code from} to {@code to}.
     */
    default Progress slice(double from, double to) {
        Progress parent = this;
        return new Progress() {
            @Override
            public void report(double percent) {
                parent.report(from + (to - from) * Math.max(0, Math.min(100, percent)) / 100.0);
            }

            @Override
            public boolean isCanceled() {
                return parent.isCanceled();
            }
        };
    }

    /** {@code p}, or {@link #NONE} when {@code p} is null. */
    static Progress orNone(Progress p) {
        return p == null ? NONE : p;
    }
}
