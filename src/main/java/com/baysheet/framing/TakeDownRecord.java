package com.baysheet.framing;

import com.baysheet.engine.Tolerances;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.member.OpenToSky;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.record.ResultKey;
import com.baysheet.engine.record.Step;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.ReductionMethods;
import com.baysheet.engine.units.Quantity;

import java.util.List;

/**
 * Writes a take-down's record: its per-level rows as steps, each with its clause, from the column records.
 * Every number comes from a row or a column's record; the influence area printed is the one that gave f.
 */
final class TakeDownRecord {
    private TakeDownRecord() {}

    /** Relative difference below which the reducible area is taken as the whole A_T (nothing to print apart). */
    private static final double SAME_AREA = 1e-9;

    /** @param point the grid point of the stack ("B/2"): the text refers a reader to each level's column by it, never by id */
    static CalcRecord write(CalcContext ctx, String point, List<TakeDown.Row> rows, List<MemberResult> columns, List<String> openToSky) {
        String title = "Column " + point + " take-down";
        var ed = ctx.edition();
        RecordBuilder rec = new RecordBuilder(title, ed.id(), ctx.system());
        double above = 0;
        for (int k = 0; k < rows.size(); k++) {
            TakeDown.Row w = rows.get(k);
            CalcRecord r = columns.get(k).record();
            String at = "@" + w.level(), lv = w.level() + ": ", see = see(point, w);
            areas(rec, ctx, w, above, k == 0, lv, at, see);
            above = w.cumulativeArea();
            if (ctx.floorMethod() == null) basicFactor(ctx, rec, r, w, lv, at);
            else rec.step("f" + at, lv + "factor the reducible floor live loads take together, " + ReductionMethods.of(ctx).title(ctx),
                    "f = Σ f_i L0 A_i / Σ L0 A_i", "see the column record " + w.member(), w.factor(), Quantity.RATIO, ReductionMethods.of(ctx).clause(ctx));
            rec.step("P_sw" + at, lv + "self weight of the column below this level", "P_sw = w_sw × h",
                    see, w.selfWeightAtLevel(), Quantity.FORCE, Clause.NONE);
            rec.step("P_D" + at, lv + "dead load", "Σ D", "level adds " + rec.show(w.deadAtLevel(), Quantity.FORCE) + ", column self weight included", w.dead(), Quantity.FORCE,
                    Clause.NONE);
            rec.step("P_L" + at, lv + "floor live load, reduced (unreduced " + rec.show(w.liveUnreduced(), Quantity.FORCE) + ")", "Σ f_i L0 A_i",
                    see, w.liveReduced(), Quantity.FORCE, ReductionMethods.of(ctx).clause(ctx));
            if (w.roofLive() > 0)
                rec.step("P_Lr" + at, lv + "roof live load", "Σ Lr A_i", see, w.roofLive(), Quantity.FORCE,
                        ed.clause("roof.reduction"));
            if (w.snow() > 0)
                rec.step("P_S" + at, lv + "snow load, not reduced" + (k > 0 && w.snow() > rows.get(k - 1).snow() ? " (this roof adds "
                        + rec.show(w.snow() - rows.get(k - 1).snow(), Quantity.FORCE) + ")" : ""), "Σ S",
                        see, w.snow(), Quantity.FORCE, ed.clause("snow.sloped"));
            rec.step("P_u" + at, lv + "factored axial load", r.step("P_u").formula(), r.step("P_u").substituted(), w.lrfd(), Quantity.FORCE,
                    ed.clause("combo.lrfd"));
            rec.step("P_a" + at, lv + "service axial load", r.step("P_a").formula(), r.step("P_a").substituted(), w.asd(), Quantity.FORCE,
                    ed.clause("combo.asd"));
        }
        TakeDown.Row base = rows.get(rows.size() - 1);
        rec.result(ResultKey.axial("D"), "Dead load at the base", base.dead(), Quantity.FORCE)
           .result(ResultKey.axial("L"), "Floor live load at the base, reduced", base.liveReduced(), Quantity.FORCE)
           .result(ResultKey.axial("Lr"), "Roof live load at the base", base.roofLive(), Quantity.FORCE)
           .result(ResultKey.axial("S"), "Snow load at the base, not reduced", base.snow(), Quantity.FORCE)
           .result(ResultKey.axial("LRFD"), "Factored axial load at the base (" + base.lrfdCombination() + ")", base.lrfd(), Quantity.FORCE)
           .result(ResultKey.axial("ASD"), "Service axial load at the base (" + base.asdCombination() + ")", base.asd(), Quantity.FORCE)
           .governs(ResultKey.axial("LRFD")).governs(ResultKey.axial("ASD"));
        OpenToSky.caution(ctx, openToSky, true, rec);
        notes(rec, ctx);
        return rec.build();
    }

