package com.baysheet.sheet;

import java.util.List;

/**
 * The design criteria printed on a package cover, as text already formatted for the sheet.
 *
 * @param loads   one row per occupancy used: the loads as the sheets use them
 * @param options project options in words ("Partition allowance: not included")
 */
public record DesignCriteria(String edition, String units, List<LoadRow> loads, List<String> options) {
    public DesignCriteria {
        loads = List.copyOf(loads);
        options = List.copyOf(options);
    }

    /** @param reduction how the live load may be reduced, in words */
    public record LoadRow(String occupancy, String liveLoad, String concentrated, String deadLoad, String reduction) {}
}
