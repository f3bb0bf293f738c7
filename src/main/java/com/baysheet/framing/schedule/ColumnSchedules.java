package com.baysheet.framing.schedule;

import com.baysheet.engine.units.Quantity;
import com.baysheet.framing.Derived;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.TakeDown;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;

/**
 * The column load schedule and the foundation reactions, copied from the take-downs: each row's D, L reduced,
 * Lr and S (those two only where some column carries them) and the governing service and factored loads with
 * their combinations. Nothing is recomputed; the totals are sums of the rows printed.
 */
public final class ColumnSchedules {
    private ColumnSchedules() {}

    /** Each column stack level by level from the top, then its base. */
    public static LoadSchedule loads(Derived d) { return loads(d, t -> true); }

    /** The same for the stacks chosen (a level's package: those with a column at that level). */
    public static LoadSchedule loads(Derived d, Predicate<TakeDown> which) { return loads(d, which, MemberLabels.PLACES); }

    /** The same with each column labelled as given (its mark beside its place). */
    public static LoadSchedule loads(Derived d, Predicate<TakeDown> which, MemberLabels labels) {
        Presence p = Presence.of(d);
        List<List<Object>> rows = new ArrayList<>();
        for (TakeDown t : d.takeDowns()) {
            if (!which.test(t)) continue;
            for (TakeDown.Row r : t.rows()) rows.add(row(label(d, t, r, labels), "below " + r.level(), r, p));
            TakeDown.Row base = t.rows().get(t.rows().size() - 1);
            rows.add(row(label(d, t, base, labels), "base", base, p));
        }
        return new LoadSchedule("column-loads", "Column load schedule", d.building().context().system(), columns("At", p), rows,
                List.of("Each level's row is the load in the column below that level, from everything at and above it; "
                        + "the base row is the load on the foundation.", REDUCED, GOVERNING));
    }

    /** One row per column base, and the totals of D, L, Lr and S. */
    public static LoadSchedule foundations(Derived d) { return foundations(d, t -> true); }

    /** The same for the stacks chosen. */
    public static LoadSchedule foundations(Derived d, Predicate<TakeDown> which) { return foundations(d, which, MemberLabels.PLACES); }

    /** The same with each column labelled as given (its mark beside its place). */
    public static LoadSchedule foundations(Derived d, Predicate<TakeDown> which, MemberLabels labels) {
        Presence p = Presence.of(d);
        List<List<Object>> rows = new ArrayList<>();
        double[] sum = new double[4];
        for (TakeDown t : d.takeDowns()) {
            if (!which.test(t)) continue;
            TakeDown.Row base = t.rows().get(t.rows().size() - 1);
            rows.add(row(label(d, t, base, labels), "below " + base.level(), base, p));
            sum[0] += base.dead();
            sum[1] += base.liveReduced();
            sum[2] += base.roofLive();
            sum[3] += base.snow();
        }
        List<Object> total = new ArrayList<>(List.of("Total", "all bases", sum[0], sum[1]));
        if (p.roofLive) total.add(sum[2]);
        if (p.snow) total.add(sum[3]);
        total.addAll(List.of(Double.NaN, "", Double.NaN, ""));
        rows.add(total);
        return new LoadSchedule("foundation-reactions", "Foundation reactions", d.building().context().system(), columns("Column below", p), rows,
                List.of("Unfactored reactions at each column base; the total row adds the columns (the governing loads of "
                        + "different combinations are not added).", REDUCED, GOVERNING));
    }

    static final String REDUCED = "L is the floor live load reduced as each column's own record states; Lr and S are not reduced by "
            + "the floor rules.";
    static final String GOVERNING = "Service: the governing allowable stress design combination; factored: the governing strength "
            + "design combination, as each column's record chose them.";

    /** The stacks with a column at the level: a level's package lists those. */
    public static Predicate<TakeDown> at(String level) {
        return t -> t.rows().stream().anyMatch(r -> r.level().equals(level));
    }

    /** The column by its label, or by its grid point where the member is gone: never its internal id. */
    static String label(Derived d, TakeDown t, TakeDown.Row r, MemberLabels labels) {
        return d.member(r.member()).map(labels::placed).orElse("Column " + t.gridPoint());
    }

    private static List<LoadSchedule.Column> columns(String at, Presence p) {
        List<LoadSchedule.Column> c = new ArrayList<>(List.of(LoadSchedule.Column.text("Column"), LoadSchedule.Column.text(at),
                new LoadSchedule.Column("D", Quantity.FORCE), new LoadSchedule.Column("L", Quantity.FORCE)));
        if (p.roofLive) c.add(new LoadSchedule.Column("Lr", Quantity.FORCE));
        if (p.snow) c.add(new LoadSchedule.Column("S", Quantity.FORCE));
        c.add(new LoadSchedule.Column("Service", Quantity.FORCE));
        c.add(LoadSchedule.Column.text("Service combination"));
        c.add(new LoadSchedule.Column("Factored", Quantity.FORCE));
        c.add(LoadSchedule.Column.text("Factored combination"));
        return c;
    }

    private static List<Object> row(String column, String at, TakeDown.Row r, Presence p) {
        List<Object> out = new ArrayList<>(List.of(column, at, r.dead(), r.liveReduced()));
        if (p.roofLive) out.add(r.roofLive());
        if (p.snow) out.add(r.snow());
        out.addAll(List.of(r.asd(), r.asdCombination(), r.lrfd(), r.lrfdCombination()));
        return out;
    }

    /** Which of Lr and S any column carries: a column of zeros is left off the table. */
    private record Presence(boolean roofLive, boolean snow) {
        static Presence of(Derived d) {
            boolean lr = false, s = false;
            for (TakeDown t : d.takeDowns())
                for (TakeDown.Row r : t.rows()) { lr |= r.roofLive() > 0; s |= r.snow() > 0; }
            return new Presence(lr, s);
        }
    }
}
