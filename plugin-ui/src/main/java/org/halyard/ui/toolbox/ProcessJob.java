package org.halyard.ui.toolbox;

import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BiConsumer;
import java.util.function.Consumer;
import javax.swing.SwingWorker;
import org.halyard.grid.Progress;
import org.halyard.process.ProcessInvoker;
import org.halyard.process.ProcessSpec;

/**
 * One run of a process on a background thread: progress 0-100 through {@link #setProgress}, log lines
 * published to the event thread, cancellation asked through the process's listener (the run stops at the
 * process's next check, not by interrupting it).
 */
final class ProcessJob extends SwingWorker<Map<String, Object>, String> {

    private final ProcessSpec spec;
    private final Map<String, Object> inputs;
    private final Consumer<String> log;
    private final BiConsumer<ProcessSpec, Map<String, Object>> onResult;
    private final AtomicBoolean cancelRequested = new AtomicBoolean();
    private final long started = System.nanoTime();

    ProcessJob(ProcessSpec spec, Map<String, Object> inputs, Consumer<String> log,
               BiConsumer<ProcessSpec, Map<String, Object>> onResult) {
        this.spec = spec;
        this.inputs = Map.copyOf(inputs);
        this.log = log;
        this.onResult = onResult;
    }

    /** Asks the process to stop at its next check. */
    void requestCancel() {
        cancelRequested.set(true);
        log.accept("stopping " + spec.title() + " at its next check...");
    }

    @Override
    protected Map<String, Object> doInBackground() {
        publish("running " + spec.qualifiedName() + " with " + inputs.keySet());
        return ProcessInvoker.run(spec, inputs, new Progress() {
            @Override
            public void report(double percent) {
                setProgress((int) Math.max(0, Math.min(100, Math.round(percent))));
            }

            @Override
            public boolean isCanceled() {
                return cancelRequested.get();
            }
        }, this::publish);
    }

    @Override
    protected void process(List<String> lines) {
        lines.forEach(log);
    }

    @Override
    protected void done() {
        double s = (System.nanoTime() - started) / 1e9;
        try {
            Map<String, Object> out = get();
            log.accept(String.format(java.util.Locale.ROOT, "%s finished in %.1f s: %s", spec.title(), s, out.keySet()));
            onResult.accept(spec, out);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            log.accept(c instanceof CancellationException ? spec.title() + " stopped by the user"
                    : "error: " + (c.getMessage() == null ? c.getClass().getSimpleName() : c.getMessage()));
        } catch (InterruptedException | CancellationException e) {
            log.accept(spec.title() + " stopped");
        }
    }
}
