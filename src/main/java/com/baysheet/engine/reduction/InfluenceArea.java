package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;

import java.util.List;
import java.util.function.Predicate;

/**
 * The influence area K_LL·A_T that the threshold and Eq. 4.7-1 (ASCE 7-16 4.7.2) take. One K_LL: K_LL × A_T.
 * A column over floors where its place differs (a cantilever slab on some floors only): Σ K_LL,i A_T,i over
 * the floors, each floor with its own K_LL (common practice, from memory: Commentary C4.7 defines the influence
 * area as K_LL A_T, and a column's as the sum over the floors it supports). Mixed occupancy: the reducible area
 * of each floor only.
 */
final class InfluenceArea {
    private InfluenceArea() {}

    /** The K_LL step of each floor; returns the member's own K_LL. */
    static double floorFactors(CalcContext ctx, MemberKind member, List<SupportedFloor> floors, RecordBuilder rec) {
        Edition ed = ctx.edition();
        for (SupportedFloor f : floors)
            rec.step("K_LL[" + f.name() + "]", "Live load element factor at " + f.name() + ", " + f.kind().title().toLowerCase(), "K_LL,i",
                    "Table value", ed.kll(f.kind()), Quantity.RATIO, ed.clause("reduction.kll"));
        return ed.kll(member);
    }

    static double single(CalcContext ctx, double kll, double reducible, double total, RecordBuilder rec) {
        String area = reducible < total ? "A_T,r" : "A_T";
        boolean text = rec.writesText();
        return rec.step("K_LL·A_T", "Influence area", text ? "K_LL × " + area : "",
                text ? rec.fmt(kll) + " × " + rec.num(reducible, Quantity.AREA) : "", kll * reducible, Quantity.AREA,
                ctx.edition().clause("reduction.basic"));
    }

    /**
     * Σ K_LL,i × (reducible A_T,i), written out floor by floor.
     *
     * @param reducible whether an occupancy's load may be reduced on this member
     * @param mixed     some of the floor area is not reducible, so the sum takes the reducible area of each floor
     */
    static double perFloor(CalcContext ctx, List<SupportedFloor> floors, Predicate<Occupancy> reducible, boolean mixed,
                           RecordBuilder rec) {
        Edition ed = ctx.edition();
        double sum = 0;
        StringBuilder terms = new StringBuilder();
        for (SupportedFloor f : floors) {
            double a = 0;
            for (AreaShare s : f.areas()) if (reducible.test(ctx.catalogue().get(s.occupancy()))) a += s.area();
            if (a == 0) continue;
            double k = ed.kll(f.kind());
            sum += k * a;
            if (terms.length() > 0) terms.append(" + ");
            terms.append(rec.fmt(k)).append(" × ").append(rec.num(a, Quantity.AREA));
        }
        String area = mixed ? "A_T,r,i" : "A_T,i";
        rec.info("The influence area of a column over several floors is the sum of each floor's K_LL × " + (mixed ? "reducible " : "")
                + "A_T, each floor with its own K_LL from the column's place on that floor (common practice); the sum "
                + "decides both the threshold and the factor.", ed.clause("reduction.multifloor"));
        return rec.step("K_LL·A_T", "Influence area, floor by floor", "Σ K_LL,i × " + area, terms.toString(), sum, Quantity.AREA,
                ed.clause("reduction.basic"));
    }
}
