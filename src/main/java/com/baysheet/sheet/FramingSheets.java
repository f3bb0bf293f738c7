package com.baysheet.sheet;

import com.baysheet.framing.model.Submittal;
import com.baysheet.engine.InputError;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.MemberRole;
import com.baysheet.framing.PlanRect;
import com.baysheet.framing.TypicalGroup;
import com.baysheet.framing.schedule.ColumnSchedules;
import com.baysheet.framing.schedule.MarkSchedule;
import com.baysheet.framing.schedule.MemberSchedule;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Function;

/**
 * Sheets and packages from a derived framing model: each member's record with a key plan of its level,
 * grouped by level (top down, as derived) and by role (girders, beams on grid lines, infill beams, columns).
 */
public final class FramingSheets {
    private FramingSheets() {}

    /** One member's sheet; the header's subject becomes the member's name. */
    public static MemberSheet member(SheetHeader base, Derived d, String memberId) {
        DerivedMember m = d.member(memberId).orElseThrow(() -> new InputError("member", memberId, "is not a member of this model"));
        return sheet(base, d, m);
    }

    /** The package of one level, every member sheet under the package's own title block. */
    public static CalcPackage level(SheetHeader base, Derived d, String level, List<Revision> revisions) {
        return level(base, d, level, revisions, m -> base);
    }

    /**
     * The package of one level: its member sheets and the take-downs of the columns at that level.
     *
     * @param members each member's own title block (its preparer, checker and revision); its subject becomes the member's name
     */
    public static CalcPackage level(SheetHeader base, Derived d, String level, List<Revision> revisions,
                                    Function<DerivedMember, SheetHeader> members) {
        List<DerivedMember> on = d.onLevel(level);
        if (on.isEmpty()) throw new InputError("level", level, "has no members in this model");
        List<TakeDownTable> downs = new ArrayList<>();
        for (var t : d.takeDowns())
            if (t.rows().stream().anyMatch(r -> r.level().equals(level))) downs.add(TakeDownTables.of(d, t));
        return new CalcPackage(base.withSubject(level + " package"), level + " package", Criteria.of(d.building()),
                sheets(members, d, on), downs, revisions, MethodTables.of(d, List.of(level)),
                FramingPlans.of(d, List.of(level)),
                List.of(ColumnSchedules.loads(d, ColumnSchedules.at(level)), ColumnSchedules.foundations(d, ColumnSchedules.at(level)),
                        MemberSchedule.onLevel(d, level)), Submittal.NONE);
    }

    /** The whole project, every member sheet under the package's own title block. */
    public static CalcPackage project(SheetHeader base, Derived d, List<Revision> revisions) {
        return project(base, d, revisions, m -> base);
    }

    /**
     * The whole project: every member sheet and every column take-down.
     *
     * @param members each member's own title block (its preparer, checker and revision); its subject becomes the member's name
     */
    public static CalcPackage project(SheetHeader base, Derived d, List<Revision> revisions,
                                      Function<DerivedMember, SheetHeader> members) {
        return new CalcPackage(base.withSubject("Project package"), "Project package", Criteria.of(d.building()),
                sheets(members, d, d.members()), d.takeDowns().stream().map(t -> TakeDownTables.of(d, t)).toList(), revisions,
                MethodTables.of(d, d.members().stream().map(DerivedMember::level).distinct().toList()),
                FramingPlans.of(d, d.members().stream().map(DerivedMember::level).distinct().toList()),
                List.of(ColumnSchedules.loads(d), ColumnSchedules.foundations(d), MemberSchedule.of(d)), Submittal.NONE);
    }

    /**
     * A typical member's sheet under its mark: the shared calculation with every location it covers, ordered in a
     * package by its first location's level and its role. The key plan is drawn only for a mark of one location
     * (a plan shows one member; the sheet lists the locations of the others).
     */
    public static MemberSheet typical(SheetHeader base, Derived d, TypicalGroup g, String mark) {
        DerivedMember first = g.first();
        return new MemberSheet(base.withSubject(mark), g.record(mark), g.members().size() == 1 ? keyPlan(d, first) : null,
                first.level(), group(g.role()));
    }

    /** The package of one level made of the sheets given (its typical members'), with the take-downs at that level. */
    public static CalcPackage levelOf(SheetHeader base, Derived d, String level, List<Revision> revisions, List<MemberSheet> sheets) {
        return levelOf(base, d, level, revisions, sheets, MemberLabels.PLACES);
    }

