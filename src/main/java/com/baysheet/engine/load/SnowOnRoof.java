package com.baysheet.engine.load;

import com.baysheet.engine.Check;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.StepDrift;

import java.util.List;

/**
 * The roof a member's strips lie on, for its snow load.
 *
 * @param roof       the roof's shape, slope, surface and W
 * @param stepAbove  another level of the building is higher than this roof: drifts at a roof step (7.7) may load it
 * @param drifts     the roof steps found in the model whose drift reaches this member's strips, each with the strips
 *                   (empty: none reaches it; where {@code stepAbove}, the record says which configurations are not covered)
 */
public record SnowOnRoof(SnowRoof roof, boolean stepAbove, List<StepDrift> drifts) {
    public SnowOnRoof {
        Check.present("roof", roof);
        drifts = List.copyOf(Check.present("drifts", drifts));
    }

    /** No drift on this member. */
    public SnowOnRoof(SnowRoof roof, boolean stepAbove) { this(roof, stepAbove, List.of()); }
}
