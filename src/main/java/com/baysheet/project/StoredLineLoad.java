package com.baysheet.project;

/**
 * A line load as stored, its lines named as the grid names them now (they follow the lines' stable ids).
 *
 * @param axis         "x": along an x line (bounded by y lines); "y": along a y line (bounded by x lines)
 * @param dead         plf or kN/m, the load the members carry
 * @param deadPressure psf or kN/m² where the dead load was entered as cladding (NaN otherwise)
 * @param height       ft or m, with {@code deadPressure} (NaN otherwise)
 */
public record StoredLineLoad(long id, long levelId, String axis, String line, String from, String to, String label,
                             double dead, double deadPressure, double height, double live, String liveOccupancy,
                             boolean partitionWall) {
    /** "2, A-C": the line and its bounds as the trade writes them. */
    public String segment() { return line + ", " + from + "-" + to; }

    public boolean cladding() { return !Double.isNaN(deadPressure); }
}
