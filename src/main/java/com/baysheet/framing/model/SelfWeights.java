package com.baysheet.framing.model;

import com.baysheet.engine.Check;

/**
 * Each member's own weight per length by its role, as a dead load: infill beams, grid beams (grid-line
 * members carrying slab only), girders and columns, in plf or kN/m. A column's weight over the storey
 * below each level is added to the take-down there.
 *
 * @param origin where the figures come from, printed beside each ("firm default"); 0 everywhere is allowed and
 *               stated on every sheet as "self weight not included (0)"
 */
public record SelfWeights(double infillBeam, double gridBeam, double girder, double column, String origin) {
    /** Nothing set: every sheet says self weight is not included. */
    public static final SelfWeights NONE = new SelfWeights(0, 0, 0, 0, "none set in the firm's settings");

    public SelfWeights {
        Check.nonNegative("selfWeight.infillBeam", infillBeam);
        Check.nonNegative("selfWeight.gridBeam", gridBeam);
        Check.nonNegative("selfWeight.girder", girder);
        Check.nonNegative("selfWeight.column", column);
        origin = Check.text("selfWeight.origin", origin).strip();
    }

    public boolean none() { return infillBeam == 0 && gridBeam == 0 && girder == 0 && column == 0; }
}
