package org.halyard.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.halyard.grid.Progress;
import org.halyard.pipeline.Recipe;
import org.halyard.pipeline.RecipeReader;
import org.halyard.pipeline.RunListener;
import org.halyard.pipeline.SurveyRun;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code halyard run RECIPE.json --out DIR}: the whole job, raw lines to deliverables. */
@Command(name = "run", description = "Run a recipe: survey lines to grids, targets, GeoPackage and map sheets.")
final class RunCommand implements Callable<Integer> {

    static final String CAUTION = "Caution: the target list is an aid to interpretation, never a clearance "
            + "certificate. Defer to local regulations, qualified explosive-ordnance specialists and licensed practice.";

    @Parameters(index = "0", paramLabel = "RECIPE.json", description = "The recipe (see CONTRACT.md / README).")
    Path recipeFile;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Output folder (replaced on success).")
    Path out;

    @Override
    public Integer call() {
        Recipe recipe = RecipeReader.read(recipeFile);
        System.err.println("halyard run: " + recipe.name());
        new SurveyRun().run(recipe, out, new BarListener());
        Path o = out.toAbsolutePath().normalize();
        System.out.println("outputs in " + o);
        System.out.println("  grids/*.tif            GeoTIFF grids (" + recipe.crs() + "): drag into QGIS, or gdalinfo");
        System.out.println("  halyard.gpkg           layers targets, linear_features, tracks: open as a vector layer");
        System.out.println("  targets.csv            target list; linear_features.csv: cables and pipelines (WKT)");
        System.out.println("  report/                QC report (qc.html) and run.log; sheets/: PDF map sheets");
        System.out.println("  view them together:   ./halyard workbench " + o.resolve("grids/analytic_signal.tif") + " "
                + o.resolve("grids/total_field.tif") + " " + o.resolve("halyard.gpkg"));
        System.out.println(CAUTION);
        return 0;
    }

    /** One progress bar per stage on stderr; notes on their own lines. */
    private static final class BarListener implements RunListener {
        private TerminalProgress bar;

        @Override
        public Progress stageStarted(String stage, int index, int count) {
            bar = new TerminalProgress(String.format("[%d/%d] %-9s", index + 1, count, stage));
            return bar;
        }

        @Override
        public void stageFinished(String stage, long millis) {
            bar.done();
            if (System.console() == null) {
                System.err.printf("[done] %-9s %.1f s%n", stage, millis / 1000.0);
            }
        }

        @Override
        public void note(String message) {
            System.err.println("note: " + message);
        }
    }
}
