package org.halyard.process;

import java.util.function.Consumer;
import org.geotools.data.util.DefaultProgressListener;
import org.halyard.grid.Progress;

/**
 * A GeoTools {@link org.geotools.api.util.ProgressListener} that forwards to a Halyard {@link Progress}: the
 * direction a user interface needs when it hands a listener to a process it runs.
 *
 * <p>Percent is 0 to 100 on both sides. Cancellation is asked of the sink; warnings and exceptions go to a
 * log consumer.
 *
 * <p><b>Thread safety:</b> as the sink and the log consumer.
 */
public final class SinkProgressListener extends DefaultProgressListener {

    private final Progress sink;
    private final Consumer<String> log;

    /** A listener reporting to {@code sink} and writing warnings to {@code log}. */
    public SinkProgressListener(Progress sink, Consumer<String> log) {
        this.sink = Progress.orNone(sink);
        this.log = log;
    }

    @Override
    public void progress(float percent) {
        super.progress(percent);
        sink.report(percent);
    }

    @Override
    public void complete() {
        super.complete();
        sink.report(100);
    }

    @Override
    public boolean isCanceled() {
        return super.isCanceled() || sink.isCanceled();
    }

    @Override
    public void warningOccurred(String source, String location, String warning) {
        log.accept("warning: " + warning + (location == null ? "" : " (" + location + ")"));
    }

    @Override
    public void exceptionOccurred(Throwable exception) {
        log.accept("error: " + exception.getMessage());
    }
}
