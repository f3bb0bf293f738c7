package com.baysheet.review;

/** Where a revision of a calculation sheet stands in the check. */
public enum SheetState {
    PREPARING("being prepared"),
    SUBMITTED("submitted for check"),
    RETURNED("returned with markups"),
    RESUBMITTED("resubmitted"),
    APPROVED("approved"),
    ISSUED("issued"),
    SUPERSEDED("superseded");

    private final String label;

    SheetState(String label) {
        this.label = label;
    }

    public String label() { return label; }

    /** Waiting for a checker: markups may be added, the sheet may be returned or approved. */
    public boolean awaitingCheck() { return this == SUBMITTED || this == RESUBMITTED; }

    /** Issued and superseded revisions never change. */
    public boolean frozen() { return this == ISSUED || this == SUPERSEDED; }

    public static SheetState parse(String name) {
        try {
            return valueOf(name);
        } catch (IllegalArgumentException e) {
            throw new IllegalStateException("stored state " + name + " is not a sheet state", e);
        }
    }
}
