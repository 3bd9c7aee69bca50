package org.halyard.process;

import java.io.File;
import java.net.MalformedURLException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Consumer;
import org.geotools.api.feature.type.Name;
import org.geotools.coverage.grid.GridCoverage2D;
import org.geotools.feature.NameImpl;
import org.geotools.process.Process;
import org.geotools.process.ProcessException;
import org.geotools.process.Processors;
import org.geotools.util.Converters;
import org.halyard.grid.Grid;
import org.halyard.grid.Progress;
import org.halyard.io.GeoTiffGrids;

/**
 * Runs any GeoTools process with plain inputs: {@link Grid}s for raster parameters, numbers, booleans, enum
 * constant names, paths and texts; returns plain outputs ({@link Grid} for coverages, others as the process
 * gives them).
 *
 * <p>Texts for other types go through GeoTools' {@link Converters} (WKT geometries, numbers, EPSG codes).
 * Progress and cancellation go through a {@link SinkProgressListener}.
 *
 * <p><b>Thread safety:</b> stateless; run it off the user-interface thread.
 */
public final class ProcessInvoker {

    private ProcessInvoker() {
    }

    /**
     * Runs {@code spec} on {@code inputs} (by parameter name; values as the form produced them).
     *
     * @throws IllegalArgumentException naming the parameter when a value cannot be converted or a required
     *     one is missing, or with the process's own message when it fails
     * @throws java.util.concurrent.CancellationException when the sink asked to stop
     */
    public static Map<String, Object> run(ProcessSpec spec, Map<String, Object> inputs, Progress progress,
                                          Consumer<String> log) {
        Name name = new NameImpl(spec.namespace(), spec.localName());
        Process process = Processors.createProcess(name);
        if (process == null) {
            throw new IllegalArgumentException("process " + spec.qualifiedName() + " is not registered");
        }
        return run(process, spec, inputs, progress, log);
    }

    /** Runs an already created {@code process} described by {@code spec}. */
    static Map<String, Object> run(Process process, ProcessSpec spec, Map<String, Object> inputs, Progress progress,
                                   Consumer<String> log) {
        Map<String, Object> in = new LinkedHashMap<>();
        for (ParameterSpec p : spec.inputs()) {
            Object v = inputs.get(p.name());
            if (v == null) {
                if (p.required() && p.defaultValue() == null) {
                    throw new IllegalArgumentException(spec.qualifiedName() + ": parameter '" + p.title() + "' needs a value");
                }
                continue;
            }
            in.put(p.name(), convert(spec, p, v));
        }
        SinkProgressListener listener = new SinkProgressListener(progress, log);
        Map<String, Object> raw;
        try {
            raw = process.execute(in, listener);
        } catch (ProcessException e) {
            Progress.orNone(progress).checkCanceled();
            throw new IllegalArgumentException(spec.qualifiedName() + " failed: " + e.getMessage(), e);
        }
        Progress.orNone(progress).checkCanceled();
        Map<String, Object> out = new LinkedHashMap<>();
        if (raw != null) {
            raw.forEach((k, v) -> out.put(k, v instanceof GridCoverage2D c ? GeoTiffGrids.fromCoverage(c, null, k) : v));
        }
        return out;
    }

    static Object convert(ProcessSpec spec, ParameterSpec p, Object v) {
        Class<?> type = p.type();
        switch (p.kind()) {
            case GRID:
                if (v instanceof Grid g) {
                    return GeoTiffGrids.toCoverage(g, p.name());
                }
                break;
            case CHOICE:
                for (Object c : type.getEnumConstants()) {
                    if (((Enum<?>) c).name().equals(v.toString())) {
                        return c;
                    }
                }
                break;
            case FILE:
                return file(spec, p, v);
            default:
                if (type.isInstance(v)) {
                    return v;
                }
                Object c = Converters.convert(v, type);
                if (c != null) {
                    return c;
                }
        }
        if (type.isInstance(v)) {
            return v;
        }
        throw new IllegalArgumentException(spec.qualifiedName() + ": parameter '" + p.title() + "' cannot take '"
                + v + "'; it needs a " + type.getSimpleName());
    }

    private static Object file(ProcessSpec spec, ParameterSpec p, Object v) {
        Path path = v instanceof Path q ? q : Path.of(v.toString());
        if (p.type() == Path.class) {
            return path;
        }
        if (p.type() == File.class) {
            return path.toFile();
        }
        try {
            return path.toUri().toURL();
        } catch (MalformedURLException e) {
            throw new IllegalArgumentException(spec.qualifiedName() + ": parameter '" + p.title() + "' is not a valid file: " + v, e);
        }
    }
}
