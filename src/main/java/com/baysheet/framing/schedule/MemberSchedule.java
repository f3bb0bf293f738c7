package com.baysheet.framing.schedule;

import com.baysheet.engine.units.Quantity;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabel;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.MemberRole;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.function.Predicate;

/**
 * The member schedule: beams and girders level by level, one row per label with the number of members that
 * carry it, the span, the total loads on the member (D, L reduced, Lr and S where any member carries them),
 * the service and factored end reactions, the factored shear and moments. Every number is read from the
 * members' records; where several members share a label the row is their envelope (the largest of each value,
 * the most negative M−), so a typical member is never shown lighter than the worst it stands for.
 * Columns are in the column load schedule.
 */
public final class MemberSchedule {
    private MemberSchedule() {}

    /** The schedule with each member labelled by {@link MemberLabel}. */
    public static LoadSchedule of(Derived d) { return of(d, m -> true, MemberLabel::of); }

    /** The members of one level. */
    public static LoadSchedule onLevel(Derived d, String level) { return of(d, m -> m.level().equals(level), MemberLabel::of); }

    /** Every member labelled as given (by its mark where the project has marks). */
    public static LoadSchedule of(Derived d, MemberLabels labels) { return of(d, m -> true, labels::of); }

    /** The members of one level labelled as given. */
    public static LoadSchedule onLevel(Derived d, String level, MemberLabels labels) {
        return of(d, m -> m.level().equals(level), labels::of);
    }

    /** The members chosen, with another labelling where typical members share a mark. */
    public static LoadSchedule of(Derived d, Predicate<DerivedMember> which, Function<DerivedMember, String> label) {
        return table(d, "members", "Member schedule", List.of("Level", "Member", "Count"),
                grouped(d, which, m -> m.level() + "\u0000" + label.apply(m)),
                g -> List.of(g.get(0).level(), label.apply(g.get(0)), Integer.toString(g.size())),
                "Where several members share a label the row shows the largest of each value among them (the most negative M_u−).");
    }

    /** The beams and girders chosen, grouped by the key given, each group in the order of its first member. */
    static Map<String, List<DerivedMember>> grouped(Derived d, Predicate<DerivedMember> which, Function<DerivedMember, String> key) {
        Map<String, List<DerivedMember>> groups = new LinkedHashMap<>();
        for (DerivedMember m : d.members())
            if (m.role() != MemberRole.COLUMN && which.test(m)) groups.computeIfAbsent(key.apply(m), k -> new ArrayList<>()).add(m);
        return groups;
    }

    /** One row per group: the text cells given for it, then the envelope over the group of every number column. */
    static LoadSchedule table(Derived d, String key, String title, List<String> headings, Map<String, List<DerivedMember>> groups,
                              Function<List<DerivedMember>, List<Object>> cells, String note) {
        List<Value> values = values(groups.values().stream().flatMap(List::stream).toList());
        List<LoadSchedule.Column> cols = new ArrayList<>(headings.stream().map(LoadSchedule.Column::text).toList());
        for (Value v : values) cols.add(new LoadSchedule.Column(v.heading, v.quantity));
        List<List<Object>> rows = new ArrayList<>();
        for (List<DerivedMember> g : groups.values()) {
            List<Object> row = new ArrayList<>(cells.apply(g));
            for (Value v : values) row.add(v.envelope(g));
            rows.add(row);
        }
        return new LoadSchedule(key, title, d.building().context().system(), cols, rows, List.of(READING, note));
    }

    /** The number columns for these members: Lr, S and M− only where some member carries them. */
    static List<Value> values(List<DerivedMember> members) {
        boolean lr = false, s = false, neg = false;
        for (DerivedMember m : members) {
            lr |= positive(m.result().stepValue("W.Lr"));
            s |= positive(m.result().stepValue("W.S"));
            neg |= !Double.isNaN(m.result().value("LRFD.M-"));
        }
        List<Value> values = new ArrayList<>(List.of(
                new Value("Span", Quantity.LENGTH, m -> m.span(), false),
                new Value("W D", Quantity.FORCE, m -> m.result().stepValue("W.D"), false),
                new Value("W L", Quantity.FORCE, m -> m.result().stepValue("W.L"), false)));
        if (lr) values.add(new Value("W Lr", Quantity.FORCE, m -> m.result().stepValue("W.Lr"), false));
        if (s) values.add(new Value("W S", Quantity.FORCE, m -> m.result().stepValue("W.S"), false));
        values.addAll(List.of(
                new Value("R_A service", Quantity.FORCE, m -> m.result().value("ASD.RA"), false),
                new Value("R_A factored", Quantity.FORCE, m -> m.result().value("LRFD.RA"), false),
                new Value("R_B service", Quantity.FORCE, m -> m.result().value("ASD.RB"), false),
                new Value("R_B factored", Quantity.FORCE, m -> m.result().value("LRFD.RB"), false),
                new Value("V_u", Quantity.FORCE, m -> m.result().value("LRFD.V"), false),
                new Value("M_u+", Quantity.MOMENT, m -> m.result().value("LRFD.M+"), false)));
        if (neg) values.add(new Value("M_u−", Quantity.MOMENT, m -> m.result().value("LRFD.M-"), true));
        return values;
    }

    static final String READING = "W: the total load on the member by case (L reduced as its record states); R_A and R_B: the end reactions "
            + "(service: the governing allowable stress design combination; factored: the governing strength design "
            + "combination); V_u and M_u: factored shear and moments.";

    private static boolean positive(double v) { return !Double.isNaN(v) && v > 0; }

    /** One number column: how to read it from a member, and whether the envelope is the least (a negative moment). */
    record Value(String heading, Quantity quantity, Function<DerivedMember, Double> read, boolean least) {
        double envelope(List<DerivedMember> members) {
            double out = Double.NaN;
            for (DerivedMember m : members) {
                double v = read.apply(m);
                if (Double.isNaN(v)) continue;
                out = Double.isNaN(out) ? v : least ? Math.min(out, v) : Math.max(out, v);
            }
            return out;
        }
    }
}
