package org.halyard.pipeline;

import java.util.List;

/** The standard order of a run's stages. */
final class Stages {

    private Stages() {
    }

    static List<Stage> standard() {
        return List.of(new MapsStage());
    }
}
