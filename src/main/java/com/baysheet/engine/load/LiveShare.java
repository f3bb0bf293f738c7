package com.baysheet.engine.load;

import com.baysheet.engine.Check;

/**
 * Part of a load's unreduced live load that comes from one occupancy: its L0 or the partition allowance
 * on its area. Kept apart so that each is reduced by its own rule.
 *
 * @param amount lb or kN for a point load (plf or kN/m for a line load), unreduced
 */
public record LiveShare(String occupancy, boolean partition, boolean line, double amount) {
    /** The source suffix of live load from line loads, which is never reduced (it has no tributary area). */
    public static final String LINE = "#line";
    public static final String PARTITIONS = "#partitions";

    public LiveShare {
        Check.text("occupancy", occupancy);
        Check.nonNegative("live", amount);
        if (partition && line) throw new com.baysheet.engine.InputError("line", true, "a share is partitions or a line load, not both");
    }

    /** An occupancy's L0 (or its partition allowance) over area. */
    public LiveShare(String occupancy, boolean partition, double amount) { this(occupancy, partition, false, amount); }

    /** The share of a source key ("office", "office#partitions", "office#line"). */
    public static LiveShare ofSource(String source, double amount) {
        int k = source.indexOf('#');
        String occ = k < 0 ? source : source.substring(0, k), tag = k < 0 ? "" : source.substring(k);
        return new LiveShare(occ, tag.equals(PARTITIONS), tag.equals(LINE), amount);
    }

    /** Map key that groups shares of the same source. */
    public String source() { return partition ? occupancy + PARTITIONS : line ? occupancy + LINE : occupancy; }
}
