package com.baysheet.engine.member;

import com.baysheet.engine.beam.BeamActions;
import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.LoadCombinations.Combination;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.record.ResultKey;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;

import java.util.ArrayList;
import java.util.List;

/**
 * The least reaction at each support of a beam overhanging a support, where live load placed on the
 * overhang alone lifts the back-span support (ASCE 7-16 4.3.3 partial loading). Each live case takes the
 * least of its patterns (whole member, back span, overhang) and of no live load at all, unreduced
 * (the reduction of 4.7 rests on the whole member's K_LL A_T, the overhang alone is a smaller area:
 * conservative) and also the 4.4 concentrated load at either end of its travel: the floor's against the floor live
 * load, the roof's (the roof concentrated load for maintenance workers) against the roof live load. A reaction is
 * linear in the load's position, so the end of its travel on the overhang is where it most reduces the back-span
 * reaction (statics). The gravity
 * combinations then give the least factored and service reactions, the permissive 0.5 L of combination 3
 * not taken. A negative one is uplift, flagged with a caution. Simple spans and cantilevers under gravity
 * loads cannot lift a support: nothing is recorded for them.
 */
final class MinimumReactions {
    private MinimumReactions() {}

    /** 0.9D + 1.6L + 0.5Lr: no 2.3.1 combination, a firm's conservative practice offered as a project option. */
    static final Combination FIRM_NINETY_DEAD = new Combination("firm 0.9D", 0.9, 1.6, 0.5, false, true);

    /** One support: its effect and the position and name used in the text. */
    private record End(BendingActions.Effect effect, String name, String where) {}

    /** A live case's least reaction, with the placement that gave it. */
    private record Least(double value, String placement) {}

    static void record(CalcContext ctx, Support.Overhang s, LoadBook book, BeamLoads floor0, BeamLoads roof0, RecordBuilder rec) {
        Edition ed = ctx.edition();
        BeamActions dead = MemberCalculation.solve(s, book.dead, Double.NaN);
        boolean hasL = !floor0.isEmpty(), hasLr = !roof0.isEmpty();
        boolean firm = ctx.options().upliftReducedDead();
        List<End> ends = List.of(new End(BendingActions.Effect.RA, "A", "x = 0"),
                new End(BendingActions.Effect.RB, "B", "x = " + rec.show(s.span(), Quantity.LENGTH)));
        String noteCombination = "", notePlacement = "";
        Clause noteClause = Clause.NONE;
        for (End end : ends) {
            BendingActions.Effect e = end.effect;
            String key = e.key + ",min", sym = e.symbol + ",min", title = "Least " + e.lower;
            double d = BendingActions.value(dead, e, s);
            Least l = hasL ? least(ctx, book, s, floor0, e, true) : new Least(0, "");
            Least lr = hasLr ? least(ctx, book, s, roof0, e, false) : new Least(0, "");
            if (hasL) liveStep(rec, sym + ".L0", key, "L0", title + ", floor live load unreduced", l, ed.clause("partial"));
            if (hasLr) liveStep(rec, sym + ".Lr0", key, "Lr0", title + ", roof live load unreduced", lr, ed.clause("partial"));
            Pick u = pick(true, d, l.value, lr.value, firm);
            Pick a = pick(false, d, l.value, lr.value, false);
            Clause uc = clause(ed, u.c), ac = clause(ed, a.c);
            rec.step("LRFD." + key, title + ", factored, " + u.c.name() + " governs", brief(u.c, hasL, hasLr),
                    substituted(rec, u.c, d, l.value, lr.value, hasL, hasLr), u.value, Quantity.FORCE, uc);
            rec.step("ASD." + key, title + ", service, " + a.c.name() + " governs", brief(a.c, hasL, hasLr),
                    substituted(rec, a.c, d, l.value, lr.value, hasL, hasLr), a.value, Quantity.FORCE, ac);
            rec.result(ResultKey.of("LRFD", key), title + ", factored (" + u.c.name() + ")", u.value, Quantity.FORCE)
               .result(ResultKey.of("ASD", key), title + ", service (" + a.c.name() + ")", a.value, Quantity.FORCE);
            if (e == BendingActions.Effect.RA) {   // the note names the code's case at the back-span support
                Combination code = firm ? pick(true, d, l.value, lr.value, false).c : u.c;
                noteCombination = brief(code, hasL, hasLr);
                notePlacement = hasL ? l.placement : lr.placement;
                noteClause = clause(ed, code);
            }
            if (u.value < 0 || a.value < 0) uplift(rec, end, u, a, u.value < 0 ? uc : ac);
        }
        String also = firm ? "; also " + brief(FIRM_NINETY_DEAD, hasL, hasLr) + " (firm practice, not a "
                + ed.clause("combo.lrfd").ref() + " combination)" : "";
        rec.info("Minimum reactions from " + noteCombination + " with " + notePlacement
                + (noteClause.isNone() ? "" : " (" + noteClause.ref() + ")") + also
                + ". Live load taken unreduced for the minimum reactions (conservative).", ed.clause("partial"));
    }

