package org.halyard.survey;

import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * Summary of crossover misfits (traverse minus tie).
 *
 * @param count   number of crossovers
 * @param meanNt  mean misfit, nT
 * @param rmsNt   root mean square misfit, nT
 * @param maxAbsNt largest absolute misfit, nT
 */
public record CrossoverStats(int count, double meanNt, double rmsNt, double maxAbsNt) {

    /** Statistics of {@code misfit} over {@code crossovers}; zeros with NaN moments when empty. */
    public static CrossoverStats of(List<Crossover> crossovers, ToDoubleFunction<Crossover> misfit) {
        int n = crossovers.size();
        if (n == 0) {
            return new CrossoverStats(0, Double.NaN, Double.NaN, Double.NaN);
        }
        double s = 0, s2 = 0, mx = 0;
        for (Crossover c : crossovers) {
            double d = misfit.applyAsDouble(c);
            s += d;
            s2 += d * d;
            mx = Math.max(mx, Math.abs(d));
        }
        return new CrossoverStats(n, s / n, Math.sqrt(s2 / n), mx);
    }
}
