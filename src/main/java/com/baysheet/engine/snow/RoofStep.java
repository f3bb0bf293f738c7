package com.baysheet.engine.snow;

import com.baysheet.engine.Check;

/**
 * The geometry of a roof step for drifts on the lower roof: ft (US) or m (SI), each finite and greater than 0.
 *
 * @param height      vertical distance from the lower roof surface up to the upper roof at the step
 * @param upperLength length of the upper roof upwind of the step (for the leeward drift)
 * @param lowerLength length of the lower roof from the step (for the windward drift; the drift is truncated there)
 */
public record RoofStep(double height, double upperLength, double lowerLength) {
    public RoofStep {
        Check.positive("stepHeight", height);
        Check.positive("upperRoofLength", upperLength);
        Check.positive("lowerRoofLength", lowerLength);
    }
}
