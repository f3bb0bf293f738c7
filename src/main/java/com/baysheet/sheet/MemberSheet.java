package com.baysheet.sheet;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;

import java.util.List;

/**
 * One member's calculation sheet: its title block, the engine's record (rendered as is, never
 * recomputed) and an optional key plan. {@code level} and {@code group} order it within a package
 * ("Level 2", "Girders").
 *
 * @param keyPlan   null where there is no plan (a member entered on its own)
 * @param revisions the sheet's revision block, printed after its notes where not empty
 */
public record MemberSheet(SheetHeader header, CalcRecord record, KeyPlan keyPlan, String level, String group,
                          List<Revision> revisions) {
    public MemberSheet {
        if (header == null) throw new InputError("header", "none", "a sheet needs its title block");
        if (record == null) throw new InputError("record", "none", "a sheet needs a calculation record");
        level = level == null ? "" : level;
        group = group == null ? "" : group;
        revisions = revisions == null ? List.of() : List.copyOf(revisions);
    }

    /** A sheet without a revision block of its own. */
    public MemberSheet(SheetHeader header, CalcRecord record, KeyPlan keyPlan, String level, String group) {
        this(header, record, keyPlan, level, group, List.of());
    }

    /** The same sheet under another title block. */
    public MemberSheet withHeader(SheetHeader h) {
        return new MemberSheet(h, record, keyPlan, level, group, revisions);
    }

    /** The same sheet with its revision block: each issued revision (rev, date, description, by), oldest first. */
    public MemberSheet withRevisions(List<Revision> r) {
        return new MemberSheet(header, record, keyPlan, level, group, r);
    }

    /** A sheet for a member entered on its own: no key plan, no package grouping. */
    public static MemberSheet of(SheetHeader header, CalcRecord record) {
        return new MemberSheet(header, record, null, "", "");
    }
}
