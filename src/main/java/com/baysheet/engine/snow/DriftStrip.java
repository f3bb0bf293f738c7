package com.baysheet.engine.snow;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * Where one loaded strip of a member lies relative to a roof step, for the drift surcharge on it (ASCE 7-16 7.7.1).
 * Lengths in ft or m; x along the member from its start, distances d measured from the step into the lower roof.
 * <ul>
 *   <li>{@code parallel}: the member runs parallel to the step; its strip is the band of the lower roof from d =
 *       {@code nearFrom} to d = {@code nearFrom} + {@code width} ({@code nearTo} equals {@code nearFrom}), over x from
 *       {@code from} to {@code to}. Its load per length is the surcharge integrated across the band: uniform.</li>
 *   <li>otherwise the member runs away from the step: d is {@code nearFrom} at x = from and {@code nearTo} at x = to
 *       (changing one for one with x), and the strip is {@code width} wide across; its load per length is
 *       width × the surcharge at d(x): a triangle or a trapezoid.</li>
 * </ul>
 * {@code cutOff} is the distance from the step's line to the far edge of the lower roof across this strip, where the
 * drift is cut off (ASCE 7-16 7.7.1): the lower roof length ℓl beside the wall itself, and past a free end of the wall
 * the depth of the lower roof there, which may be more or less than ℓl. 0 where it is not given: then the step's own
 * ℓl cuts the drift.
 */
public record DriftStrip(boolean parallel, double from, double to, double width, double nearFrom, double nearTo, double cutOff) {
    /** Relative tolerance on a perpendicular strip's distances changing one for one with x. */
    static final double GEOMETRY_TOLERANCE = 1e-6;

    public DriftStrip {
        Check.nonNegative("drift.from", from);
        if (!(to > from) || !Double.isFinite(to)) throw new InputError("drift.to", to, "must be greater than from (" + from + ")");
        Check.positive("drift.width", width);
        Check.finite("drift.nearFrom", nearFrom);
        Check.finite("drift.nearTo", nearTo);
        if (parallel && nearFrom != nearTo) throw new InputError("drift.nearTo", nearTo, "a strip parallel to the step lies at one distance");
        if (!parallel && Math.abs(Math.abs(nearTo - nearFrom) - (to - from)) > GEOMETRY_TOLERANCE * Math.max(1, to - from))
            throw new InputError("drift.nearTo", nearTo, "the distance from the step must change one for one along a member running away from it");
        Check.nonNegative("drift.cutOff", cutOff);
        if (!Double.isFinite(cutOff)) throw new InputError("drift.cutOff", cutOff, "must be a finite distance from the step");
    }

    /** A strip cut off where its step's lower roof length ℓl ends. */
    public DriftStrip(boolean parallel, double from, double to, double width, double nearFrom, double nearTo) {
        this(parallel, from, to, width, nearFrom, nearTo, 0);
    }

    /** The step's drift as it acts on this strip: cut off at {@link #cutOff} where that is given. */
    public DriftSurcharge on(DriftSurcharge d) { return cutOff > 0 ? d.cutAt(cutOff) : d; }

    public double length() { return to - from; }

    /** The strip's share of the drift surcharge as a load (lb or kN): its integral over the strip's plan area. */
    public double load(DriftSurcharge step) {
        DriftSurcharge d = on(step);
        if (parallel) return d.over(nearFrom, nearFrom + width) * length();
        return width * d.over(nearFrom, nearTo);
    }
}
