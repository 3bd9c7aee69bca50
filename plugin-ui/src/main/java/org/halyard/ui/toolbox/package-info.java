/**
 * The operator toolbox: a searchable tree of every GeoTools process on the classpath (Halyard's first), a
 * form generated from each process's parameter metadata, and a background job with progress, cancel and
 * a log whose grid outputs become map layers.
 *
 * <p>Sees processes only through {@code org.halyard.process.ProcessSpec} and {@code ProcessInvoker}; no
 * GeoTools types here.
 */
package org.halyard.ui.toolbox;
