package com.baysheet.engine.load;

import com.baysheet.engine.Check;
import com.baysheet.engine.snow.SnowRoof;

/**
 * The roof a member's strips lie on, for its snow load.
 *
 * @param roof       the roof's shape, slope, surface and W
 * @param stepAbove  another level of the building is higher than this roof: drifts at the roof step (7.7) may load
 *                   it, and they are not computed from the model, so the member's record carries a caution
 */
public record SnowOnRoof(SnowRoof roof, boolean stepAbove) {
    public SnowOnRoof {
        Check.present("roof", roof);
    }
}
