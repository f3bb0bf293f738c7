package com.baysheet.review;

/** A member's sheet: the project and the member's id within the project's derivation. */
public record SheetRef(long projectId, String subject) {
    public SheetRef {
        if (subject == null || subject.isBlank()) throw new IllegalArgumentException("subject: a sheet names its member");
    }

    /** How the audit trail names the sheet. */
    public String label() { return "project " + projectId + " member " + subject; }
}
