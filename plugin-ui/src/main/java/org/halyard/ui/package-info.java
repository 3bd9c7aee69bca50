/**
 * The Halyard desktop workbench (Swing): the window, loading of files and recipes into layers, and the
 * panels around the map (layers, operators, targets, profile). Subpackages hold the map, the operator
 * toolbox, the target table and the profile tool.
 *
 * <p>Must not use GeoTools types: processes are reached through {@code org.halyard.process.ProcessCatalog}
 * and {@code ProcessInvoker}, files through {@code org.halyard.io}.
 */
package org.halyard.ui;
