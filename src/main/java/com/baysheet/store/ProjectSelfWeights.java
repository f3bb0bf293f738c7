package com.baysheet.store;

import com.baysheet.engine.Check;

/**
 * A project's own self weights by role, overriding the firm's defaults, in the project's base units (plf or kN/m).
 * All four are given together: a project either states its own or takes the firm's.
 */
public record ProjectSelfWeights(double infillBeam, double gridBeam, double girder, double column) {
    public ProjectSelfWeights {
        Check.nonNegative("swInfillBeam", infillBeam);
        Check.nonNegative("swGridBeam", gridBeam);
        Check.nonNegative("swGirder", girder);
        Check.nonNegative("swColumn", column);
    }
}
