package org.halyard.survey;

/**
 * Quality figures of one survey line.
 *
 * @param line                 line identifier
 * @param tie                  whether it is a tie line
 * @param samples              number of rows
 * @param lengthM              length along the reference track, m
 * @param durationS            time from first to last sample, s (NaN without times)
 * @param meanSpeedMs          length / duration, m/s (NaN without times)
 * @param medianIntervalS      median sample interval, s (NaN without times)
 * @param gaps                 number of sample intervals longer than {@link SurveyOptions#gapFactor()} times
 *                             the median
 * @param altitudeMeanM        mean altitude above the seabed, m (NaN when unknown)
 * @param altitudeMaxM         largest altitude, m
 * @param altitudeOverLimit    fraction of samples above the altitude limit, 0..1 (NaN without limit or altitude)
 * @param spikes               spikes found, all sensors
 * @param noiseNt              fourth-difference noise, largest over the sensors, nT
 * @param spacingMedianM       median distance to the next line to starboard, m (NaN when none within reach)
 * @param spacingOverLimit     fraction of the strip to starboard where the spacing exceeds the limit, 0..1
 * @param levellingNt          mean levelling correction applied, nT (NaN where the line was not levelled)
 */
public record LineQc(String line, boolean tie, int samples, double lengthM, double durationS, double meanSpeedMs,
                     double medianIntervalS, int gaps, double altitudeMeanM, double altitudeMaxM,
                     double altitudeOverLimit, int spikes, double noiseNt, double spacingMedianM,
                     double spacingOverLimit, double levellingNt) {
}
