package com.baysheet.framing.schedule;

import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.TypicalGroup;

import java.util.List;
import java.util.function.Predicate;

/**
 * The member schedule by mark: one row per beam or girder mark, with the number of members that carry it, where
 * they are, and the same values as the member schedule (span, loads by case, end reactions, V_u, M_u). The
 * members of a mark are calculated once, so their values are equal; the row still shows their envelope (the
 * largest of each, the most negative M_u−), so that a row is never lighter than a location it stands for, whatever
 * the labelling given. Columns are in the column load schedule, under their marks.
 */
public final class MarkSchedule {
    private MarkSchedule() {}

    /** Every beam and girder mark of the project. */
    public static LoadSchedule of(Derived d, MemberLabels marks) { return of(d, m -> true, marks); }

    /** The marks with members on one level, counting and locating only those on it. */
    public static LoadSchedule onLevel(Derived d, String level, MemberLabels marks) {
        return of(d, m -> m.level().equals(level), marks);
    }

    /** The members chosen, one row per label, in the order of each label's first member. */
    public static LoadSchedule of(Derived d, Predicate<DerivedMember> which, MemberLabels marks) {
        return MemberSchedule.table(d, "marks", "Member schedule by mark", List.of("Mark", "Count", "Locations"),
                MemberSchedule.grouped(d, which, marks::of),
                g -> List.of(marks.of(g.get(0)), Integer.toString(g.size()), locations(g)),
                "Each mark is calculated once for all its locations; its sheet lists them with the calculation.");
    }

    /** The locations of a mark as a reader finds them: level and grid position, never an internal id. */
    static String locations(List<DerivedMember> members) {
        return String.join("; ", members.stream().map(TypicalGroup::location).toList());
    }
}
