package org.halyard.pipeline;

import java.util.List;

/** The standard order of a run's stages: each needs what the ones before it leave in the context. */
final class Stages {

    private Stages() {
    }

    static List<Stage> standard() {
        return List.of(new LinesStage(), new GridStage(), new MapsStage(), new TargetsStage(), new GeoPackageStage(),
                new SheetsStage());
    }
}
