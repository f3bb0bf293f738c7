package com.baysheet.framing;

import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.reduction.CalcContext;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;

import java.util.List;

/** Writes a take-down's record: its per-level rows as steps, each with its clause, from the column records. */
final class TakeDownRecord {
    private TakeDownRecord() {}

    static CalcRecord write(CalcContext ctx, String title, List<TakeDown.Row> rows, List<MemberResult> columns) {
        var ed = ctx.edition();
        RecordBuilder rec = new RecordBuilder(title, ed.id(), ctx.system());
        for (int k = 0; k < rows.size(); k++) {
            TakeDown.Row w = rows.get(k);
            CalcRecord r = columns.get(k).record();
            String at = "@" + w.level(), lv = w.level() + ": ";
            rec.step("ΣA_T" + at, lv + "floor area supported (" + w.floorsSupported() + " floor" + (w.floorsSupported() == 1 ? "" : "s") + ")",
                    "ΣA_T", "level adds " + rec.show(w.areaAtLevel(), Quantity.AREA), w.cumulativeArea(), Quantity.AREA, ed.clause("reduction.multifloor"));
            rec.step("K_LL·ΣA_T" + at, lv + "influence area", "K_LL × ΣA_T",
                    Display.sig3(w.kll()) + " × " + rec.num(w.cumulativeArea(), Quantity.AREA), w.influenceArea(), Quantity.AREA, ed.clause("reduction.kll"));
            rec.step("f" + at, lv + "reduction factor on ordinary floor live load", "f = max(0.25 + 15/√(K_LL·ΣA_T), limit)",
                    "see the column record " + w.member(), w.factor(), Quantity.RATIO, ed.clause("reduction.eq"));
            rec.step("P_D" + at, lv + "dead load", "Σ D", "level adds " + rec.show(w.deadAtLevel(), Quantity.FORCE), w.dead(), Quantity.FORCE,
                    Clause.NONE);
            rec.step("P_L" + at, lv + "floor live load, reduced (unreduced " + rec.show(w.liveUnreduced(), Quantity.FORCE) + ")", "Σ f_i L0 A_i",
                    "see the column record " + w.member(), w.liveReduced(), Quantity.FORCE, ed.clause("reduction.eq"));
            if (w.roofLive() > 0)
                rec.step("P_Lr" + at, lv + "roof live load", "Σ Lr A_i", "see the column record " + w.member(), w.roofLive(), Quantity.FORCE,
                        ed.clause("roof.reduction"));
            rec.step("P_u" + at, lv + "factored axial load", r.step("P_u").formula(), r.step("P_u").substituted(), w.lrfd(), Quantity.FORCE,
                    ed.clause("combo.lrfd"));
            rec.step("P_a" + at, lv + "service axial load", r.step("P_a").formula(), r.step("P_a").substituted(), w.asd(), Quantity.FORCE,
                    ed.clause("combo.asd"));
        }
        TakeDown.Row base = rows.get(rows.size() - 1);
        rec.result("D.P", "Dead load at the base", base.dead(), Quantity.FORCE)
           .result("L.P", "Floor live load at the base, reduced", base.liveReduced(), Quantity.FORCE)
           .result("Lr.P", "Roof live load at the base", base.roofLive(), Quantity.FORCE)
           .result("LRFD.P", "Factored axial load at the base (" + base.lrfdCombination() + ")", base.lrfd(), Quantity.FORCE)
           .result("ASD.P", "Service axial load at the base (" + base.asdCombination() + ")", base.asd(), Quantity.FORCE)
           .governs("LRFD.P").governs("ASD.P");
        rec.info("Each level's column carries everything at and above it; its reduction uses its own tributary area summed over "
                + "the floors it supports, never the reduced reactions of the members it carries (common practice).", ed.clause("reduction.multifloor"));
        rec.info("f is the factor of Eq. 4.7-1 with its limit, as it applies to ordinary floor live load; heavy loads and "
                + "garages (reduced by at most 20 %) and assembly uses (not reduced) follow their own rules in each column's "
                + "record, so L reduced / L unreduced can differ from f.", ed.clause("reduction.eq"));
        rec.caution("Results must be checked by a licensed engineer; the adopted local code and its amendments govern.", Clause.NONE);
        return rec.build();
    }
}
