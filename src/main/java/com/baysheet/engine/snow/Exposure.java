package com.baysheet.engine.snow;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * The exposure factor C_e: looked up in the edition's exposure table by terrain and exposure, or given directly
 * by the engineer (a local code's value, say); exactly one of the two.
 *
 * @param given C_e given directly, or NaN where the table is used
 */
public record Exposure(Terrain terrain, Shelter shelter, double given) {
    /** Surface roughness of the exposure table (ASCE 7-16 Table 7.3-1 rows). */
    public enum Terrain { B, C, D, ABOVE_TREE_LINE, ALASKA_TREELESS }

    /** Exposure of the roof: fully exposed, partially exposed, sheltered. */
    public enum Shelter { FULLY, PARTIALLY, SHELTERED }

    public Exposure {
        if (Double.isNaN(given)) {
            Check.present("terrain", terrain);
            Check.present("exposure", shelter);
        } else {
            Check.positive("exposureFactor", given);
            if (terrain != null || shelter != null)
                throw new InputError("exposureFactor", given, "is given directly: leave terrain and exposure empty");
        }
    }

    public static Exposure of(Terrain terrain, Shelter shelter) { return new Exposure(terrain, shelter, Double.NaN); }

    public static Exposure given(double ce) {
        com.baysheet.engine.Check.positive("exposureFactor", ce); // NaN here would otherwise mean "from the table"
        return new Exposure(null, null, ce);
    }

    public boolean fromTable() { return Double.isNaN(given); }
}
