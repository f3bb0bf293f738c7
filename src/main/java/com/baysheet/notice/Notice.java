package com.baysheet.notice;

import java.util.List;

/**
 * One e-mail notice of a review step: what happened to which sheets of which project, who did it, where to look,
 * and who is told. A batch makes one notice for all the sheets it moved, not one per sheet.
 *
 * @param sheets the sheets' names as their pages give them (marks, packages), at least one
 * @param link   the address of the page that lists them (the project's check queue), absolute; blank for none
 * @param to     the addresses told, at least one
 */
public record Notice(Kind kind, String project, List<String> sheets, String by, String link, List<String> to) {
    /** The steps that tell someone: each names who is told. */
    public enum Kind {
        /** Told to the checkers other than the preparer. */
        SUBMITTED("submitted for your check"),
        /** Told to the sheet's preparer. */
        RETURNED("returned to you with markups"),
        /** Told to the checkers other than the preparer: they may issue it. */
        APPROVED("approved, ready to issue");

        private final String said;

        Kind(String said) { this.said = said; }

        public String said() { return said; }
    }

    /** The most sheet names one notice lists; the rest are counted. */
    static final int LISTED = 30;

    public Notice {
        if (kind == null || project == null || by == null || link == null) throw new IllegalArgumentException("kind, project, by, link: required");
        sheets = List.copyOf(sheets);
        to = List.copyOf(to);
        if (sheets.isEmpty()) throw new IllegalArgumentException("sheets: at least one");
        if (to.isEmpty()) throw new IllegalArgumentException("to: at least one address");
    }

    public String subject() {
        String what = sheets.size() == 1 ? "Sheet " + sheets.get(0) : sheets.size() + " sheets";
        return project + ": " + what + " " + kind.said();
    }

    /** Plain text: what happened, by whom, the sheets (the first {@link #LISTED}), and where to look. */
    public String text() {
        StringBuilder b = new StringBuilder();
        b.append(sheets.size() == 1 ? "This sheet was " : "These " + sheets.size() + " sheets were ")
                .append(kind.said()).append(" by ").append(by).append(" in ").append(project).append(":\n\n");
        sheets.stream().limit(LISTED).forEach(s -> b.append("  ").append(s).append('\n'));
        if (sheets.size() > LISTED) b.append("  and ").append(sheets.size() - LISTED).append(" more\n");
        b.append(link.isEmpty() ? "\nThey are in the project's check queue.\n" : "\nThe check queue: " + link + "\n")
                .append("\nResults must be checked by a licensed engineer; the adopted local code governs.\n")
                .append("This notice was sent by the office's calculation server; the sheets' pages are the record.\n");
        return b.toString();
    }
}
