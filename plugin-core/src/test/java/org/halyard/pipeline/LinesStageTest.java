package org.halyard.pipeline;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The lines stage alone on the sample workspace with the optional lag and micro-levelling blocks on. */
class LinesStageTest {

    static final Path SAMPLE = Path.of("../sample-workspace/skerrow-sound").toAbsolutePath().normalize();

    @TempDir
    Path dir;

    @Test
    void lagAndMicroLevellingAreReportedInTheRunLogAndTheQcPage() throws IOException {
        String json = Files.readString(SAMPLE.resolve("recipe.json"))
                .replace("\"lines.csv\"", "\"" + SAMPLE.resolve("lines.csv") + "\"")
                .replace("\"base.iaga2002\"", "\"" + SAMPLE.resolve("base.iaga2002") + "\"")
                .replace("\"bathymetry.tif\"", "\"" + SAMPLE.resolve("bathymetry.tif") + "\"")
                .replace("\"assets.gpkg\"", "\"" + SAMPLE.resolve("assets.gpkg") + "\"")
                .replace("\"tie_lines\"", "\"lag\": {\"estimate\": true}, \"micro_levelling\": {\"limit_nt\": 2}, \"tie_lines\"");
        Path recipe = dir.resolve("recipe.json");
        Files.writeString(recipe, json);
        Path out = dir.resolve("out");
        new SurveyRun(List.of(new LinesStage())).run(RecipeReader.read(recipe), out, RunListener.SILENT);

        String log = Files.readString(out.resolve("report/run.log"));
        assertThat(log).contains("lag estimated (s) = ", "micro-levelling correction rms (nT) = ",
                "micro-levelling limit (nT) = 2", "note: lag estimated from", "note: micro-levelling (after Minty 1991)");
        assertThat(log).doesNotContain("lag applied");
        String html = Files.readString(out.resolve("report/qc.html"));
        assertThat(html).contains("<h2>Lag</h2>", "<h2>Micro-levelling</h2>", "RMS of the applied correction (nT)");
    }
}
