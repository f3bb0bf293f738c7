package com.baysheet.engine.reduction;

import java.util.Map;

/**
 * The outcome of a reduction: the multiplier on each live load source (an occupancy, or the partition
 * allowance on it, keyed as in {@link com.baysheet.engine.load.LiveShare#source()}), the area the factor
 * came from and the factor itself. Multipliers are 1 where the code refuses a reduction.
 *
 * @param tributaryArea floor A_T, all occupancies, ft² or m²
 * @param reducibleArea the part of it whose loads may be reduced (capped for a one-way slab)
 * @param influenceArea K_LL·A_T that gave the factor: K_LL × reducibleArea, or Σ K_LL,i × (reducible A_T,i) over a
 *                      column's floors; 0 where nothing is reducible
 * @param kll           the member's own K_LL
 */
public record LiveFactors(Map<String, Double> bySource, double tributaryArea, double reducibleArea,
                          double influenceArea, double kll, double factor) {
    public LiveFactors {
        bySource = Map.copyOf(bySource);
    }

    public double of(String source) {
        Double f = bySource.get(source);
        if (f == null) throw new IllegalStateException("no reduction factor for " + source);
        return f;
    }
}
