package org.halyard.targets;

import java.util.List;

/**
 * What {@link TargetAnalysis} found.
 *
 * @param targets   characterised picks, strongest first
 * @param features  linear features
 * @param noise     robust level and spread of the analytic signal, nT/m
 * @param threshold the peak-picking threshold, nT/m
 * @param notes     plain sentences for the log and the output metadata (skipped steps and why)
 * @param options   the parameters used
 */
public record TargetResult(List<Target> targets, List<LinearFeature> features, NoiseEstimate noise,
                           double threshold, List<String> notes, TargetOptions options) {

    public TargetResult {
        targets = List.copyOf(targets);
        features = List.copyOf(features);
        notes = List.copyOf(notes);
    }
}
