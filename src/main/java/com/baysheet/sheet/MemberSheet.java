package com.baysheet.sheet;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;

/**
 * One member's calculation sheet: its title block, the engine's record (rendered as is, never
 * recomputed) and an optional key plan. {@code level} and {@code group} order it within a package
 * ("Level 2", "Girders").
 *
 * @param keyPlan null where there is no plan (a member entered on its own)
 */
public record MemberSheet(SheetHeader header, CalcRecord record, KeyPlan keyPlan, String level, String group) {
    public MemberSheet {
        if (header == null) throw new InputError("header", "none", "a sheet needs its title block");
        if (record == null) throw new InputError("record", "none", "a sheet needs a calculation record");
        level = level == null ? "" : level;
        group = group == null ? "" : group;
    }

    /** The same sheet under another title block. */
    public MemberSheet withHeader(SheetHeader h) {
        return new MemberSheet(h, record, keyPlan, level, group);
    }

    /** A sheet for a member entered on its own: no key plan, no package grouping. */
    public static MemberSheet of(SheetHeader header, CalcRecord record) {
        return new MemberSheet(header, record, null, "", "");
    }
}
