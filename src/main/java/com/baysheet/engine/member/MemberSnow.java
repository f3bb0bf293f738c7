package com.baysheet.engine.member;

import com.baysheet.engine.code.Edition;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.RoofSnow;
import com.baysheet.engine.snow.SnowLoads;
import com.baysheet.engine.units.Quantity;

/**
 * The snow load S of a member: where its strips lie on a roof and the project has a snow site, the roof's snow loads
 * (ASCE 7-16 Chapter 7, each step on this member's record) and the uniform case on the strips, the larger of the
 * balanced load and the minimum p_m, which is named. Snow arriving in point loads (beam reactions) is added as it is.
 * Snow is never reduced (the reductions of 4.7 and 4.8 are for live loads).
 */
final class MemberSnow {
    private MemberSnow() {}

    /** Puts the strips' snow into {@code book.snow}; true where the member carries any snow load. */
    static boolean record(CalcContext ctx, MemberInput in, LoadBook book, RecordBuilder rec) {
        SnowOnRoof on = in.snow();
        Edition ed = ctx.edition();
        boolean computed = false;
        if (on != null && ctx.snow() != null && !in.strips().isEmpty()) {
            SnowLoads l = RoofSnow.calculate(ctx, ctx.snow(), on.roof(), rec);
            boolean minimum = l.minimumApplies() && l.minimum() > l.balanced();
            String formula = l.minimumApplies() ? "S = max(balanced, p_m)" : "S = balanced";
            String sub = l.minimumApplies() ? "max(" + rec.num(l.balanced(), Quantity.PRESSURE) + ", " + rec.num(l.minimum(), Quantity.PRESSURE) + ")"
                    : rec.num(l.balanced(), Quantity.PRESSURE);
            double s = rec.step("S_u", "Uniform snow load on this member, " + (minimum ? "the minimum p_m governs" : "the balanced load governs"),
                    formula, sub, l.uniform(), Quantity.PRESSURE, ed.clause(minimum ? "snow.minimum" : "snow.sloped"));
            rec.resultText("snow.case", "Governing uniform snow case", minimum ? "minimum p_m" : "balanced");
            if (l.minimumApplies())
                rec.info("The balanced and minimum cases load the whole tributary area alike, so the larger pressure gives the"
                        + " larger of their effects; p_m is a separate case and is not combined with drifts.", ed.clause("snow.minimum"));
            book.snowOnStrips(s);
            computed = true; // S is shown even where it is 0 (p_g = 0, or a steep slippery roof)
        }
        if (on != null && ctx.snow() != null && on.stepAbove() && on.roof().step() == null)
                rec.caution("This roof is lower than another level of the building: drifts at the roof step ("
                        + ed.clause("snow.drift").label() + ") are not computed. Investigate the drift surcharge on members near the step.",
                        ed.clause("snow.drift"));
        if (!computed && book.snow.isEmpty()) return false;
        rec.info("Snow load S is not reduced.", ed.clause("snow.sloped"));
        return true;
    }
}
