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
 * calculation under the member's own subject, so nothing is approximated.
 */
final class MemberCache {
    private static final String ANY = "member";
    private final CalcContext ctx;
    private final Map<MemberInput, MemberResult> done = new HashMap<>();

    MemberCache(CalcContext ctx) { this.ctx = ctx; }

    CalcContext context() { return ctx; }

    MemberResult calculate(MemberInput in) {
        MemberResult r = done.computeIfAbsent(in.withSubject(ANY), k -> MemberCalculation.calculate(ctx, k));
        return r.withSubject(in.subject());
    }

    int distinct() { return done.size(); }
}
