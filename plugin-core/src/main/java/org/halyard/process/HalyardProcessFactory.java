package org.halyard.process;

import java.util.ArrayList;
import java.util.List;
import java.util.ServiceLoader;
import org.geotools.process.factory.AnnotatedBeanProcessFactory;
import org.geotools.text.Text;

/**
 * The one GeoTools process factory of Halyard, namespace {@value #NAMESPACE}.
 *
 * <p>Process names are the bean class names without their {@code Process} suffix, in our namespace, for
 * example {@code halyard:UpwardContinuation}. Parameter units are written in each parameter's
 * description and in its {@code meta} as {@code unit=...}.
 *
 * <p><b>Thread safety:</b> GeoTools creates one factory per discovery; processes are new per call.
 */
public final class HalyardProcessFactory extends AnnotatedBeanProcessFactory {

    /** The namespace of every Halyard process. */
    public static final String NAMESPACE = "halyard";

    public HalyardProcessFactory() {
        super(Text.text("Halyard marine magnetics"), NAMESPACE, beanClasses());
    }

    /** The bean classes listed in {@code META-INF/services/org.halyard.process.HalyardProcess}. */
    static Class<?>[] beanClasses() {
        List<Class<?>> classes = new ArrayList<>();
        for (ServiceLoader.Provider<HalyardProcess> p : ServiceLoader.load(HalyardProcess.class,
                HalyardProcessFactory.class.getClassLoader()).stream().toList()) {
            classes.add(p.type());
        }
        return classes.toArray(new Class<?>[0]);
    }
}
