package com.baysheet.engine.load;

import com.baysheet.engine.Check;

/**
 * Part of a load's unreduced live load that comes from one occupancy: its L0 or the partition allowance
 * on its area. Kept apart so that each is reduced by its own rule.
 *
 * @param amount lb or kN for a point load (plf or kN/m for a line load), unreduced
 */
public record LiveShare(String occupancy, boolean partition, double amount) {
    public LiveShare {
        Check.text("occupancy", occupancy);
        Check.nonNegative("live", amount);
    }

    /** Map key that groups shares of the same source. */
    public String source() { return partition ? occupancy + "#partitions" : occupancy; }
}
