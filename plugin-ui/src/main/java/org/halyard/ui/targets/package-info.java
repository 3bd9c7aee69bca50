/**
 * The target table: sortable and filterable, linked to the map (select, highlight, zoom), with the
 * analyst's interpretation (class, confidence, note) editable and saved back to the GeoPackage through
 * {@code org.halyard.io.GeoPackageEdits}.
 */
package org.halyard.ui.targets;
