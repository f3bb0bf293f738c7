package com.baysheet.framing.model;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * A concentrated load on one level (a rooftop unit, a tank, hung equipment), dead and optionally live with the
 * occupancy whose combination group it joins (a roof occupancy: roof live load). It lies either
 * <ul>
 *   <li>in a bay ({@code inBay}): the cell ({@code col}, {@code row}), at {@code x}, {@code y} from the bay's south-west
 *       corner; it goes to the two members either side of it across the beams by the lever rule; or</li>
 *   <li>on a grid-line member: along x line {@code line} ({@code onXLine}) or y line, at {@code distance} from the crossing
 *       line {@code from} toward the crossing line {@code to}.</li>
 * </ul>
 * Lengths in ft or m, loads in lb or kN. The live part is never reduced (it has no tributary area).
 */
public record GridPointLoad(String level, String label, boolean inBay, int col, int row, double x, double y,
                            boolean onXLine, int line, int from, int to, double distance,
                            double dead, double live, String liveOccupancy) {
    public GridPointLoad {
        Check.text("pointLoad.level", level);
        label = Check.text("pointLoad.label", label).strip();
        if (inBay) {
            if (col < 0) throw new InputError("pointLoad.bay", col, "must be 0 or more");
            if (row < 0) throw new InputError("pointLoad.bay", row, "must be 0 or more");
            Check.nonNegative("pointLoad.x", x);
            Check.nonNegative("pointLoad.y", y);
        } else {
            if (line < 0) throw new InputError("pointLoad.line", line, "must be 0 or more");
            if (from < 0 || to < 0 || from == to) throw new InputError("pointLoad.to", to, "must be another grid line than from");
            Check.nonNegative("pointLoad.distance", distance);
        }
        Check.nonNegative("pointLoad.dead", dead);
        Check.nonNegative("pointLoad.live", live);
        if (live > 0) Check.text("pointLoad.liveOccupancy", liveOccupancy);
        else liveOccupancy = null;
        if (dead == 0 && live == 0) throw new InputError("pointLoad.dead", 0, "a point load needs a dead or a live load");
    }

    public static GridPointLoad inBay(String level, String label, int col, int row, double x, double y, double dead,
                                      double live, String liveOccupancy) {
        return new GridPointLoad(level, label, true, col, row, x, y, false, 0, 0, 1, 0, dead, live, liveOccupancy);
    }

    public static GridPointLoad onLine(String level, String label, boolean onXLine, int line, int from, int to, double distance,
                                       double dead, double live, String liveOccupancy) {
        return new GridPointLoad(level, label, false, 0, 0, 0, 0, onXLine, line, from, to, distance, dead, live, liveOccupancy);
    }

    /** Where it lies on plan, {x, y} in ft or m (the grid's lines must hold its bay or lines). */
    public double[] onPlan(Grid g) {
        if (inBay) return new double[] {g.x().position(col) + x, g.y().position(row) + y};
        GridAxis across = onXLine ? g.y() : g.x();
        double along = across.position(from) + Math.signum(to - from) * distance;
        return onXLine ? new double[] {g.x().position(line), along} : new double[] {along, g.y().position(line)};
    }
}
