package com.baysheet.project;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * A line load as the engineer enters it: the grid line and the two lines that bound it by their names, the
 * dead load per length given directly or as cladding (a weight per area times a height), and an unreduced
 * live load. Loads in the project's base units (plf or kN/m; psf or kN/m²; ft or m).
 *
 * @param axis          "x" or "y" where {@code line} names a line on both axes; null to find it by name
 * @param dead          plf or kN/m, or NaN where {@code deadPressure} and {@code height} give it
 * @param deadPressure  psf or kN/m², or NaN
 * @param height        ft or m, or NaN
 * @param liveOccupancy the occupancy of the live part (required where {@code live} is more than 0)
 */
public record LineLoadEntry(String axis, String line, String from, String to, String label, double dead,
                            double deadPressure, double height, double live, String liveOccupancy,
                            boolean partitionWall) {
    public static final int MAX_LABEL = 120;

    public LineLoadEntry {
        if (axis != null && !axis.equals("x") && !axis.equals("y")) throw new InputError("axis", axis, "must be x or y");
        line = Check.text("line", line).strip();
        from = Check.text("from", from).strip();
        to = Check.text("to", to).strip();
        if (from.equals(to)) throw new InputError("to", to, "must be another grid line than from (" + from + ")");
        label = Check.text("label", label).strip();
        if (label.length() > MAX_LABEL)
            throw new InputError("label", label.length() + " characters", "must be at most " + MAX_LABEL + " characters");
        boolean byPressure = !Double.isNaN(deadPressure) || !Double.isNaN(height);
        if (byPressure) {
            if (!Double.isNaN(dead)) throw new InputError("dead", dead, "give the dead load per length or a weight per area and a height, not both");
            Check.nonNegative("deadPressure", deadPressure);
            Check.positive("height", height);
        } else {
            Check.nonNegative("dead", dead);
        }
        Check.nonNegative("live", live);
        // the fields are assigned after this body: work from the parameters
        double perLength = byPressure ? deadPressure * height : dead;
        if (!Double.isFinite(perLength)) throw new InputError("height", height, "gives a dead load per length that is not a finite number");
        if (live > 0) liveOccupancy = Check.text("liveOccupancy", liveOccupancy).strip();
        else liveOccupancy = null;
        if (perLength == 0 && live == 0) throw new InputError("dead", 0, "a line load needs a dead or a live load");
    }

    /** The dead load per length: as given, or the weight per area times the height. */
    public double deadLoad() {
        return Double.isNaN(dead) ? deadPressure * height : dead;
    }
}
