package com.baysheet.engine.member;

import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.record.ResultKey;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;

/** Axial load on a column: dead, live unreduced and reduced, roof live, concentrated check, combinations. */
final class AxialActions {
    /** The keys of the axial results, made once (every column of a building writes them). */
    private static final ResultKey P_D = ResultKey.axial("D"), P_L0 = ResultKey.axial("L0"), P_L = ResultKey.axial("L"),
            P_LC = ResultKey.axial("Lc"), P_LDES = ResultKey.axial("Ldes"), P_LR0 = ResultKey.axial("Lr0"), P_LR = ResultKey.axial("Lr"),
            P_LRFD = ResultKey.axial("LRFD"), P_ASD = ResultKey.axial("ASD"), P_S = ResultKey.axial("S"), P_LRC = ResultKey.axial("Lrc"),
            P_LRDES = ResultKey.axial("Lrdes");

    private AxialActions() {}

    static void record(CalcContext ctx, MemberInput in, LoadBook book, BeamLoads floor0, BeamLoads floor,
                       BeamLoads roof0, BeamLoads roof, boolean halfL, boolean snow, RecordBuilder rec) {
        var ed = ctx.edition();
        double d = rec.step("P_D", "Axial dead load", "P_D = Σ D", "sum of dead loads", book.dead.total(), Quantity.FORCE, com.baysheet.engine.record.Clause.NONE);
        double l0 = floor0.total(), l = floor.total();
        if (l0 > 0) {
            rec.step("P_L0", "Axial floor live load, unreduced", "P_L0 = Σ L0 A_i", "sum over sources", l0, Quantity.FORCE, ed.clause("loads.table"));
            rec.step("P_L", "Axial floor live load, reduced", "P_L = Σ f_i L0 A_i", "sum over sources", l, Quantity.FORCE,
                    com.baysheet.engine.reduction.ReductionMethods.of(ctx).clause(ctx));
        }
        double lr = roof.total();
        if (roof0.total() > 0) {
            rec.step("P_Lr", "Axial roof live load", "P_Lr = Σ Lr A_i", "sum over roof sources", lr, Quantity.FORCE, ed.clause("roof.reduction"));
        }
        double lc = concentrated(ctx, book);
        double ldes = l;
        if (lc > 0 && l0 > 0) {
            rec.step("P_c", "Concentrated live load, not reduced", "P_c", rec.show(lc, Quantity.FORCE), lc, Quantity.FORCE, ed.clause("concentrated"));
            if (lc > l) {
                ldes = lc;
                rec.info("The concentrated load governs the axial live load (used alone, never added to the uniform load).", ed.clause("concentrated"));
            } else {
                rec.info("The reduced uniform live load governs the axial live load; the concentrated load is not added.", ed.clause("concentrated"));
            }
        }
        double lrdes = roofConcentrated(ctx, book, roof0.total(), lr, rec);
        double s = snow ? rec.step("P_S", "Axial snow load, not reduced", "P_S = Σ S", "sum of the roofs' snow loads carried",
                book.snow.total(), Quantity.FORCE, ed.clause("snow.sloped")) : Double.NaN;
        var axial = new LoadCombinations.Unfactored("axial load", d, ldes, lrdes, s, halfL, Quantity.FORCE, ed.clause("combo.lrfd"), ed.clause("combo.asd"));
        var lrfd = LoadCombinations.govern(true, "P_u", axial, rec);
        var asd = LoadCombinations.govern(false, "P_a", axial, rec);
        if (halfL && lrfd.combination().halfL()) rec.info("0.5 L used in " + lrfd.combination().name() + ".", ed.clause("combo.halfL"));

        rec.result(P_D, "Dead load P_D", d, Quantity.FORCE)
           .result(P_L0, "Live load, unreduced", l0, Quantity.FORCE)
           .result(P_L, "Live load, reduced", l, Quantity.FORCE)
           .result(P_LC, "Concentrated live load", lc, Quantity.FORCE)
           .result(P_LDES, "Design live load", ldes, Quantity.FORCE)
           .result(P_LR0, "Roof live load, unreduced", roof0.total(), Quantity.FORCE)
           .result(P_LR, "Roof live load Lr", lr, Quantity.FORCE)
           .result(P_LRFD, "Factored axial load P_u (" + lrfd.label() + ")", lrfd.value(), Quantity.FORCE)
           .result(P_ASD, "Service axial load P_a (" + asd.label() + ")", asd.value(), Quantity.FORCE)
           .governs(P_LRFD).governs(P_ASD);
        if (snow) rec.result(P_S, "Snow load S, not reduced", s, Quantity.FORCE);
    }

    /**
     * ASCE 7-16 4.4 with the roof rows' concentrated load (Table 4.3-1, roofs subject to maintenance workers):
     * the design roof live load is the larger of Lr and that load, never their sum. Returns the design roof live load.
     */
    private static double roofConcentrated(CalcContext ctx, LoadBook book, double lr0, double lr, RecordBuilder rec) {
        Occupancy o = ConcentratedCheck.largest(ctx, book.roofAreas.keySet());
        if (o == null || lr0 <= 0) return lr;
        var ed = ctx.edition();
        double p = rec.step("P_c,r", "Concentrated roof live load, " + o.name() + ", not reduced", "P_c,r",
                rec.show(o.concentrated(ctx.system()), Quantity.FORCE), o.concentrated(ctx.system()), Quantity.FORCE, ed.clause("concentrated"));
        rec.info(p > lr ? "The concentrated roof load governs the axial roof live load (used alone, never added to the uniform roof load)."
                : "The uniform roof live load governs the axial roof live load; the concentrated roof load is not added.", ed.clause("concentrated"));
        double design = Math.max(p, lr);
        rec.result(P_LRC, "Concentrated roof live load", p, Quantity.FORCE)
           .result(P_LRDES, "Design roof live load", design, Quantity.FORCE);
        return design;
    }

    /** The largest concentrated load of the floor occupancies carried. */
    static double concentrated(CalcContext ctx, LoadBook book) {
        double p = 0;
        for (String id : book.floorAreas.keySet()) {
            Occupancy o = ctx.catalogue().get(id);
            p = Math.max(p, o.concentrated(ctx.system()));
        }
        return p;
    }
}
