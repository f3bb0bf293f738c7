package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;

import java.util.List;

/**
 * A column stack taken down the building, one row per level from the top down, and the take-down's own
 * record (its steps are the per-level table, with clause numbers).
 *
 * @param gridPoint the grid intersection, e.g. "B/2"
 */
public record TakeDown(String id, String gridPoint, List<Row> rows, CalcRecord record) {
    public TakeDown {
        rows = List.copyOf(rows);
    }

    /**
     * One level of the stack. Areas in ft² or m², loads in lb or kN (system base units).
     *
     * @param member the column member at this level, whose record holds the full calculation
     */
    public record Row(String level, String member, double areaAtLevel, double cumulativeArea, double kll,
                      double influenceArea, int floorsSupported, double factor, double deadAtLevel, double dead,
                      double liveUnreduced, double liveReduced, double roofLive, double lrfd, String lrfdCombination,
                      double asd, String asdCombination) {}
}
