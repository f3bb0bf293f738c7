package com.baysheet.sheet;

import com.baysheet.framing.model.Submittal;
import com.baysheet.engine.InputError;
import com.baysheet.framing.schedule.LoadSchedule;

import java.util.List;

/**
 * A calculation package: cover (project data and design criteria), index, member sheets grouped by level
 * and member kind (put in that order here, otherwise as given), column take-downs, the floor live load of each level's
 * members under the other reduction methods (where the project chose a method other than its edition's own) and the
 * revision log, all under one title block.
 *
 * @param title     what the package covers ("Project package", "Level 2 package")
 * @param plans     a framing plan sheet per level, before the member sheets
 * @param schedules the load summaries (column loads, foundation reactions, members), after the take-downs
 * @param submittal the site, client, engineer of record and building code, on the cover, the criteria page and
 *                  every title block ({@link Submittal#NONE} where none is known)
 */
public record CalcPackage(SheetHeader header, String title, DesignCriteria criteria, List<MemberSheet> sheets,
                          List<TakeDownTable> takeDowns, List<Revision> revisions, List<TakeDownTable> methodTables,
                          List<FramingPlan> plans, List<LoadSchedule> schedules, Submittal submittal) {
    /** A package of member sheets and take-downs alone: no plan sheets, no schedules, no comparison of methods. */
    public CalcPackage(SheetHeader header, String title, DesignCriteria criteria, List<MemberSheet> sheets,
                       List<TakeDownTable> takeDowns, List<Revision> revisions) {
        this(header, title, criteria, sheets, takeDowns, revisions, List.of(), List.of(), List.of(), Submittal.NONE);
    }

    public CalcPackage {
        if (header == null) throw new InputError("header", "none", "a package needs its title block");
        if (title == null || title.isBlank()) throw new InputError("title", "\"\"", "a package needs a title");
        if (criteria == null) throw new InputError("criteria", "none", "a package needs its design criteria");
        sheets = Index.grouped(List.copyOf(sheets));
        takeDowns = List.copyOf(takeDowns);
        revisions = List.copyOf(revisions);
        methodTables = List.copyOf(methodTables);
        plans = List.copyOf(plans);
        schedules = List.copyOf(schedules);
        if (submittal == null) submittal = Submittal.NONE;
        if (sheets.isEmpty() && takeDowns.isEmpty())
            throw new InputError("sheets", 0, "a package needs at least one member sheet or take-down");
    }

    /** The same package under another title block of its own (the member sheets keep theirs). */
    public CalcPackage withHeader(SheetHeader h) {
        return new CalcPackage(h, title, criteria, sheets, takeDowns, revisions, methodTables, plans, schedules, submittal);
    }

    /** The same package for a submittal: its site, client, engineer of record and building code. */
    public CalcPackage withSubmittal(Submittal s) {
        return new CalcPackage(header, title, criteria, sheets, takeDowns, revisions, methodTables, plans, schedules, s);
    }
}