    /**
     * The same with the plan, the take-downs and the schedules labelling each member by its mark, and the member
     * schedule one row per mark.
     */
    public static CalcPackage levelOf(SheetHeader base, Derived d, String level, List<Revision> revisions, List<MemberSheet> sheets,
                                      MemberLabels marks) {
        List<TakeDownTable> downs = new ArrayList<>();
        for (var t : d.takeDowns())
            if (t.rows().stream().anyMatch(r -> r.level().equals(level))) downs.add(TakeDownTables.of(d, t, marks));
        return new CalcPackage(base.withSubject(level + " package"), level + " package", Criteria.of(d.building()), sheets, downs, revisions,
                MethodTables.of(d, List.of(level)), FramingPlans.of(d, List.of(level), marks),
                List.of(ColumnSchedules.loads(d, ColumnSchedules.at(level), marks), ColumnSchedules.foundations(d, ColumnSchedules.at(level), marks),
                        marks == MemberLabels.PLACES ? MemberSchedule.onLevel(d, level) : MarkSchedule.onLevel(d, level, marks)), Submittal.NONE);
    }

    /** The whole project made of the sheets given (its typical members'), with every column take-down. */
    public static CalcPackage projectOf(SheetHeader base, Derived d, List<Revision> revisions, List<MemberSheet> sheets) {
        return projectOf(base, d, revisions, sheets, MemberLabels.PLACES);
    }

    /** The same labelled by marks, as {@link #levelOf(SheetHeader, Derived, String, List, List, MemberLabels)}. */
    public static CalcPackage projectOf(SheetHeader base, Derived d, List<Revision> revisions, List<MemberSheet> sheets, MemberLabels marks) {
        List<String> levels = d.members().stream().map(DerivedMember::level).distinct().toList();
        return new CalcPackage(base.withSubject("Project package"), "Project package", Criteria.of(d.building()),
                sheets, d.takeDowns().stream().map(t -> TakeDownTables.of(d, t, marks)).toList(), revisions,
                MethodTables.of(d, levels), FramingPlans.of(d, levels, marks),
                List.of(ColumnSchedules.loads(d, t -> true, marks), ColumnSchedules.foundations(d, t -> true, marks),
                        marks == MemberLabels.PLACES ? MemberSchedule.of(d) : MarkSchedule.of(d, marks)), Submittal.NONE);
    }

    private static List<MemberSheet> sheets(Function<DerivedMember, SheetHeader> headers, Derived d, List<DerivedMember> members) {
        List<String> levels = members.stream().map(DerivedMember::level).distinct().toList();
        return members.stream()
                .sorted(Comparator.comparingInt((DerivedMember m) -> levels.indexOf(m.level())).thenComparingInt(m -> rank(m.role())))
                .map(m -> sheet(headers.apply(m), d, m)).toList();
    }

    private static MemberSheet sheet(SheetHeader base, Derived d, DerivedMember m) {
        return new MemberSheet(base.withSubject(m.name()), m.result().record(), keyPlan(d, m), m.level(), group(m.role()));
    }

    static int rank(MemberRole r) {
        return switch (r) { case GIRDER -> 0; case GRID_BEAM -> 1; case INFILL_BEAM -> 2; case COLUMN -> 3; };
    }

    static String group(MemberRole r) {
        return switch (r) {
            case GIRDER -> "Girders";
            case GRID_BEAM -> "Beams on grid lines";
            case INFILL_BEAM -> "Infill beams";
            case COLUMN -> "Columns";
        };
    }

    /** The member's level drawn from the model: grid lines, framed bays, the member and its tributary outline. */
    public static KeyPlan keyPlan(Derived d, DerivedMember m) {
        Grid g = d.building().grid();
        List<KeyPlan.GridLine> lines = new ArrayList<>();
        for (int i = 0; i < g.x().lines(); i++) lines.add(new KeyPlan.GridLine(g.x().name(i), true, g.x().position(i)));
        for (int j = 0; j < g.y().lines(); j++) lines.add(new KeyPlan.GridLine(g.y().name(j), false, g.y().position(j)));
        List<KeyPlan.Rect> bays = new ArrayList<>();
        Level level = d.building().levels().stream().filter(l -> l.name().equals(m.level())).findFirst().orElse(null);
        if (level != null)
            for (Bay b : level.bays())
                if (!b.opening())
                    bays.add(new KeyPlan.Rect(g.x().position(b.col()), g.y().position(b.row()),
                            g.x().position(b.col() + 1), g.y().position(b.row() + 1)));
        List<KeyPlan.Rect> trib = new ArrayList<>();
        for (PlanRect r : m.tributary()) trib.add(new KeyPlan.Rect(r.x1(), r.y1(), r.x2(), r.y2()));
        var p = m.plan();
        return new KeyPlan(m.level(), lines, bays, new KeyPlan.Line(p.x1(), p.y1(), p.x2(), p.y2()), trib);
    }
}
