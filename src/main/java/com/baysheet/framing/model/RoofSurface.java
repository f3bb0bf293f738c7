package com.baysheet.framing.model;

import com.baysheet.engine.Check;
import com.baysheet.engine.snow.SnowRoof;

/**
 * What a roof level's snow load needs beyond its slope: the roof's shape, whether its surface is unobstructed and
 * slippery, and the eave-to-ridge distance W (ft or m; NaN where not given) for rain-on-snow.
 */
public record RoofSurface(SnowRoof.Shape shape, boolean slippery, double eaveToRidge) {
    /** Monoslope (flat included), not slippery, no W: the defaults of a new level. */
    public static final RoofSurface DEFAULT = new RoofSurface(SnowRoof.Shape.MONOSLOPE, false, Double.NaN);

    public RoofSurface {
        Check.present("roofShape", shape);
        if (!Double.isNaN(eaveToRidge)) Check.positive("eaveToRidge", eaveToRidge);
    }

    /**
     * The engine's roof: every derived beam and girder is a single simple span, so partial loading (7.5) cannot
     * raise an effect on it; drifts are not computed from the model (no step).
     */
    public SnowRoof roof(double slope) { return new SnowRoof(shape, slope, slippery, eaveToRidge, true, null); }
}
