package org.halyard.process;

import org.geotools.api.util.ProgressListener;
import org.geotools.data.util.NullProgressListener;
import org.halyard.grid.Progress;

/** Adapts a GeoTools {@link ProgressListener} (0 to 100) to the kernels' {@link Progress}. */
public final class ListenerProgress implements Progress {

    private final ProgressListener listener;

    private ListenerProgress(ProgressListener listener) {
        this.listener = listener;
    }

    /** Wraps {@code listener}; a null listener becomes a {@link NullProgressListener}. */
    public static ListenerProgress of(ProgressListener listener) {
        return new ListenerProgress(listener == null ? new NullProgressListener() : listener);
    }

    /** The wrapped listener. */
    public ProgressListener listener() {
        return listener;
    }

    @Override
    public void report(double percent) {
        listener.progress((float) Math.max(0, Math.min(100, percent)));
    }

    @Override
    public boolean isCanceled() {
        return listener.isCanceled();
    }
}