    private record Pick(double value, Combination c) {}

    /** The least of the gravity combinations (and the firm's 0.9D where chosen), full L in every one. */
    private static Pick pick(boolean strength, double d, double l, double lr, boolean firm) {
        List<Combination> all = new ArrayList<>();
        for (Combination c : LoadCombinations.GRAVITY) if (c.strength() == strength) all.add(c);
        if (firm) all.add(FIRM_NINETY_DEAD);
        Combination best = null;
        double bestV = 0;
        for (Combination c : all) {
            double v = c.apply(d, l, lr, false);
            if (best == null || v < bestV) { best = c; bestV = v; }
        }
        return new Pick(bestV, best);
    }

    private static Least least(CalcContext ctx, LoadBook book, Support.Overhang s, BeamLoads live,
                               BendingActions.Effect e, boolean floor) {
        List<BeamLoads> ps = BendingActions.patterns(s, live);
        Least best = new Least(0, "no live load");
        for (int i = 0; i < ps.size(); i++) {
            double v = BendingActions.value(MemberCalculation.solve(s, ps.get(i), Double.NaN), e, s);
            if (v < best.value) best = new Least(v, BendingActions.PATTERNS[i]);
        }
        // the floor's concentrated load against L, the roof's (300 lb for maintenance workers, Table 4.3-1) against Lr
        Occupancy o = ConcentratedCheck.largest(ctx, floor ? book.floorAreas.keySet() : book.roofAreas.keySet());
        if (o == null) return best;
        // 4.4: the concentrated load instead of the uniform load; a reaction is linear in its position, so its
        // least is at one end of the load's travel
        double p = o.concentrated(ctx.system()), patch = Math.min(o.contactSide(ctx.system()), s.length());
        ConcentratedCheck.Effect ce = e == BendingActions.Effect.RA ? ConcentratedCheck.Effect.LEFT_REACTION
                : ConcentratedCheck.Effect.RIGHT_REACTION;
        for (double x : new double[] {patch / 2, s.length() - patch / 2}) {
            double v = ConcentratedCheck.value(s, p, patch, x, ce);
            if (v < best.value) best = new Least(v, (floor ? "the concentrated load of " : "the roof concentrated load of ") + o.name()
                    + " at the overhang tip");
        }
        return best;
    }

    private static void liveStep(RecordBuilder rec, String symbol, String key, String c, String what, Least l, Clause clause) {
        rec.step(symbol, what, "least of the live load patterns and none", l.placement, l.value, Quantity.FORCE, clause);
        rec.result(ResultKey.of(c, key), what, l.value, Quantity.FORCE);
    }

    private static void uplift(RecordBuilder rec, End end, Pick u, Pick a, Clause clause) {
        rec.caution("Uplift at support " + end.name + " (" + end.where + "): least reaction "
                + rec.show(u.value, Quantity.FORCE) + " factored (" + u.c.name() + "), " + rec.show(a.value, Quantity.FORCE)
                + " service (" + a.c.name() + "). Hold the beam down at support " + end.name + " and check the supporting "
                + "member (girder, column or wall) for this uplift: the framing hands down gravity end shares only, and "
                + "the column take-down carries gravity maxima only.", clause);
    }

    private static Clause clause(Edition ed, Combination c) {
        return c == FIRM_NINETY_DEAD ? Clause.NONE : ed.clause(c.clauseKey());
    }

    /** The combination with only the cases the member carries: "1.2D + 1.6L". */
    static String brief(Combination c, boolean hasL, boolean hasLr) {
        StringBuilder b = new StringBuilder(factor(c.d())).append("D");
        if (hasL && c.l() != 0) b.append(" + ").append(factor(c.l())).append("L");
        if (hasLr && c.lr() != 0) b.append(" + ").append(factor(c.lr())).append("Lr");
        return b.toString();
    }

    private static String factor(double f) { return f == 1 ? "" : Display.plain(f); }

    private static String substituted(RecordBuilder rec, Combination c, double d, double l, double lr, boolean hasL, boolean hasLr) {
        if (!rec.writesText()) return "";
        StringBuilder b = new StringBuilder(term(rec, c.d(), d));
        if (hasL && c.l() != 0) b.append(" + ").append(term(rec, c.l(), l));
        if (hasLr && c.lr() != 0) b.append(" + ").append(term(rec, c.lr(), lr));
        return b.toString();
    }

    private static String term(RecordBuilder rec, double factor, double v) {
        String n = rec.num(v, Quantity.FORCE);
        String shown = v < 0 ? "(" + n + ")" : n;
        return factor == 1 ? shown : Display.plain(factor) + " × " + shown;
    }
}
