package org.halyard.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.halyard.simulate.Scenario;
import org.halyard.simulate.SurveySimulator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code halyard simulate SCENARIO.json --out DIR}: forward-model a survey (see docs/simulation.md). */
@Command(name = "simulate", description = "Forward-model a survey from a scenario: lines.csv, base.iaga2002, "
        + "bathymetry.tif, assets.gpkg, truth.csv and recipe.json in --out.")
final class SimulateCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO.json", description = "The scenario file.")
    Path scenario;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Output directory (created if needed).")
    Path out;

    @Override
    public Integer call() {
        Scenario s = Scenario.read(scenario);
        TerminalProgress bar = new TerminalProgress("simulate");
        SurveySimulator.Summary r = SurveySimulator.run(s, out, bar);
        bar.done();
        System.out.printf(java.util.Locale.ROOT, "simulated %d samples on %d lines (%.1f min), %d objects%n",
                r.samples(), r.lines(), r.durationMs() / 60000.0, r.objects());
        System.out.println("wrote " + out.resolve(SurveySimulator.RECIPE) + "; process it with: halyard run "
                + out.resolve(SurveySimulator.RECIPE) + " --out OUT");
        return 0;
    }
}
