package com.baysheet.sheet;

import com.baysheet.engine.member.MethodComparison;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.ReductionMethods;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * A level's members under every floor reduction method the project could choose, as printed tables for a package:
 * only where the project chose a method other than its edition's own (a project on its edition's reduction keeps
 * its package as it was; the page and the CSV show the comparison for every project).
 */
final class MethodTables {
    private MethodTables() {}

    static List<TakeDownTable> of(Derived d, List<String> levels) {
        CalcContext ctx = d.building().context();
        if (ctx.floorMethod() == null) return List.of();
        List<TakeDownTable> out = new ArrayList<>();
        for (String level : levels) {
            TakeDownTable t = level(ctx, d.onLevel(level), level);
            if (t != null) out.add(t);
        }
        return out;
    }

    private static TakeDownTable level(CalcContext ctx, List<DerivedMember> members, String level) {
        UnitSystem sys = ctx.system();
        String f = Quantity.FORCE.unit(sys).symbol();
        List<String> head = null;
        List<List<String>> rows = new ArrayList<>();
        for (DerivedMember m : members) {
            List<MethodComparison.Row> methods = m.result().methods();
            if (methods.isEmpty()) continue;
            if (head == null) {
                head = new ArrayList<>(List.of("Member", "Role", "L0 (" + f + ")"));
                for (MethodComparison.Row r : methods) {
                    head.add("f, " + r.title() + (r.own() ? " (project's)" : ""));
                    head.add("L (" + f + ")");
                }
            }
            List<String> row = new ArrayList<>(List.of(m.name(), m.role().name().toLowerCase().replace('_', ' '), n(methods.get(0).unreduced(), sys)));
            for (MethodComparison.Row r : methods) {
                row.add(Display.sig3(r.factor()));
                row.add(n(r.reduced(), sys));
            }
            rows.add(row);
        }
        if (head == null) return null;
        Set<String> clauses = new LinkedHashSet<>();
        for (CalcContext c : ReductionMethods.applicable(ctx).values()) clauses.add(ReductionMethods.of(c).clause(c).label());
        List<Note> notes = List.of(
                new Note(Note.Level.INFO, "The same loads and areas reduced by each method the project could choose; f is the factor the "
                        + "reducible loads take together. Only the reduction differs: each member's sheet, its actions and its load "
                        + "combinations are those of the project's own method and " + ctx.edition().id() + ".", Clause.NONE),
                new Note(Note.Level.CAUTION, "Results must be checked by a licensed engineer; the adopted local code and its amendments govern.", Clause.NONE));
        return new TakeDownTable("Floor live load reduction methods compared, " + level, head, rows, List.copyOf(clauses), notes);
    }

    private static String n(double base, UnitSystem sys) { return Display.sig3(Quantity.FORCE.unit(sys).fromBase(base)); }
}
