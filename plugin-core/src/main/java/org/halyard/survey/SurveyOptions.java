package org.halyard.survey;

import java.util.Optional;

/**
 * Settings of survey line processing (the recipe's {@code survey} block beyond its columns).
 *
 * @param headingSmoothingM    heading smoothing length, m (&gt; 0); default 10
 * @param spikeThresholdSigmas spike threshold in MAD sigmas of the fourth difference; 0 turns spike repair
 *                             off (noise is still measured); default 10
 * @param diurnalDatumNt       datum of the diurnal correction, nT; NaN for the median base F over the
 *                             survey (default)
 * @param baseGapLimitS        longest interval of base data that may be bridged, s; NaN for three base
 *                             sample intervals (default)
 * @param trend                levelling correction per line; default {@link LevellingTrend#CONSTANT}
 * @param adjustTies           whether tie lines are corrected too (zero mean); default false (ties are
 *                             the datum)
 * @param altitudeLimitM       altitude above the seabed not to exceed, m; NaN for none
 * @param lineSpacingLimitM    line spacing not to exceed, m; NaN for none
 * @param gapFactor            a sample interval longer than this many median intervals is a gap; default 2
 * @param gradients            whether to compute sensor-pair gradients; default true
 * @param field                the Earth's field from the recipe, if given
 * @param trackToleranceM      simplification tolerance of the track geometries, m; default 0.05
 * @param lag                  lag estimate and shift; default {@link LagOptions#OFF}
 * @param microLevelling       micro-levelling after tie-line levelling, if wanted; default none
 */
public record SurveyOptions(double headingSmoothingM, double spikeThresholdSigmas, double diurnalDatumNt,
                            double baseGapLimitS, LevellingTrend trend, boolean adjustTies, double altitudeLimitM,
                            double lineSpacingLimitM, double gapFactor, boolean gradients,
                            Optional<FieldEstimate> field, double trackToleranceM, LagOptions lag,
                            Optional<MicroLevelling.Settings> microLevelling) {

    public SurveyOptions {
        if (!(headingSmoothingM > 0)) {
            throw new IllegalArgumentException("heading smoothing must be positive metres, got " + headingSmoothingM);
        }
        if (!(spikeThresholdSigmas >= 0)) {
            throw new IllegalArgumentException("spike threshold must be >= 0 sigmas, got " + spikeThresholdSigmas);
        }
        if (!Double.isNaN(baseGapLimitS) && !(baseGapLimitS > 0)) {
            throw new IllegalArgumentException("base-station gap limit must be positive seconds, got " + baseGapLimitS);
        }
        if (!Double.isNaN(altitudeLimitM) && !(altitudeLimitM > 0)) {
            throw new IllegalArgumentException("altitude limit must be positive metres, got " + altitudeLimitM);
        }
        if (!Double.isNaN(lineSpacingLimitM) && !(lineSpacingLimitM > 0)) {
            throw new IllegalArgumentException("line spacing limit must be positive metres, got " + lineSpacingLimitM);
        }
        if (!(gapFactor > 1)) {
            throw new IllegalArgumentException("gap factor must be above 1, got " + gapFactor);
        }
        if (!(trackToleranceM >= 0)) {
            throw new IllegalArgumentException("track tolerance must be >= 0 m, got " + trackToleranceM);
        }
        if (trend == null || field == null || lag == null || microLevelling == null) {
            throw new IllegalArgumentException("levelling trend, field, lag and micro-levelling must be given "
                    + "(use Optional.empty(), LagOptions.OFF)");
        }
    }

    /** The defaults listed above. */
    public static SurveyOptions defaults() {
        return new SurveyOptions(10, 10, Double.NaN, Double.NaN, LevellingTrend.CONSTANT, false, Double.NaN,
                Double.NaN, 2, true, Optional.empty(), 0.05, LagOptions.OFF,
                Optional.empty());
    }

    /** These options with another levelling trend and tie treatment. */
    public SurveyOptions withLevelling(LevellingTrend t, boolean adjust) {
        return new SurveyOptions(headingSmoothingM, spikeThresholdSigmas, diurnalDatumNt, baseGapLimitS, t, adjust,
                altitudeLimitM, lineSpacingLimitM, gapFactor, gradients, field, trackToleranceM, lag,
                microLevelling);
    }

    /** These options with QC limits: altitude and line spacing, m (NaN for none). */
    public SurveyOptions withLimits(double altitudeM, double spacingM) {
        return new SurveyOptions(headingSmoothingM, spikeThresholdSigmas, diurnalDatumNt, baseGapLimitS, trend,
                adjustTies, altitudeM, spacingM, gapFactor, gradients, field, trackToleranceM, lag,
                microLevelling);
    }

    /** These options with a diurnal datum (nT, NaN for the median) and base gap limit (s, NaN for default). */
    public SurveyOptions withDiurnal(double datumNt, double gapLimitS) {
        return new SurveyOptions(headingSmoothingM, spikeThresholdSigmas, datumNt, gapLimitS, trend, adjustTies,
                altitudeLimitM, lineSpacingLimitM, gapFactor, gradients, field, trackToleranceM, lag,
                microLevelling);
    }

    /** These options with a spike threshold (MAD sigmas; 0 for no repair) and heading smoothing (m). */
    public SurveyOptions withCleaning(double spikeSigmas, double smoothingM) {
        return new SurveyOptions(smoothingM, spikeSigmas, diurnalDatumNt, baseGapLimitS, trend, adjustTies,
                altitudeLimitM, lineSpacingLimitM, gapFactor, gradients, field, trackToleranceM, lag,
                microLevelling);
    }

    /** These options with the recipe's field, or none. */
    public SurveyOptions withField(Optional<FieldEstimate> f) {
        return new SurveyOptions(headingSmoothingM, spikeThresholdSigmas, diurnalDatumNt, baseGapLimitS, trend,
                adjustTies, altitudeLimitM, lineSpacingLimitM, gapFactor, gradients, f, trackToleranceM, lag,
                microLevelling);
    }

    /** These options with gradients computed or not. */
    public SurveyOptions withGradients(boolean on) {
        return new SurveyOptions(headingSmoothingM, spikeThresholdSigmas, diurnalDatumNt, baseGapLimitS, trend,
                adjustTies, altitudeLimitM, lineSpacingLimitM, gapFactor, on, field, trackToleranceM, lag,
                microLevelling);
    }

    /** These options with lag settings. */
    public SurveyOptions withLag(LagOptions l) {
        return new SurveyOptions(headingSmoothingM, spikeThresholdSigmas, diurnalDatumNt, baseGapLimitS, trend,
                adjustTies, altitudeLimitM, lineSpacingLimitM, gapFactor, gradients, field, trackToleranceM, l,
                microLevelling);
    }

    /** These options with micro-levelling on (with these settings) or off (empty). */
    public SurveyOptions withMicroLevelling(Optional<MicroLevelling.Settings> m) {
        return new SurveyOptions(headingSmoothingM, spikeThresholdSigmas, diurnalDatumNt, baseGapLimitS, trend,
                adjustTies, altitudeLimitM, lineSpacingLimitM, gapFactor, gradients, field, trackToleranceM, lag, m);
    }
}
