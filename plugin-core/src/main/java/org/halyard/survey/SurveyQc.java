package org.halyard.survey;

import java.util.List;
import org.locationtech.jts.geom.Geometry;

/**
 * QC summary of a processed survey.
 *
 * @param lines              per line figures
 * @param spikes             the spikes found (at most {@link SurveyProcessing#MAX_LISTED_SPIKES} listed)
 * @param spikeCount         total number of spikes found
 * @param baseGapSamples     rows left without diurnal correction
 * @param altitudeLimitM     the altitude limit used, m (NaN for none)
 * @param spacingLimitM      the spacing limit used, m (NaN for none)
 * @param areaOverSpacing    fraction of the area between traverse lines where spacing exceeds the limit
 * @param coverage           coverage outline (concave hull of the sensor tracks), recipe CRS
 * @param coverageAreaM2     area of the outline, m2
 * @param before             crossover statistics before levelling
 * @param after              crossover statistics after levelling
 * @param diurnalDatumNt     the diurnal datum used, nT (NaN when no base station)
 */
public record SurveyQc(List<LineQc> lines, List<SpikeAt> spikes, int spikeCount, int baseGapSamples,
                       double altitudeLimitM, double spacingLimitM, double areaOverSpacing, Geometry coverage,
                       double coverageAreaM2, CrossoverStats before, CrossoverStats after, double diurnalDatumNt) {
}
