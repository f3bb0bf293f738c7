package com.baysheet.engine.reduction;

import java.util.Map;

/**
 * The outcome of a reduction: the multiplier on each live load source (an occupancy, or the partition
 * allowance on it, keyed as in {@link com.baysheet.engine.load.LiveShare#source()}), the area the factor
 * came from and the factor itself. Multipliers are 1 where the code refuses a reduction.
 */
public record LiveFactors(Map<String, Double> bySource, double tributaryArea, double reducibleArea,
                          double kll, double factor) {
    public LiveFactors {
        bySource = Map.copyOf(bySource);
    }

    public double of(String source) {
        Double f = bySource.get(source);
        if (f == null) throw new IllegalStateException("no reduction factor for " + source);
        return f;
    }
}
