package org.halyard.survey;

import java.util.List;
import java.util.Optional;

/**
 * Everything survey processing produced, for the gridder, the target finder, the GeoPackage and the report.
 *
 * @param lines       the input lines (times, raw readings; reference positions shifted when a lag was applied)
 * @param tieMask     per line, whether it is a tie line
 * @param distanceM   distance along the line per row, m
 * @param headingDeg  smoothed heading per row, degrees clockwise from grid north
 * @param sensors     per sensor: positions (m), depth (m, down), altitude (m), corrected value (nT), flags
 * @param gradients   per adjacent sensor pair: midpoint positions, mean value and gx, gy (nT/m)
 * @param crossovers  the traverse/tie crossovers, with values before levelling
 * @param levelling   the levelling solution, when levelling ran
 * @param field       the Earth's field: the recipe's, or derived from the base station
 * @param qc          QC summary
 * @param tracks      track features (one per line and sensor) for the {@code tracks} layer
 * @param messages    what the run did, skipped or assumed, one sentence each
 * @param stageSeconds CPU seconds of the calling thread per stage, in order (for benchmarks and the log)
 * @param lag         what the lag step found and did, when it was asked for
 * @param microLevelling the micro-levelling figures and per-row correction, when it was asked for
 */
public record ProcessedSurvey(SurveyLines lines, boolean[] tieMask, double[] distanceM, float[] headingDeg,
                              List<SensorTrack> sensors, List<GradientPoints> gradients, List<Crossover> crossovers,
                              Optional<LineLevelling.Solution> levelling, Optional<FieldEstimate> field, SurveyQc qc,
                              List<TrackFeature> tracks, List<String> messages,
                              java.util.Map<String, Double> stageSeconds, Optional<LagOutcome> lag,
                              Optional<MicroLevelling.Result> microLevelling) {
}
