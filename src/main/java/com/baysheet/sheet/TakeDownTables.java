package com.baysheet.sheet;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Step;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derived;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.TakeDown;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/** A column take-down's rows as printed: units in the headings, each value at three significant figures. */
final class TakeDownTables {
    private TakeDownTables() {}

    static TakeDownTable of(Derived d, TakeDown t) { return of(d, t, MemberLabels.PLACES); }

    /** With each level's column labelled as given (its mark beside its place). */
    static TakeDownTable of(Derived d, TakeDown t, MemberLabels labels) {
        UnitSystem sys = d.building().context().system();
        String a = Quantity.AREA.unit(sys).symbol(), f = Quantity.FORCE.unit(sys).symbol();
        List<String> head = List.of("Level", "Column", "Area at this level (" + a + ")", "A_T supported, cumulative (" + a + ")",
                "Reducible A_T, cumulative (" + a + ")", "K_LL at this level", "Influence area Σ K_LL,i A_T,r,i (" + a + ")",
                "Floors", "f", "D at level (" + f + ")", "Column self weight (" + f + ")", "ΣD (" + f + ")", "L0 (" + f + ")", "L (" + f + ")", "Lr (" + f + ")", "S (" + f + ")",
                "LRFD (" + f + ")", "ASD (" + f + ")");
        List<List<String>> rows = new ArrayList<>();
        // under a chosen floor method K_LL and the influence area give no factor: left blank
        boolean basic = d.building().context().floorMethod() == null;
        for (TakeDown.Row r : t.rows()) {
            // the column by its label, or by its grid point where the member is gone: never its internal id
            String column = d.member(r.member()).map(labels::placed).orElse("Column " + t.gridPoint());
            rows.add(List.of(r.level(), column, n(r.areaAtLevel(), Quantity.AREA, sys), n(r.cumulativeArea(), Quantity.AREA, sys),
                    n(r.reducibleArea(), Quantity.AREA, sys), basic ? Display.sig3(r.kll()) : "—", basic ? n(r.influenceArea(), Quantity.AREA, sys) : "—", Integer.toString(r.floorsSupported()),
                    Display.sig3(r.factor()), n(r.deadAtLevel(), Quantity.FORCE, sys),
                    n(r.selfWeightAtLevel(), Quantity.FORCE, sys), n(r.dead(), Quantity.FORCE, sys),
                    n(r.liveUnreduced(), Quantity.FORCE, sys), n(r.liveReduced(), Quantity.FORCE, sys), n(r.roofLive(), Quantity.FORCE, sys), n(r.snow(), Quantity.FORCE, sys),
                    n(r.lrfd(), Quantity.FORCE, sys) + "\n" + r.lrfdCombination(), n(r.asd(), Quantity.FORCE, sys) + "\n" + r.asdCombination()));
        }
        CalcRecord rec = t.record();
        Set<String> clauses = new LinkedHashSet<>();
        for (Step s : rec.steps())
            if (s.clause() != null && !s.clause().isNone()) clauses.add(s.clause().label() + (StepTable.unconfirmed(s.clause()) ? " " + StepTable.UNCONFIRMED : ""));
        return new TakeDownTable("Column take-down at grid " + t.gridPoint(), head, rows, List.copyOf(clauses), rec.notes());
    }

    private static String n(double base, Quantity q, UnitSystem sys) { return Display.sig3(q.unit(sys).fromBase(base)); }
}