    /** K_LL, the influence area and f of the edition's own reduction (Eq. 4.7-1), as the column's record works them out. */
    private static void basicFactor(CalcContext ctx, RecordBuilder rec, CalcRecord r, TakeDown.Row w, String lv, String at) {
        var ed = ctx.edition();
        rec.step("K_LL" + at, lv + "live load element factor of the column's place at this level", "K_LL", "Table value",
                w.kll(), Quantity.RATIO, ed.clause("reduction.kll"));
        Step kat = find(r, "K_LL·A_T");
        rec.step("K_LL·ΣA_T" + at, lv + "influence area that gives f" + (reducedInPart(w) ? ", from the reducible area of each floor" : ""),
                kat == null ? "Σ K_LL,i × A_T,r,i" : kat.formula(), kat == null ? "no reducible floor area" : kat.substituted(),
                w.influenceArea(), Quantity.AREA, ed.clause("reduction.basic"));
        rec.step("f" + at, lv + "reduction factor on ordinary floor live load", formula(ctx, rec),
                factorWorking(ctx, rec, r, w), w.factor(), Quantity.RATIO, ed.clause("reduction.eq"));
    }

    /** A_T supported (cumulative) with what this level adds, and the reducible part where it differs. */
    private static void areas(RecordBuilder rec, CalcContext ctx, TakeDown.Row w, double above, boolean top, String lv, String at, String see) {
        var ed = ctx.edition();
        double floorHere = w.cumulativeArea() - above, roofHere = w.areaAtLevel() - floorHere;
        String roof = roofHere > Tolerances.SAME_AREA * Math.max(1, w.areaAtLevel()) ? "; roof area at this level " + rec.show(roofHere, Quantity.AREA) + ", carried as Lr" : "";
        rec.step("ΣA_T" + at, lv + "A_T supported, cumulative (" + w.floorsSupported() + " floor" + (w.floorsSupported() == 1 ? "" : "s") + roof + ")",
                top ? "ΣA_T = floor area at this level" : "ΣA_T = ΣA_T above + floor area at this level",
                top ? rec.num(floorHere, Quantity.AREA) : rec.num(above, Quantity.AREA) + " + " + rec.num(floorHere, Quantity.AREA),
                w.cumulativeArea(), Quantity.AREA, ed.clause("reduction.multifloor"));
        if (reducedInPart(w))
            rec.step("A_T,r" + at, lv + "reducible A_T, cumulative (the floor area whose live load may be reduced)", "A_T,r ≤ ΣA_T",
                    see, w.reducibleArea(), Quantity.AREA, ed.clause("reduction.basic"));
    }

    /** Where the reader finds the working of a level's value: that level's column, by grid point and level. */
    static String see(String point, TakeDown.Row w) {
        return "see the record of column " + point + " below " + w.level();
    }

    /** Some of the A_T supported is not reducible (mixed occupancy), so f comes from the reducible part. */
    private static boolean reducedInPart(TakeDown.Row w) {
        return w.cumulativeArea() - w.reducibleArea() > Tolerances.SAME_AREA * Math.max(1, w.cumulativeArea());
    }

    /** Eq. 4.7-1 with the constant of the project's unit system, from the edition. */
    private static String formula(CalcContext ctx, RecordBuilder rec) {
        return "f = max(" + rec.plain(ctx.edition().constant("reduction.base")) + " + " + rec.plain(ctx.constant("reduction.coef"))
                + "/√(K_LL·A_T), limit)";
    }

    private static String factorWorking(CalcContext ctx, RecordBuilder rec, CalcRecord column, TakeDown.Row w) {
        Step eq = find(column, "f_eq"), f = find(column, "f");
        if (eq != null && f != null) return eq.substituted() + " = " + rec.fmt(eq.result()) + "; " + f.substituted();
        if (w.influenceArea() > 0)
            return "K_LL·A_T " + rec.show(w.influenceArea(), Quantity.AREA) + " below " + rec.show(ctx.constant("threshold"), Quantity.AREA) + ": no reduction";
        return "no reducible floor area: no reduction";
    }

    private static void notes(RecordBuilder rec, CalcContext ctx) {
        var ed = ctx.edition();
        rec.info("Each level's column carries everything at and above it; its reduction uses its own tributary area summed over "
                + "the floors it supports, never the reduced reactions of the members it carries (common practice).", ed.clause("reduction.multifloor"));
        if (ctx.floorMethod() != null) {
            rec.info("Floor live loads reduced by the project's chosen method, " + ReductionMethods.of(ctx).title(ctx) + "; f is the "
                    + "factor the reducible loads take together, each occupancy's own factor is in each column's record; loads and "
                    + "combinations stay " + ed.id() + ".", ReductionMethods.of(ctx).clause(ctx));
        } else {
            rec.info("Influence area: each floor counts with the K_LL of the column's place on that floor, K_LL·A_T = Σ K_LL,i A_T,i over "
                    + "the floors supported; with mixed occupancy only the reducible area of each floor counts, so f follows from "
                    + "Σ K_LL,i × reducible A_T,i, printed beside it (common practice).", ed.clause("reduction.multifloor"));
            rec.info("f is the reduction factor with its lower limit, as it applies to ordinary floor live load; heavy loads and "
                    + "garages (reduced by at most 20 %) and assembly uses (not reduced) follow their own rules in each column's "
                    + "record, so L reduced / L unreduced can differ from f.", ed.clause("reduction.eq"));
        }
        rec.caution("Results must be checked by a licensed engineer; the adopted local code and its amendments govern.", Clause.NONE);
    }

    private static Step find(CalcRecord r, String symbol) {
        for (Step s : r.steps()) if (s.symbol().equals(symbol)) return s;
        return null;
    }
}
