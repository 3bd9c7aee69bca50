package org.halyard.io;

import java.nio.file.Path;

/** Layer names derived from file names, valid as {@link FeatureLayer} names. */
final class LayerNames {

    private LayerNames() {
    }

    /** The file name without extension, with characters other than letters, digits and _ replaced by _. */
    static String of(Path file) {
        String n = file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        String stem = (dot > 0 ? n.substring(0, dot) : n).replaceAll("[^A-Za-z0-9_]", "_");
        return stem.isEmpty() || !Character.isLetter(stem.charAt(0)) ? "layer_" + stem : stem;
    }
}
