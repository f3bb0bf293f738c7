package com.baysheet.engine.beam;

/**
 * Actions of one load set on a member, in system base units (lb or kN, lb·ft or kN·m, ft or m).
 * For two supports, {@code left} and {@code right} are the reactions at x = 0 and x = span; for a
 * cantilever, {@code left} is the reaction and {@code fixedMoment} the moment at the fixed end (hogging
 * negative). Moments are sagging positive. Deflection is downward positive, NaN without a stiffness.
 */
public record BeamActions(double left, double right, double fixedMoment,
                          double maxShear, double maxShearAt,
                          double maxMoment, double maxMomentAt, double minMoment, double minMomentAt,
                          double maxDeflection, double maxDeflectionAt, double tipDeflection) {

    /** The largest reaction, for the concentrated-load scan. */
    public double maxReaction() { return Math.max(Math.abs(left), Math.abs(right)); }
}
