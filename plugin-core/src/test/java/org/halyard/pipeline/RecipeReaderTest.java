package org.halyard.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RecipeReaderTest {

    @TempDir
    Path dir;

    private Path recipe(String json) throws IOException {
        Files.writeString(dir.resolve("lines.csv"), "line,x,y,m\n");
        Files.writeString(dir.resolve("base.txt"), "");
        Path p = dir.resolve("recipe.json");
        Files.writeString(p, json);
        return p;
    }

    static final String MINIMAL = """
            {"crs": "EPSG:32631",
             "survey": {"file": "lines.csv", "columns": {"line": "line", "x": "x", "y": "y"},
                        "sensors": [{"column": "m", "across_m": 0.5}]}}
            """;

    @Test
    void minimalRecipeTakesDefaultsForEveryOptionalBlock() throws IOException {
        Recipe r = RecipeReader.read(recipe(MINIMAL));
        assertThat(r.crs()).isEqualTo("EPSG:32631");
        assertThat(r.survey().file()).isEqualTo(dir.resolve("lines.csv"));
        assertThat(r.survey().sensors()).containsExactly(new org.halyard.survey.SensorSpec("m", 0.5, 0));
        assertThat(r.baseStation()).isNull();
        assertThat(r.field()).isNull();
        assertThat(r.grid().cellM()).isEqualTo(RecipeReader.DEFAULT_CELL_M);
        assertThat(r.grid().tieLines()).isFalse();
        assertThat(r.bathymetry()).isNull();
    }

    @Test
    void tieLinesGoIntoTheGridOnlyWhenAskedFor() throws IOException {
        String with = MINIMAL.replace("}}\n", "}, \"grid\": {\"cell_m\": 1, \"tie_lines\": true}}\n");
        assertThat(RecipeReader.read(recipe(with)).grid().tieLines()).isTrue();
        assertThatThrownBy(() -> RecipeReader.read(recipe(with.replace("true", "\"yes\""))))
                .hasMessageContaining("grid.tie_lines").hasMessageContaining("true or false");
    }

    @Test
    void readsTheSampleWorkspaceRecipe() {
        Path sample = Path.of("../sample-workspace/skerrow-sound/recipe.json");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.exists(sample), "sample workspace present");
        Recipe r = RecipeReader.read(sample);
        assertThat(r.survey().sensors()).hasSize(2);
        assertThat(r.field().inclinationDeg()).isEqualTo(66.0);
        assertThat(r.survey().tieLines()).contains("T01");
        assertThat(r.infrastructure()).exists();
    }

    @Test
    void lagAndMicroLevellingAreOffUnlessAskedFor() throws IOException {
        Recipe plain = RecipeReader.read(recipe(MINIMAL));
        assertThat(plain.survey().lag()).isEqualTo(org.halyard.survey.LagOptions.OFF);
        assertThat(plain.survey().microLevelling()).isEmpty();
        Recipe on = RecipeReader.read(recipe(MINIMAL.replace("\"sensors\"", "\"lag\": {\"apply_estimate\": true, \"max_s\": 1.5}, "
                + "\"micro_levelling\": {\"along_wavelength_m\": 300, \"limit_nt\": 2}, \"sensors\"")));
        assertThat(on.survey().lag()).isEqualTo(new org.halyard.survey.LagOptions(true, true, Double.NaN, 1.5));
        assertThat(on.survey().microLevelling()).contains(new org.halyard.survey.MicroLevelling.Settings(Double.NaN, 300, 2));
        Recipe given = RecipeReader.read(recipe(MINIMAL.replace("\"sensors\"", "\"lag\": {\"seconds\": 0.25}, "
                + "\"micro_levelling\": {\"enabled\": false}, \"sensors\"")));
        assertThat(given.survey().lag()).isEqualTo(new org.halyard.survey.LagOptions(false, false, 0.25, 2));
        assertThat(given.survey().microLevelling()).isEmpty();
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("\"sensors\"",
                "\"lag\": {\"apply_estimate\": true, \"seconds\": 0.2}, \"sensors\""))))
                .hasMessageContaining("survey.lag").hasMessageContaining("not both");
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("\"sensors\"",
                "\"micro_levelling\": {\"limit_nt\": -1}, \"sensors\""))))
                .hasMessageContaining("survey.micro_levelling").hasMessageContaining("limit");
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("\"sensors\"",
                "\"lag\": {\"estimate\": \"yes\"}, \"sensors\""))))
                .hasMessageContaining("survey.lag.estimate").hasMessageContaining("true or false");
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("\"sensors\"",
                "\"micro_levelling\": true, \"sensors\""))))
                .hasMessageContaining("survey.micro_levelling").hasMessageContaining("JSON object");
    }

    @Test
    void badRecipesGiveOneLineErrorsNamingTheEntry() throws IOException {
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("EPSG:32631", "EPSG:99999999"))))
                .hasMessageContaining("recipe.json: crs: ").hasMessageContaining("unknown CRS code");
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("\"lines.csv\"", "\"nope.csv\""))))
                .hasMessageContaining("survey.file").hasMessageContaining("no such file");
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("\"line\": \"line\", ", ""))))
                .hasMessageContaining("'line'");
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("\"across_m\": 0.5", "\"across_m\": \"left\""))))
                .hasMessageContaining("survey.sensors[0].across_m").hasMessageContaining("must be a number");
        assertThatThrownBy(() -> RecipeReader.read(recipe("{\"crs\": ")))
                .hasMessageContaining("not valid JSON").hasMessageContaining("line 1");
        assertThatThrownBy(() -> RecipeReader.read(recipe(MINIMAL.replace("}}\n", "}, \"base_station\": {\"file\": \"gone.txt\"}}\n"))))
                .hasMessageContaining("base_station.file");
    }
}
