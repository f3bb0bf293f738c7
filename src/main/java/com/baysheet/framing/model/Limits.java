package com.baysheet.framing.model;

import com.baysheet.engine.InputError;
import com.baysheet.engine.reduction.RoofLiveLoad;
import com.baysheet.engine.units.UnitSystem;

/**
 * The bounds on what one project or one request may ask of the server, so that no single request can take
 * the heap or the CPU from the office. Each is set well above the largest model the benchmarks use
 * (60 levels of 24 × 24 to 28 × 24 bays, a 500-member package); docs/reliability.md lists them all.
 * Ranges of values are in the project's unit system: US ft, psf; SI m, kN/m².
 */
public final class Limits {
    /** Grid lines along one axis (the benchmarks use 29). */
    public static final int MAX_GRID_LINES = 100;
    /** Characters in a grid line's name (the column is VARCHAR(20)). */
    public static final int MAX_LINE_NAME = 20;
    /** Levels in one project (the benchmarks use 60). */
    public static final int MAX_LEVELS = 200;
    /** Bays over all levels of one project (the benchmarks use 60 × 28 × 24 = 40,320). */
    public static final int MAX_BAYS = 200_000;
    /** Derived members (beams, girders, columns) of one project (the benchmarks reach about 150,000). */
    public static final int MAX_MEMBERS = 500_000;
    /** Cells one bay-editor request may select: a whole level of the largest grid. */
    public static final int MAX_CELLS_PER_REQUEST = (MAX_GRID_LINES - 1) * (MAX_GRID_LINES - 1);
    /** Member sheets in one package (the benchmarks use 500). */
    public static final int MAX_PACKAGE_SHEETS = 5_000;
    /** Packages waiting or rendering at once, over the whole server. */
    public static final int MAX_QUEUED_PACKAGES = 4;

    /** Grid spacing: 0.1 ft to 1000 ft; SI 0.03 m to 300 m (about the same lengths). */
    public static final double MIN_SPACING_FT = 0.1, MAX_SPACING_FT = 1000, MIN_SPACING_M = 0.03, MAX_SPACING_M = 300;
    // roof slope: the engine's own range (RoofLiveLoad.MAX_SLOPE_US and MAX_SLOPE_SI: 24 in/ft, 200 %)
    /** Level elevation from grade, either way: 10,000 ft; SI 3000 m. */
    public static final double MAX_ELEVATION_FT = 10_000, MAX_ELEVATION_M = 3_000;
    /** A slab cantilever: 0.1 ft to 100 ft; SI 0.03 m to 30 m. */
    public static final double MIN_CANTILEVER_FT = 0.1, MAX_CANTILEVER_FT = 100, MIN_CANTILEVER_M = 0.03, MAX_CANTILEVER_M = 30;
    /** A bay's dead load: at most 2000 psf; SI 100 kN/m². */
    public static final double MAX_DEAD_LOAD_PSF = 2_000, MAX_DEAD_LOAD_KPA = 100;

    private Limits() {}

    /** Refuses a count past its limit, naming the field and the limit. */
    public static void count(String field, long n, int max, String what) {
        if (n > max) throw new InputError(field, n, "at most " + max + " " + what + " (limit " + field + ")");
    }

    /** Refuses a value outside [lo, hi] with the range and unit in the message. */
    public static double range(String field, double v, double lo, double hi, String unit) {
        if (!Double.isFinite(v) || v < lo || v > hi)
            throw new InputError(field, v, "must lie between " + plain(lo) + " and " + plain(hi) + " " + unit);
        return v;
    }

    /** The bounds of a building's grid and bays (levels without a floor are checked by {@link #level}). */
    public static void check(Building b) {
        boolean us = b.context().system() == UnitSystem.US;
        for (GridAxis a : new GridAxis[]{b.grid().x(), b.grid().y()}) {
            count("grid." + a.axis() + ".names", a.lines(), MAX_GRID_LINES, "grid lines along " + a.axis());
            for (int i = 0; i < a.cells(); i++)
                range("grid." + a.axis() + ".spacings[" + a.name(i) + "-" + a.name(i + 1) + "]", a.spacing(i),
                        us ? MIN_SPACING_FT : MIN_SPACING_M, us ? MAX_SPACING_FT : MAX_SPACING_M, us ? "ft" : "m");
        }
        long bays = 0;
        for (Level l : b.levels()) {
            bays += l.bays().size();
            for (Bay bay : l.bays()) bay(bay, us);
        }
        count("bays", bays, MAX_BAYS, "bays in a project");
    }

    /** The bounds of one level as entered: elevation from grade and, for a roof, the slope the engine takes. */
    public static void level(UnitSystem units, double elevation, boolean roof, double roofSlope) {
        boolean us = units == UnitSystem.US;
        double e = us ? MAX_ELEVATION_FT : MAX_ELEVATION_M;
        range("elevation", elevation, -e, e, us ? "ft" : "m");
        // the engine's own range for Lr, so that no stored roof fails only when its sheet is calculated
        if (roof) range("roofSlope", roofSlope, 0, us ? RoofLiveLoad.MAX_SLOPE_US : RoofLiveLoad.MAX_SLOPE_SI, us ? "in/ft" : "%");
    }

    private static void bay(Bay bay, boolean us) {
        if (bay.opening()) return;
        range("deadLoad", bay.deadLoad(), 0, us ? MAX_DEAD_LOAD_PSF : MAX_DEAD_LOAD_KPA, us ? "psf" : "kN/m²");
        bay.cantilevers().forEach((side, v) -> range("cantilevers." + side.name().toLowerCase(), v,
                us ? MIN_CANTILEVER_FT : MIN_CANTILEVER_M, us ? MAX_CANTILEVER_FT : MAX_CANTILEVER_M, us ? "ft" : "m"));
    }

    private static String plain(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }
}
