package com.baysheet.framing;

import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.CalcContext;

import java.util.HashMap;
import java.util.Map;

/**
 * Calculates each distinct member once per derivation. Framing repeats: identical bays give identical
 * beams, girders and columns, whose inputs are equal records but for their names. The result is the same
 * calculation under the member's own subject, so nothing is approximated. A cache may also read the results
 * an earlier derivation in the same context kept ({@link #kept}): the engine is a pure function of the context
 * and the input, so an earlier result of an equal input is the result.
 */
final class MemberCache {
    /**
     * The subject every cached input is built and calculated under; the caller gives each member its own subject on
     * the result ({@code MemberResult.withSubject}), so one input is built per member.
     */
    static final String NEUTRAL = "member";
    private final CalcContext ctx;
    private final Map<MemberInput, MemberResult> earlier;
    private final Map<MemberInput, MemberResult> done = new HashMap<>();

    MemberCache(CalcContext ctx) { this(ctx, Map.of()); }

    /** @param earlier results of an earlier derivation in this same context, never written to (another thread may read it) */
    MemberCache(CalcContext ctx, Map<MemberInput, MemberResult> earlier) {
        this.ctx = ctx;
        this.earlier = earlier;
    }

    CalcContext context() { return ctx; }

    /** The result of {@code neutral}, an input built under the subject {@link #NEUTRAL}, under that subject. */
    MemberResult neutral(MemberInput neutral) {
        return done.computeIfAbsent(neutral, k -> {
            MemberResult e = earlier.get(k);
            return e != null ? e : MemberCalculation.calculate(ctx, k);
        });
    }

    int distinct() { return done.size(); }

    /**
     * What a later derivation may read: this derivation's results, and the earlier ones as long as the stale
     * entries they bring stay fewer than this derivation's own (so what is kept never outgrows two derivations).
     * A new map: the ones handed out are never changed.
     */
    Map<MemberInput, MemberResult> kept() {
        Map<MemberInput, MemberResult> out = new HashMap<>(earlier.size() <= done.size() ? earlier : Map.of());
        out.putAll(done);
        return out;
    }
}
