package com.baysheet.sheet;

import com.baysheet.engine.InputError;

import java.time.LocalDate;

/**
 * What the title block of a page prints: who the sheet is for, what it is about, who prepared and who
 * checked it, and where it stands in the issue. Every field states what happened to the calculation
 * printed, so nothing is filled in for a step not yet taken: a sheet nobody submitted says
 * {@link #NOT_SUBMITTED}, one not checked prints "not yet checked", one not issued has no issue date.
 *
 * @param preparedBy initials of the preparer, or {@link #NOT_SUBMITTED}
 * @param preparedOn null while the calculation printed has not been submitted
 * @param checkedBy  initials of the checking engineer; blank while the sheet is not checked
 * @param checkedOn  null while {@code checkedBy} is blank
 * @param revision   revision label as the firm writes it ("0", "A", "P1"), or {@link #NOT_ISSUED} for a sheet of a
 *                   package that has no issued revision of its own
 * @param issueDate  the date this revision was issued; null when it is not issued (every checking copy)
 * @param printedOn  the date this copy was made, which fixes the PDF's dates and so its bytes; for an issued copy
 *                   its issue date
 * @param logoText   the firm's short mark, printed before its name in the title block; blank for none
 * @param auditHead  on an issued copy, the audit trail's chain head when it was issued ("entry N, SHA-256 …"),
 *                   printed in the closing block so that the trail can later be checked against the paper; blank for none
 */
public record SheetHeader(String firm, String project, String jobNumber, String subject,
                          String preparedBy, LocalDate preparedOn, String checkedBy, LocalDate checkedOn,
                          String revision, LocalDate issueDate, LocalDate printedOn, String logoText,
                          String auditHead) {
    public static final String NOT_SUBMITTED = "not submitted";
    public static final String NOT_ISSUED = "not issued";

    /** A title block without a logo text. */
    public SheetHeader(String firm, String project, String jobNumber, String subject, String preparedBy, LocalDate preparedOn,
                       String checkedBy, LocalDate checkedOn, String revision, LocalDate issueDate, LocalDate printedOn) {
        this(firm, project, jobNumber, subject, preparedBy, preparedOn, checkedBy, checkedOn, revision, issueDate, printedOn, "");
    }

    public SheetHeader(String firm, String project, String jobNumber, String subject, String preparedBy, LocalDate preparedOn,
                       String checkedBy, LocalDate checkedOn, String revision, LocalDate issueDate, LocalDate printedOn,
                       String logoText) {
        this(firm, project, jobNumber, subject, preparedBy, preparedOn, checkedBy, checkedOn, revision, issueDate, printedOn,
                logoText, "");
    }

    public SheetHeader {
        logoText = logoText == null ? "" : logoText.strip();
        auditHead = auditHead == null ? "" : auditHead.strip();
        firm = required("firm", firm);
        project = required("project", project);
        jobNumber = required("jobNumber", jobNumber);
        subject = required("subject", subject);
        preparedBy = required("preparedBy", preparedBy);
        checkedBy = checkedBy == null ? "" : checkedBy.strip();
        if (!checkedBy.isEmpty() && checkedOn == null)
            throw new InputError("checkedOn", "none", "a checked sheet needs the date it was checked");
        if (checkedBy.isEmpty() && checkedOn != null)
            throw new InputError("checkedBy", "\"\"", "a check date needs the checker's initials");
        revision = required("revision", revision);
        if (printedOn == null) throw new InputError("printedOn", "none", "the date of the copy is required (it fixes the PDF's dates)");
        if (preparedOn != null && preparedOn.isAfter(printedOn))
            throw new InputError("preparedOn", preparedOn, "is after the date of the copy " + printedOn);
        if (issueDate != null && issueDate.isAfter(printedOn))
            throw new InputError("issueDate", issueDate, "is after the date of the copy " + printedOn);
    }

    /** The title block of an issued copy: issued, and printed, on {@code issueDate}. */
    public SheetHeader(String firm, String project, String jobNumber, String subject, String preparedBy, LocalDate preparedOn,
                       String checkedBy, LocalDate checkedOn, String revision, LocalDate issueDate) {
        this(firm, project, jobNumber, subject, preparedBy, preparedOn, checkedBy, checkedOn, revision, issueDate,
                requiredDate(issueDate), "");
    }

    public boolean isChecked() { return !checkedBy.isEmpty(); }

    public boolean isIssued() { return issueDate != null; }

    public boolean isSubmitted() { return preparedOn != null; }

    /** The same title block for another subject (a page of a package about the package itself). */
    public SheetHeader withSubject(String s) {
        return new SheetHeader(firm, project, jobNumber, s, preparedBy, preparedOn, checkedBy, checkedOn, revision, issueDate, printedOn, logoText, auditHead);
    }

    /** The same issued title block quoting the audit trail's chain head at the issue. */
    public SheetHeader withAuditHead(String head) {
        return new SheetHeader(firm, project, jobNumber, subject, preparedBy, preparedOn, checkedBy, checkedOn, revision, issueDate, printedOn, logoText, head);
    }

    /** The same sheet as a checking copy printed on {@link #printedOn}: a checking copy is never an issue. */
    public SheetHeader notIssued() {
        return new SheetHeader(firm, project, jobNumber, subject, preparedBy, preparedOn, checkedBy, checkedOn, revision, null, printedOn, logoText, "");
    }

    /** "JQR / MKL", "JQR", or "" where the sheet was neither submitted nor checked: the initials that signed it. */
    public String signatures() {
        String by = isSubmitted() ? preparedBy : "";
        if (!isChecked()) return by;
        return by.isEmpty() ? checkedBy : by + " / " + checkedBy;
    }

    private static LocalDate requiredDate(LocalDate issueDate) {
        if (issueDate == null) throw new InputError("issueDate", "none", "the issue date is required (it fixes the PDF's dates)");
        return issueDate;
    }

    private static String required(String field, String v) {
        if (v == null || v.isBlank()) throw new InputError(field, "\"\"", "is required on the title block");
        return v.strip();
    }
}
