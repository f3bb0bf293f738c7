package com.baysheet.engine.member;

import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.reduction.CalcContext;
import com.baysheet.engine.units.Quantity;

/** The inputs block of a member record: geometry, occupancies with L0 and area, options, edition. */
final class Inputs {
    private Inputs() {}

    static void record(CalcContext ctx, MemberInput in, LoadBook book, RecordBuilder rec) {
        rec.inputText("edition", "Code edition", ctx.edition().id());
        rec.inputText("kind", "Member", in.kind().title());
        rec.input("K_LL", "Live load element factor K_LL", ctx.edition().kll(in.kind()), Quantity.RATIO);
        Support s = in.support();
        if (s instanceof Support.Simple sp) {
            rec.inputText("support", "Support", "simple span");
            rec.input("span", "Span ℓ", sp.span(), Quantity.LENGTH);
        } else if (s instanceof Support.Overhang o) {
            rec.inputText("support", "Support", "overhanging one support");
            rec.input("span", "Back span ℓ", o.span(), Quantity.LENGTH);
            rec.input("overhang", "Overhang a", o.overhang(), Quantity.LENGTH);
        } else if (s instanceof Support.Cantilever c) {
            rec.inputText("support", "Support", "cantilever, fixed at the left end");
            rec.input("span", "Length ℓ", c.length(), Quantity.LENGTH);
        } else {
            rec.inputText("support", "Support", "axial");
        }
        rec.input("floors", "Floors supported", in.floorsSupported(), Quantity.RATIO);
        book.floorAreas.forEach((id, a) -> occupancy(ctx, ctx.catalogue().get(id), a, rec));
        book.roofAreas.forEach((id, a) -> occupancy(ctx, ctx.catalogue().get(id), a, rec));
        if (in.selfWeight() > 0) rec.input("selfWeight", "Member self weight", in.selfWeight(), Quantity.LINE_LOAD);
        if (!Double.isNaN(in.roofSlope())) rec.input("roofSlope", "Roof slope", in.roofSlope(), Quantity.SLOPE);
        if (!Double.isNaN(in.stiffness())) rec.input("EI", "Stiffness EI", in.stiffness(), Quantity.STIFFNESS);
        rec.inputText("partitions", "Partition allowance", !ctx.options().partitionAllowance() ? "not included"
                : ctx.options().reducePartitions() ? "included, reduced with the live load" : "included, not reduced");
    }

    private static void occupancy(CalcContext ctx, Occupancy o, double area, RecordBuilder rec) {
        rec.inputText("occupancy[" + o.id() + "]", "Occupancy", o.name() + " (" + ctx.edition().clause("loads.table").label()
                + (o.confidence().equals("firm") ? ", firm's own row" : "") + ")");
        rec.input("L0[" + o.id() + "]", "Unreduced live load L0, " + o.name(), o.uniform(ctx.system()), Quantity.PRESSURE);
        rec.input("A[" + o.id() + "]", "Tributary area, " + o.name(), area, Quantity.AREA);
        if (o.concentrated(ctx.system()) > 0)
            rec.input("P[" + o.id() + "]", "Concentrated load, " + o.name(), o.concentrated(ctx.system()), Quantity.FORCE);
    }
}
