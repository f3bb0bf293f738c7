package com.baysheet.engine.member;

import com.baysheet.engine.code.BalconyRule;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

/**
 * The note on every member that carries balcony or deck area: how its L0 follows from the area served
 * (the factor and cap of {@link BalconyRule}), and the choices made on it. The clause label is the
 * edition's load table (ASCE 7-16 Table 4.3-1).
 */
final class BalconyNote {
    private BalconyNote() {}

    static void record(CalcContext ctx, LoadBook book, RecordBuilder rec) {
        for (String id : book.floorAreas.keySet()) {
            Occupancy o = ctx.catalogue().get(id);
            if (o.isBalcony()) rec.info(text(ctx, o, rec), ctx.edition().clause("loads.table"));
        }
    }

    private static String text(CalcContext ctx, Occupancy o, RecordBuilder rec) {
        BalconyRule rule = ctx.catalogue().balconyRule();
        Occupancy served = ctx.catalogue().get(o.serves());
        double l0 = served.uniform(ctx.system());
        double cap = ctx.system() == UnitSystem.US ? rule.capPsf() : rule.capKPa();
        return o.name() + ": L0 = " + rec.plain(rule.factor()) + " × " + rec.show(l0, Quantity.PRESSURE)
                + " of the area served, need not exceed " + rec.show(cap, Quantity.PRESSURE)
                + ", not taken below the area served (conservative choice): " + rec.show(o.uniform(ctx.system()), Quantity.PRESSURE)
                + " [factor and cap: " + rule.confidence() + "]. Concentrated load of the area served; no partition allowance;"
                + " not reduced (conservative choice: whether the code permits reducing balcony loads is not confirmed).";
    }
}
