package com.baysheet.framing;

/**
 * The one place a member gets the label printed for it: on plan sheets, in schedules and on the web plan.
 * Today the label is the member's place in the grid ("Girder 2/A-B", "Beam A-B/1-2 #1", "Column B/2"), the
 * level being printed beside it wherever it is not obvious; a firm's typical marks can take its place here
 * without touching the pages that print it. Never the member's internal id.
 */
public final class MemberLabel {
    private MemberLabel() {}

    public static String of(DerivedMember m) {
        String below = " below " + m.level();
        // a column is named for its grid point and the level it stands below; the level is printed apart
        if (m.role() == MemberRole.COLUMN && m.name().endsWith(below))
            return m.name().substring(0, m.name().length() - below.length());
        return m.name();
    }

    /** The label with the level, for text that stands alone ("Column B/2 below Level 2", "Girder 2/A-B, Level 2"). */
    public static String withLevel(DerivedMember m) {
        return m.role() == MemberRole.COLUMN ? of(m) + " below " + m.level() : of(m) + ", " + m.level();
    }
}
