package org.halyard.simulate;

import java.time.Instant;

/**
 * The time variation of the Earth's field seen by both the survey and the base station: a quiet daily
 * variation and one disturbed interval.
 *
 * <p><b>Algorithm:</b> dF(t) = -Q cos(2 pi (h - 12 + lon / 15) / 24) for the quiet day, h the UTC hour and
 * lon the station longitude (a dip near local noon, the shape of the quiet-day variation at mid latitudes;
 * common practice), plus inside the disturbed interval a Hann-tapered sum of pulsations of periods 247 s,
 * 431 s and 613 s and a slow bay, scaled to amplitude P. The variation is taken along the main field, so F
 * changes by exactly dF. The survey area is small, so both sites see the same dF.
 *
 * <p>Units: nT; t an instant (UTC).
 */
final class ExternalFieldVariation {

    private final Instant start;
    private final Scenario.BaseStation b;

    ExternalFieldVariation(Instant surveyStart, Scenario.BaseStation base) {
        this.start = surveyStart;
        this.b = base;
    }

    /** Change of the total field at instant {@code epochMs} (ms since 1970 UTC), nT. */
    double deltaF(long epochMs) {
        double hours = Math.floorMod(epochMs, 86_400_000L) / 3_600_000.0;
        double quiet = -b.quietAmplitudeNt() * Math.cos(2 * Math.PI * (hours - 12 + b.longitudeDeg() / 15) / 24);
        double since = (epochMs - start.toEpochMilli()) / 1000.0 - b.disturbedStartMin() * 60;
        double len = b.disturbedMinutes() * 60;
        double storm = 0;
        if (len > 0 && since > 0 && since < len) {
            double hann = 0.5 - 0.5 * Math.cos(2 * Math.PI * since / len);
            double p = 0.5 * Math.sin(2 * Math.PI * since / 247) + 0.3 * Math.sin(2 * Math.PI * since / 431 + 1.1)
                    + 0.2 * Math.sin(2 * Math.PI * since / 613 + 2.3) - 0.6 * Math.sin(Math.PI * since / len);
            storm = b.disturbedAmplitudeNt() * hann * p;
        }
        return quiet + storm;
    }
}
