/**
 * GeoTools process adapters: one bean class per operator, each a thin wrapper over a kernel from another
 * package, and the single factory that registers them.
 *
 * <p>Registration is in two levels: {@link org.halyard.process.HalyardProcessFactory} is listed in
 * {@code META-INF/services/org.geotools.process.ProcessFactory}; it lists the bean classes named in
 * {@code META-INF/services/org.halyard.process.HalyardProcess}, the one place where operators are
 * registered. Kernels must not depend on this package.
 */
package org.halyard.process;
