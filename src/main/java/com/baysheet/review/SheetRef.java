package com.baysheet.review;

/**
 * A sheet under check: the project and the member's id within the project's derivation, or for a package
 * {@link #PACKAGE_PREFIX} and the package's key ({@link PackageScope#subject()}). Member ids never start so.
 */
public record SheetRef(long projectId, String subject) {
    public static final String PACKAGE_PREFIX = "package-";

    public SheetRef {
        if (subject == null || subject.isBlank()) throw new IllegalArgumentException("subject: a sheet names its member");
    }

    public boolean isPackage() { return subject.startsWith(PACKAGE_PREFIX); }

    /** How the audit trail names the sheet. */
    public String label() { return "project " + projectId + (isPackage() ? " " : " member ") + subject; }
}
