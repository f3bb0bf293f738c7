package com.baysheet.sheet;

import com.baysheet.engine.InputError;

import java.time.LocalDate;

/**
 * What the title block of every page prints: who the sheet is for, what it is about, who prepared and who
 * checked it, and which issue it belongs to. The issue date also fixes the PDF's dates and so its bytes.
 *
 * @param checkedBy initials of the checking engineer; blank while the sheet is still being checked
 * @param checkedOn null while {@code checkedBy} is blank
 * @param revision  revision label as the firm writes it ("0", "A", "P1")
 * @param logoText  the firm's short mark, printed before its name in the title block; blank for none
 */
public record SheetHeader(String firm, String project, String jobNumber, String subject,
                          String preparedBy, LocalDate preparedOn, String checkedBy, LocalDate checkedOn,
                          String revision, LocalDate issueDate, String logoText) {
    /** A title block without a logo text. */
    public SheetHeader(String firm, String project, String jobNumber, String subject, String preparedBy, LocalDate preparedOn,
                       String checkedBy, LocalDate checkedOn, String revision, LocalDate issueDate) {
        this(firm, project, jobNumber, subject, preparedBy, preparedOn, checkedBy, checkedOn, revision, issueDate, "");
    }

    public SheetHeader {
        logoText = logoText == null ? "" : logoText.strip();
        firm = required("firm", firm);
        project = required("project", project);
        jobNumber = required("jobNumber", jobNumber);
        subject = required("subject", subject);
        preparedBy = required("preparedBy", preparedBy);
        if (preparedOn == null) throw new InputError("preparedOn", "none", "the date the sheet was prepared is required");
        checkedBy = checkedBy == null ? "" : checkedBy.strip();
        if (!checkedBy.isEmpty() && checkedOn == null)
            throw new InputError("checkedOn", "none", "a checked sheet needs the date it was checked");
        if (checkedBy.isEmpty() && checkedOn != null)
            throw new InputError("checkedBy", "\"\"", "a check date needs the checker's initials");
        revision = required("revision", revision);
        if (issueDate == null) throw new InputError("issueDate", "none", "the issue date is required (it fixes the PDF's dates)");
        if (preparedOn.isAfter(issueDate))
            throw new InputError("preparedOn", preparedOn, "is after the issue date " + issueDate);
    }

    public boolean isChecked() { return !checkedBy.isEmpty(); }

    /** The same title block for another subject (one member of a package). */
    public SheetHeader withSubject(String s) {
        return new SheetHeader(firm, project, jobNumber, s, preparedBy, preparedOn, checkedBy, checkedOn, revision, issueDate, logoText);
    }

    private static String required(String field, String v) {
        if (v == null || v.isBlank()) throw new InputError(field, "\"\"", "is required on the title block");
        return v.strip();
    }
}
