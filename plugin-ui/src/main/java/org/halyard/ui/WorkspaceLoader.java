package org.halyard.ui;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.halyard.grid.Grid;
import org.halyard.io.CsvPointLayers;
import org.halyard.io.FeatureLayer;
import org.halyard.io.GeoJsonLayers;
import org.halyard.io.GeoPackageReader;
import org.halyard.io.GeoTiffGrids;
import org.halyard.ui.map.GridLayer;
import org.halyard.ui.map.Layer;
import org.halyard.ui.map.LayerStack;
import org.halyard.ui.map.TargetLayer;
import org.halyard.ui.map.VectorLayer;

/**
 * Turns command-line arguments into layers: GeoTIFF grids, GeoPackage layers, GeoJSON, CSV points, or a
 * recipe (its bathymetry and infrastructure, and the grids and GeoPackage of any {@code halyard run} output
 * folder beside it).
 *
 * <p>Reading happens on the calling thread (call it off the event thread); adding to the
 * {@link LayerStack} must happen on the event thread, so {@link #read} returns the layers.
 */
public final class WorkspaceLoader {

    private WorkspaceLoader() {
    }

    /** A loaded layer with its placement: grids at the bottom, vectors above them, targets on top. */
    public record Loaded(Layer layer, String crsCode) { }

    /**
     * Reads every file; a recipe expands into the files it names.
     *
     * @param mapCrs the map CRS so far (vectors in other CRSs are reprojected), or {@code null}
     * @throws IllegalArgumentException naming the file for an unknown extension or unreadable content
     */
    public static List<Loaded> read(List<Path> files, String mapCrs) {
        List<Loaded> out = new ArrayList<>();
        String crs = mapCrs;
        for (Path f : expand(files)) {
            for (Loaded l : readOne(f, crs)) {
                out.add(l);
                crs = crs == null ? l.crsCode() : crs;
            }
        }
        return out;
    }

    /** Files named by the arguments, with recipes replaced by what they refer to. */
    static List<Path> expand(List<Path> args) {
        List<Path> out = new ArrayList<>();
        for (Path a : args) {
            if (isRecipe(a)) {
                out.addAll(recipeFiles(a));
            } else {
                out.add(a);
            }
        }
        return out;
    }

    static boolean isRecipe(Path p) {
        String n = p.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!n.endsWith(".json")) {
            return false;
        }
        JsonNode root = json(p);
        return root.has("survey") || root.has("crs") && !root.has("features");
    }

    /** The bathymetry and infrastructure a recipe names, then grids and GeoPackages of run outputs beside it. */
    static List<Path> recipeFiles(Path recipe) {
        JsonNode root = json(recipe);
        Path dir = recipe.toAbsolutePath().getParent();
        List<Path> out = new ArrayList<>();
        for (String block : new String[] {"bathymetry", "infrastructure"}) {
            String f = root.path(block).path("file").asText("");
            if (!f.isEmpty() && Files.isRegularFile(dir.resolve(f))) {
                out.add(dir.resolve(f));
            }
        }
        try (Stream<Path> s = Files.walk(dir, 3)) {
            s.filter(p -> {
                String n = p.getFileName().toString();
                return p.getParent().getFileName().toString().equals("grids") && n.endsWith(".tif")
                        || n.equals("halyard.gpkg");
            }).sorted().forEach(out::add);
        } catch (IOException e) {
            throw new UncheckedIOException(recipe + ": cannot list the recipe folder: " + e.getMessage(), e);
        }
        return out;
    }

    private static JsonNode json(Path p) {
        try {
            return new ObjectMapper().readTree(p.toFile());
        } catch (IOException e) {
            throw new IllegalArgumentException(p + ": not readable JSON: " + e.getMessage().split("\n")[0]);
        }
    }

    static List<Loaded> readOne(Path f, String mapCrs) {
        if (!Files.isRegularFile(f)) {
            throw new IllegalArgumentException(f + ": file does not exist");
        }
        String n = f.getFileName().toString().toLowerCase(Locale.ROOT);
        String stem = f.getFileName().toString().replaceFirst("\\.[^.]+$", "");
        if (n.endsWith(".tif") || n.endsWith(".tiff")) {
            Grid g = GeoTiffGrids.read(f);
            return List.of(new Loaded(new GridLayer(stem, g, null, f), g.geometry().crsCode()));
        }
        if (n.endsWith(".gpkg")) {
            List<Loaded> out = new ArrayList<>();
            for (String layer : GeoPackageReader.layerNames(f)) {
                out.add(vector(layer, GeoPackageReader.read(f, layer), f, mapCrs));
            }
            return out;
        }
        if (n.endsWith(".geojson") || n.endsWith(".json")) {
            return List.of(vector(stem, GeoJsonLayers.read(f), f, mapCrs));
        }
        if (n.endsWith(".csv")) {
            if (mapCrs == null) {
                throw new IllegalArgumentException(f + ": open a grid or GeoPackage first so the CSV's projected"
                        + " coordinates have a CRS");
            }
            return List.of(vector(stem, CsvPointLayers.read(f, mapCrs), f, mapCrs));
        }
        throw new IllegalArgumentException(f + ": unknown file type; the workbench opens .tif, .gpkg, .geojson, .csv"
                + " and recipe .json files");
    }

    private static Loaded vector(String name, FeatureLayer data, Path source, String mapCrs) {
        FeatureLayer inMap = Reprojection.toMap(data, mapCrs);
        Layer l = TargetLayer.looksLikeTargets(inMap) ? new TargetLayer(name, inMap, source)
                : new VectorLayer(name, inMap, source);
        return new Loaded(l, inMap.crsCode());
    }

    /** Adds loaded layers to the stack: grids at the bottom in file order, vectors on top, targets topmost. */
    public static void addAll(LayerStack stack, List<Loaded> loaded) {
        for (Loaded l : loaded) {
            stack.adoptCrs(l.crsCode());
        }
        loaded.stream().filter(l -> l.layer() instanceof GridLayer).forEach(l -> stack.addTop(l.layer()));
        loaded.stream().filter(l -> !(l.layer() instanceof GridLayer) && !(l.layer() instanceof TargetLayer))
                .forEach(l -> stack.addTop(l.layer()));
        loaded.stream().filter(l -> l.layer() instanceof TargetLayer).forEach(l -> stack.addTop(l.layer()));
    }
}
