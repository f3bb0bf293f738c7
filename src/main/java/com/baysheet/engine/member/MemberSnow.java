package com.baysheet.engine.member;

import com.baysheet.engine.code.Edition;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.RoofSnow;
import com.baysheet.engine.snow.DriftSurcharge;
import com.baysheet.engine.snow.SnowLoads;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.StepDrift;
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
            SnowRoof roof = on.drifts().isEmpty() ? on.roof() : on.roof().withStep(on.drifts().get(0).step());
            SnowLoads l = RoofSnow.calculate(ctx, ctx.snow(), roof, rec);
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
            drifts(ctx, on, l, book, rec);
            computed = true; // S is shown even where it is 0 (p_g = 0, or a steep slippery roof)
        }
        if (on != null && ctx.snow() != null && on.stepAbove() && on.drifts().isEmpty())
                rec.caution("This roof is lower than another level of the building. Drifts at the roof steps the model shows (a higher"
                        + " level's bays beside this roof's across a grid line) are computed where they reach a member; none reaches this one."
                        + " Drifts at steps the grid does not show (an upper level overhanging, a wall off the grid lines), from a separate"
                        + " structure, and at parapets (" + ed.clause("snow.parapet").label() + ") are not computed: investigate them near"
                        + " such steps (" + ed.clause("snow.drift").label() + ").", ed.clause("snow.drift"));
        if (!computed && book.snow.isEmpty()) return false;
        rec.info("Snow load S is not reduced.", ed.clause("snow.sloped"));
        return true;
    }

    /**
     * Each roof step's drift surcharge on the strips it reaches, on top of the uniform case S_u (our choice: the code's
     * drift case is p_s + surcharge; adding the surcharge to S_u, which is never less than p_s, is conservative by
     * S_u − p_s and keeps one snow case through girders and columns).
     */
    private static void drifts(CalcContext ctx, SnowOnRoof on, SnowLoads l, LoadBook book, RecordBuilder rec) {
        Edition ed = ctx.edition();
        double added = 0;
        for (int i = 0; i < on.drifts().size(); i++) {
            StepDrift sd = on.drifts().get(i);
            rec.info("Roof step " + (i + 1) + ": " + sd.where() + ".", ed.clause("snow.drift"));
            DriftSurcharge d = i == 0 ? l.drift() : RoofSnow.drift(ctx, ctx.snow(), l.sloped(), sd.step(), rec);
            if (!d.required()) continue;
            if (sd.pastEnds())
                rec.info("Roof step " + (i + 1) + ": the drift is carried past the free end of the wall for the drift width w, with"
                        + " the profile it has at the wall (p_d at the wall's line, linear to 0 at w), over the lower roof's exposed"
                        + " bays (our choice, common practice, conservative: the code gives no rule at the ends of a wall, and drifting"
                        + " snow does not stop where the wall stops).", ed.clause("snow.drift"));
            for (int k = 0; k < sd.strips().size(); k++)
                added += MemberDrift.strip(ed, d, sd.strips().get(k), (i + 1) + "." + (k + 1), rec, book.snow, book.driftSketch);
        }
        if (added > 0) {
            rec.result("snow.drift.load", "Drift surcharge carried by this member", added, Quantity.FORCE);
            rec.info("Drift surcharge added to the uniform snow load S_u on this member: the drift case of the code is p_s plus the"
                    + " surcharge, and S_u is never less than p_s, so the sum is conservative by S_u − p_s (our choice: one snow case"
                    + " through the girders and columns).", ed.clause("snow.drift"));
        }
    }
}
