package com.baysheet.sheet;

import com.baysheet.engine.units.UnitSystem;

/**
 * Lengths as a drawing dimensions them: feet and inches to the nearest eighth of an inch on a US project
 * (25'-6", 25'-6 1/2", 0'-8"), whole millimetres on an SI one (7500).
 */
final class PlanLengths {
    private PlanLengths() {}

    /** Eighths of an inch in a foot. */
    private static final int EIGHTHS = 96;

    static String of(double base, UnitSystem system) {
        if (system == UnitSystem.SI) return Long.toString(Math.round(base * 1000));
        long eighths = Math.round(Math.abs(base) * EIGHTHS);
        long feet = eighths / EIGHTHS, rest = eighths % EIGHTHS, inches = rest / 8, frac = rest % 8;
        String f = frac == 0 ? "" : " " + (frac % 4 == 0 ? frac / 4 + "/2" : frac % 2 == 0 ? frac / 2 + "/4" : frac + "/8");
        return (base < 0 && eighths > 0 ? "-" : "") + feet + "'-" + inches + f + "\"";
    }

    /** What the dimensions are in, for the legend. */
    static String unit(UnitSystem system) {
        return system == UnitSystem.SI ? "Dimensions in millimetres." : "Dimensions in feet and inches.";
    }
}
