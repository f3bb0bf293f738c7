package com.baysheet.engine.member;

import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;

/** The inputs block of a member record: geometry, occupancies with L0 and area, options, edition. */
final class Inputs {
    private Inputs() {}

    static void record(CalcContext ctx, MemberInput in, LoadBook book, RecordBuilder rec) {
        if (!rec.writesText()) return; // the inputs block is for reading; a numbers-only pass skips it
        rec.inputText("edition", "Code edition", ctx.edition().id());
        rec.inputText("kind", "Member", in.kind().title());
        boolean kllVaries = SupportedFloor.kllVaries(ctx.edition(), in.kind(), in.floors());
        rec.input("K_LL", kllVaries ? "Live load element factor K_LL at this level (each floor's below)" : "Live load element factor K_LL",
                ctx.edition().kll(in.kind()), Quantity.RATIO);
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
        rec.inputText("floors", "Floors supported", Integer.toString(in.floorsSupported()));
        if (kllVaries)
            for (SupportedFloor f : in.floors())
                rec.inputText("floor[" + f.name() + "]", "Floor " + f.name(), f.kind().title() + ", K_LL " + rec.fmt(ctx.edition().kll(f.kind()))
                        + ", floor area " + rec.show(f.area(), Quantity.AREA));
        book.floorAreas.forEach((id, a) -> occupancy(ctx, ctx.catalogue().get(id), a, rec));
        book.roofAreas.forEach((id, a) -> occupancy(ctx, ctx.catalogue().get(id), a, rec));
        loads(ctx, in, rec);
        if (in.selfWeight() > 0) rec.input("selfWeight", in.kind().isColumn() ? "Column self weight per length" : "Member self weight",
                in.selfWeight(), Quantity.LINE_LOAD);
        if (in.columnHeight() > 0) rec.input("columnHeight", "Column height below this level", in.columnHeight(), Quantity.LENGTH);
        if (!Double.isNaN(in.roofSlope())) rec.input("roofSlope", "Roof slope", in.roofSlope(), Quantity.SLOPE);
        if (!Double.isNaN(in.stiffness())) rec.input("EI", "Stiffness EI", in.stiffness(), Quantity.STIFFNESS);
        rec.inputText("partitions", "Partition allowance", !ctx.options().partitionAllowance() ? "not included"
                : ctx.options().reducePartitions() ? "included, reduced with the live load" : "included, not reduced");
    }

    /** Each loaded strip, area and point load as given, so that a checker sees every load the member carries. */
    private static void loads(CalcContext ctx, MemberInput in, RecordBuilder rec) {
        for (int i = 0; i < in.strips().size(); i++) {
            AreaStrip st = in.strips().get(i);
            rec.inputText("strip[" + i + "]", "Loaded strip " + (i + 1), ctx.catalogue().get(st.occupancy()).name() + ", "
                    + rec.show(st.width(), Quantity.LENGTH) + " wide from x = " + rec.show(st.from(), Quantity.LENGTH) + " to "
                    + rec.show(st.to(), Quantity.LENGTH) + ", dead load " + rec.show(st.deadPressure(), Quantity.PRESSURE));
        }
        for (int i = 0; i < in.areas().size(); i++) {
            AreaLoad a = in.areas().get(i);
            rec.inputText("area[" + i + "]", "Loaded area " + (i + 1), ctx.catalogue().get(a.occupancy()).name() + ", "
                    + rec.show(a.area(), Quantity.AREA) + ", dead load " + rec.show(a.deadPressure(), Quantity.PRESSURE));
        }
        for (int i = 0; i < in.pointLoads().size(); i++) {
            PointLoad p = in.pointLoads().get(i);
            String where = in.kind().isColumn() ? "axial" : "at x = " + rec.show(p.x(), Quantity.LENGTH);
            if (p.applied()) {
                String occ = p.live().isEmpty() ? "" : " (" + ctx.catalogue().get(p.live().get(0).occupancy()).name() + ", not reduced)";
                rec.inputText("point[" + i + "]", "Point load " + (i + 1), p.label() + ", " + where + ": dead "
                        + rec.show(p.dead(), Quantity.FORCE) + ", live " + rec.show(p.liveTotal(), Quantity.FORCE) + occ);
                continue;
            }
            rec.inputText("point[" + i + "]", (in.kind().isColumn() ? "Load carried " : "Point load ") + (i + 1), where
                    + ": dead " + rec.show(p.dead(), Quantity.FORCE) + ", live unreduced " + rec.show(p.liveTotal(), Quantity.FORCE)
                    + " from " + rec.show(area(p), Quantity.AREA));
        }
    }

    private static double area(PointLoad p) {
        double s = 0;
        for (var a : p.areas()) s += a.area();
        return s;
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
