package com.baysheet.store;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * A point load as the engineer enters it (a rooftop unit, a tank, hung equipment), in the project's base units
 * (lb or kN; ft or m), either
 * <ul>
 *   <li>in a bay: {@code xLine} and {@code yLine} name the grid lines at the bay's west and south sides, and
 *       {@code x}, {@code y} place the load from that corner; or</li>
 *   <li>on a grid-line member: along {@code line} (with {@code axis} "x" or "y" where the name is on both axes), at
 *       {@code distance} from the crossing line {@code from} toward the crossing line {@code to}.</li>
 * </ul>
 * {@code live} (0 for none) is of {@code liveOccupancy}: a floor occupancy gives floor live load, a roof occupancy roof
 * live load; it is never reduced.
 */
public record PointLoadEntry(String label, boolean inBay, String xLine, String yLine, double x, double y,
                             String axis, String line, String from, String to, double distance,
                             double dead, double live, String liveOccupancy) {
    public static final int MAX_LABEL = 120;

    public PointLoadEntry {
        label = Check.text("label", label).strip();
        if (label.length() > MAX_LABEL)
            throw new InputError("label", label.length() + " characters", "must be at most " + MAX_LABEL + " characters");
        if (inBay) {
            xLine = Check.text("xLine", xLine).strip();
            yLine = Check.text("yLine", yLine).strip();
            Check.nonNegative("x", x);
            Check.nonNegative("y", y);
            axis = line = from = to = null;
            distance = Double.NaN;
        } else {
            if (axis != null && !axis.equals("x") && !axis.equals("y")) throw new InputError("axis", axis, "must be x or y");
            line = Check.text("line", line).strip();
            from = Check.text("from", from).strip();
            to = Check.text("to", to).strip();
            if (from.equals(to)) throw new InputError("to", to, "must be another grid line than from (" + from + ")");
            Check.nonNegative("distance", distance);
            xLine = yLine = null;
            x = y = Double.NaN;
        }
        Check.nonNegative("dead", dead);
        Check.nonNegative("live", live);
        if (live > 0) liveOccupancy = Check.text("liveOccupancy", liveOccupancy).strip();
        else liveOccupancy = null;
        if (dead == 0 && live == 0) throw new InputError("dead", 0, "a point load needs a dead or a live load");
    }

    public static PointLoadEntry inBay(String label, String xLine, String yLine, double x, double y, double dead, double live,
                                       String liveOccupancy) {
        return new PointLoadEntry(label, true, xLine, yLine, x, y, null, null, null, null, Double.NaN, dead, live, liveOccupancy);
    }

    public static PointLoadEntry onMember(String label, String axis, String line, String from, String to, double distance,
                                          double dead, double live, String liveOccupancy) {
        return new PointLoadEntry(label, false, null, null, Double.NaN, Double.NaN, axis, line, from, to, distance, dead, live, liveOccupancy);
    }
}
