package org.halyard.process;

import java.io.File;
import java.net.URL;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.geotools.api.data.Parameter;
import org.geotools.api.coverage.grid.GridCoverage;
import org.geotools.api.feature.type.Name;
import org.geotools.process.ProcessFactory;
import org.geotools.process.Processors;

/**
 * Every process GeoTools' {@link Processors} reports, described as {@link ProcessSpec}s for forms: Halyard's
 * first, then the others by namespace and name.
 *
 * <p>Parameter metadata read: {@code min} and {@code max} (GeoTools {@link Parameter#MIN}, {@link Parameter#MAX},
 * filled from {@code @DescribeParameter(minValue, maxValue)}) and {@code unit} (our convention,
 * {@code meta = {"unit=nT"}}).
 *
 * <p><b>Thread safety:</b> stateless; GeoTools' factory registry is itself thread-safe.
 */
public final class ProcessCatalog {

    private ProcessCatalog() {
    }

    /** All registered processes, Halyard's first, then by qualified name. */
    public static List<ProcessSpec> all() {
        List<ProcessSpec> out = new ArrayList<>();
        for (ProcessFactory f : Processors.getProcessFactories()) {
            for (Name n : f.getNames()) {
                out.add(describe(f, n));
            }
        }
        out.sort(Comparator.comparing((ProcessSpec p) -> !p.isHalyard()).thenComparing(ProcessSpec::qualifiedName));
        return out;
    }

    /** The process called {@code qualifiedName} ({@code namespace:local}). */
    public static ProcessSpec find(String qualifiedName) {
        for (ProcessSpec p : all()) {
            if (p.qualifiedName().equals(qualifiedName)) {
                return p;
            }
        }
        throw new IllegalArgumentException("no process named '" + qualifiedName + "'; see 'halyard processes --all'");
    }

    static ProcessSpec describe(ProcessFactory f, Name n) {
        return new ProcessSpec(n.getNamespaceURI(), n.getLocalPart(), text(f.getTitle(n), n.getLocalPart()),
                text(f.getDescription(n), ""), specs(f.getParameterInfo(n)), specs(f.getResultInfo(n, null)));
    }

    private static List<ParameterSpec> specs(Map<String, Parameter<?>> params) {
        List<ParameterSpec> out = new ArrayList<>();
        if (params != null) {
            params.values().forEach(p -> out.add(spec(p)));
        }
        return out;
    }

    /** The plain description of one GeoTools parameter. */
    static ParameterSpec spec(Parameter<?> p) {
        Class<?> type = p.getType();
        Map<String, Object> meta = p.metadata == null ? Map.of() : p.metadata;
        List<String> choices = type.isEnum()
                ? Arrays.stream(type.getEnumConstants()).map(c -> ((Enum<?>) c).name()).toList() : List.of();
        Object unit = meta.get("unit");
        return new ParameterSpec(p.getName(), text(p.getTitle(), p.getName()), text(p.getDescription(), ""),
                kindOf(type), type, unit == null ? "" : unit.toString(), number(meta.get(Parameter.MIN)),
                number(meta.get(Parameter.MAX)), p.getDefaultValue(), p.getMinOccurs() > 0, choices);
    }

    static ParameterSpec.Kind kindOf(Class<?> type) {
        if (GridCoverage.class.isAssignableFrom(type)) {
            return ParameterSpec.Kind.GRID;
        }
        if (type == Double.class || type == Float.class || type == double.class || type == float.class) {
            return ParameterSpec.Kind.NUMBER;
        }
        if (type == Integer.class || type == Long.class || type == Short.class || type == int.class
                || type == long.class || type == short.class) {
            return ParameterSpec.Kind.INTEGER;
        }
        if (type == Boolean.class || type == boolean.class) {
            return ParameterSpec.Kind.BOOLEAN;
        }
        if (type.isEnum()) {
            return ParameterSpec.Kind.CHOICE;
        }
        if (type == File.class || type == Path.class || type == URL.class) {
            return ParameterSpec.Kind.FILE;
        }
        return ParameterSpec.Kind.TEXT;
    }

    private static double number(Object o) {
        if (o instanceof Number num) {
            double v = num.doubleValue();
            return Double.isInfinite(v) ? Double.NaN : v;
        }
        return Double.NaN;
    }

    private static String text(Object t, String fallback) {
        return t == null ? fallback : t.toString();
    }
}
