package com.baysheet.engine.load;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * A load along part of a beam that is not floor area: cladding, a wall, a parapet. It is a uniform line
 * load from {@code from} to {@code to}; it has no tributary area, so its live part is never reduced (our
 * choice, stated on the sheet) and it counts toward no A_T.
 *
 * @param dead          plf or kN/m
 * @param live          plf or kN/m, unreduced; 0 for none
 * @param liveOccupancy the occupancy id whose live load it is (its combination group: floor or roof); null where
 *                      {@code live} is 0
 * @param partitionWall the load is a partition wall, which the partition allowance may already cover
 */
public record LineLoad(String label, double from, double to, double dead, double live, String liveOccupancy,
                       boolean partitionWall) {
    public LineLoad {
        Check.text("lineLoad.label", label);
        Check.nonNegative("lineLoad.from", from);
        Check.positive("lineLoad.to", to);
        if (to <= from) throw new InputError("lineLoad.to", to, "must be greater than from (" + from + ")");
        Check.nonNegative("lineLoad.dead", dead);
        Check.nonNegative("lineLoad.live", live);
        if (live > 0) Check.text("lineLoad.liveOccupancy", liveOccupancy);
        else liveOccupancy = null;
        if (dead == 0 && live == 0) throw new InputError("lineLoad.dead", 0, "a line load needs a dead or a live load");
    }

    /** Dead load only, not a partition wall. */
    public static LineLoad dead(String label, double from, double to, double dead) {
        return new LineLoad(label, from, to, dead, 0, null, false);
    }

    public double length() { return to - from; }
}
