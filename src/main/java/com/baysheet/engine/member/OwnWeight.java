package com.baysheet.engine.member;

import com.baysheet.engine.load.LineLoad;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;

/**
 * The record's lines for loads that are not floor area: the member's self weight with its source (always
 * printed where a source is stated, 0 included, so a sheet never leaves it silent) and each line load.
 */
final class OwnWeight {
    private OwnWeight() {}

    static void record(CalcContext ctx, MemberInput in, RecordBuilder rec) {
        if (!in.selfWeightSource().isEmpty()) selfWeight(in, rec);
        for (int i = 0; i < in.lineLoads().size(); i++) {
            LineLoad l = in.lineLoads().get(i);
            String live = l.live() > 0 ? ", live " + rec.show(l.live(), Quantity.LINE_LOAD) + " ("
                    + ctx.catalogue().get(l.liveOccupancy()).name() + ", not reduced)" : "";
            rec.inputText("lineLoad[" + i + "]", "Line load " + (i + 1), l.label() + ": dead " + rec.show(l.dead(), Quantity.LINE_LOAD)
                    + live + " from x = " + rec.show(l.from(), Quantity.LENGTH) + " to " + rec.show(l.to(), Quantity.LENGTH));
            rec.step("w_D,line" + (i + 1), "Line load " + (i + 1) + ", " + l.label() + ": dead load along the member", "w given",
                    "over " + rec.show(l.length(), Quantity.LENGTH) + ": " + rec.show(l.dead() * l.length(), Quantity.FORCE),
                    l.dead(), Quantity.LINE_LOAD, Clause.NONE);
            if (l.live() > 0)
                rec.step("w_L,line" + (i + 1), "Line load " + (i + 1) + ", " + l.label() + ": live load along the member, unreduced",
                        "w given", "over " + rec.show(l.length(), Quantity.LENGTH) + ": " + rec.show(l.live() * l.length(), Quantity.FORCE),
                        l.live(), Quantity.LINE_LOAD, Clause.NONE);
            if (l.partitionWall() && ctx.options().partitionAllowance())
                rec.caution(l.label() + ": a partition wall given as a line load while the project also takes the partition "
                        + "allowance on the floor area; the partitions may be counted twice.", Clause.NONE);
        }
        for (int i = 0; i < in.pointLoads().size(); i++) {
            var p = in.pointLoads().get(i);
            if (!p.applied()) continue;
            rec.step("P_D,point" + (i + 1), "Point load " + (i + 1) + ", " + p.label() + ": dead load", "P given",
                    "at x = " + rec.show(p.x(), Quantity.LENGTH), p.dead(), Quantity.FORCE, Clause.NONE);
            if (p.liveTotal() > 0)
                rec.step("P_L,point" + (i + 1), "Point load " + (i + 1) + ", " + p.label() + ": live load, unreduced", "P given",
                        "at x = " + rec.show(p.x(), Quantity.LENGTH), p.liveTotal(), Quantity.FORCE, Clause.NONE);
        }
        if (!rec.writesText()) return; // the notes below are for reading
        if (in.pointLoads().stream().anyMatch(p -> p.applied() && p.liveTotal() > 0))
            rec.info("A point load has no tributary area: its live load is not reduced and adds to no A_T (our choice).", Clause.NONE);
        if (in.lineLoads().stream().anyMatch(l -> l.live() > 0))
            rec.info("A line load has no tributary area: its live load is not reduced and adds to no A_T (our choice).", Clause.NONE);
    }

    private static void selfWeight(MemberInput in, RecordBuilder rec) {
        String src = in.selfWeightSource();
        if (in.kind().isColumn()) {
            double p = in.selfWeight() * in.columnHeight();
            rec.step("P_sw", "Self weight of the column below this level (" + src + ")", "P_sw = w_sw × h",
                    rec.show(in.selfWeight(), Quantity.LINE_LOAD) + " × " + rec.show(in.columnHeight(), Quantity.LENGTH), p,
                    Quantity.FORCE, Clause.NONE);
        } else {
            rec.step("w_sw", "Self weight (" + src + ")", "w_sw given", "dead load along the whole member", in.selfWeight(),
                    Quantity.LINE_LOAD, Clause.NONE);
        }
        if (in.selfWeight() == 0)
            rec.caution("Self weight not included (0): " + src + ". Include it in the dead load some other way, or set it.", Clause.NONE);
    }
}
