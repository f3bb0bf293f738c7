package com.baysheet.engine.snow;

import com.baysheet.engine.Check;

import java.util.Optional;

/**
 * The roof a snow load is worked out for.
 *
 * @param shape       monoslope (flat included) or hip and gable
 * @param slope       rise in in/ft (US) or percent (SI), 0 or more
 * @param slippery    an unobstructed slippery surface that lets snow slide off the eaves (the slippery C_s curve)
 * @param eaveToRidge horizontal eave-to-ridge distance W, ft or m, for rain-on-snow; NaN where not given
 *                    (then required only on a sloped roof where rain-on-snow may apply)
 * @param simpleSpans every member under this roof is a single simple span, so partial loading cannot raise an
 *                    effect; false (the safe default) puts the partial-loading caution on the record
 * @param step        the step to a higher roof for drifts on this (lower) roof, or null
 */
public record SnowRoof(Shape shape, double slope, boolean slippery, double eaveToRidge, boolean simpleSpans, RoofStep step) {
    public enum Shape { MONOSLOPE, HIP_OR_GABLE }

    public SnowRoof {
        Check.present("roofShape", shape);
        Check.nonNegative("roofSlope", slope);
        if (!Double.isNaN(eaveToRidge)) Check.positive("eaveToRidge", eaveToRidge);
    }

    public static SnowRoof of(Shape shape, double slope, boolean slippery, double eaveToRidge) {
        return new SnowRoof(shape, slope, slippery, eaveToRidge, false, null);
    }

    public SnowRoof withStep(RoofStep s) { return new SnowRoof(shape, slope, slippery, eaveToRidge, simpleSpans, s); }

    public SnowRoof withSimpleSpans(boolean b) { return new SnowRoof(shape, slope, slippery, eaveToRidge, b, step); }

    public Optional<RoofStep> roofStep() { return Optional.ofNullable(step); }
}
