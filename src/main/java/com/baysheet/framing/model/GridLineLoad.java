package com.baysheet.framing.model;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * A load along a grid line on one level, between two other grid lines that cross it: cladding or a wall on
 * an edge or interior line, a parapet. It lands on the grid-line members beneath it and reaches the columns
 * only through them.
 *
 * @param level         the level's name
 * @param onXLine       true: along x line {@code line} (running north-south), bounded by y lines; false: along y line
 *                      {@code line}, bounded by x lines
 * @param line          the line's position on its axis
 * @param from          the position of the first bounding line (on the other axis)
 * @param to            the position of the second bounding line, greater than {@code from}
 * @param dead          plf or kN/m
 * @param live          plf or kN/m, not reduced; 0 for none
 * @param liveOccupancy the occupancy id of the live part (null where live is 0)
 * @param partitionWall a partition wall, which the partition allowance may already cover
 */
public record GridLineLoad(String level, boolean onXLine, int line, int from, int to, String label, double dead,
                           double live, String liveOccupancy, boolean partitionWall) {
    public GridLineLoad {
        Check.text("lineLoad.level", level);
        label = Check.text("lineLoad.label", label).strip();
        if (line < 0) throw new InputError("lineLoad.line", line, "must be 0 or more");
        if (from < 0) throw new InputError("lineLoad.from", from, "must be 0 or more");
        if (to <= from) throw new InputError("lineLoad.to", to, "must be a grid line past the first bounding line");
        Check.nonNegative("lineLoad.dead", dead);
        Check.nonNegative("lineLoad.live", live);
        if (live > 0) Check.text("lineLoad.liveOccupancy", liveOccupancy);
        else liveOccupancy = null;
        if (dead == 0 && live == 0) throw new InputError("lineLoad.dead", 0, "a line load needs a dead or a live load");
    }

    /** Dead load only. */
    public static GridLineLoad dead(String level, boolean onXLine, int line, int from, int to, String label, double dead) {
        return new GridLineLoad(level, onXLine, line, from, to, label, dead, 0, null, false);
    }
}
