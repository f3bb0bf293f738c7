package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;

import java.util.List;
import java.util.function.Supplier;

/**
 * A column stack taken down the building, one row per level from the top down, and the take-down's own
 * record (its steps are the per-level table, with clause numbers). The rows hold every number; the record
 * is written from them when first asked for, since a large building has tens of thousands of rows and
 * most are never shown.
 */
public final class TakeDown {
    private final String id;
    private final String gridPoint;
    private final List<Row> rows;
    private Supplier<CalcRecord> writer;
    private CalcRecord record;

    /** @param gridPoint the grid intersection, e.g. "B/2" */
    public TakeDown(String id, String gridPoint, List<Row> rows, Supplier<CalcRecord> writer) {
        this.id = id;
        this.gridPoint = gridPoint;
        this.rows = List.copyOf(rows);
        this.writer = writer;
    }

    public String id() { return id; }

    public String gridPoint() { return gridPoint; }

    public List<Row> rows() { return rows; }

    public synchronized CalcRecord record() {
        if (record == null) {
            record = writer.get();
            writer = null;
        }
        return record;
    }

    /**
     * One level of the stack. Areas in ft² or m², loads in lb or kN (system base units).
     *
     * @param member         the id of the column member at this level, whose record holds the full calculation
     * @param areaAtLevel    the area this level brings to the column, floor and roof (this level only)
     * @param cumulativeArea A_T supported: the floor area at and above this level (cumulative, roofs excluded)
     * @param reducibleArea  the part of A_T supported whose live load may be reduced (cumulative)
     * @param kll            K_LL of the column's place on this level
     * @param influenceArea  the K_LL·A_T that gave f: Σ K_LL,i × reducible A_T,i over the floors supported; 0 where
     *                       nothing is reducible
     * @param factor         f of Eq. 4.7-1 with its limit, as it applies to ordinary floor live load
     * @param deadAtLevel    the dead load this level adds: its members' reactions and the self weight of the column below it
     * @param selfWeightAtLevel the self weight of the column below this level (part of deadAtLevel)
 * @param snow           the roof snow load S at and above this level, unfactored and not reduced (only roof
 *                       levels add to it; 0 without a snow site)
     */
    public record Row(String level, String member, double areaAtLevel, double cumulativeArea, double reducibleArea,
                      double kll, double influenceArea, int floorsSupported, double factor, double deadAtLevel, double selfWeightAtLevel, double dead,
                      double liveUnreduced, double liveReduced, double roofLive, double snow, double lrfd, String lrfdCombination,
                      double asd, String asdCombination) {}
}
