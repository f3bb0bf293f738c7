package com.baysheet.sheet;

import java.util.List;

/**
 * The design criteria printed on a package cover, as text already formatted for the sheet.
 *
 * @param loads   one row per occupancy used: the loads as the sheets use them
 * @param options      project options in words ("Partition allowance: not included")
 * @param combinations the gravity load combinations the records choose from, as written ("LRFD 2: 1.2D + 1.6L + 0.5Lr")
 * @param selfWeights  the members' self weights by role in words, or how they are left out
 */
public record DesignCriteria(String edition, String units, List<LoadRow> loads, List<String> options,
                             List<String> combinations, List<String> selfWeights) {
    public DesignCriteria {
        loads = List.copyOf(loads);
        options = List.copyOf(options);
        combinations = List.copyOf(combinations);
        selfWeights = List.copyOf(selfWeights);
    }

    /** Criteria without the combinations and self weights listed. */
    public DesignCriteria(String edition, String units, List<LoadRow> loads, List<String> options) {
        this(edition, units, loads, options, List.of(), List.of());
    }

    /** @param reduction how the live load may be reduced, in words */
    public record LoadRow(String occupancy, String liveLoad, String concentrated, String deadLoad, String reduction) {}
}
