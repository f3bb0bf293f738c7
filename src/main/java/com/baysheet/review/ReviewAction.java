package com.baysheet.review;

/** What a user does to a sheet; the audit trail records each under its name. */
public enum ReviewAction {
    SUBMIT("submit for check"),
    RETURN("return with markups"),
    RESUBMIT("resubmit"),
    TAKE_BACK("take back"),
    APPROVE("approve"),
    ISSUE("issue"),
    SUPERSEDE("supersede"),
    MARKUP("add a markup"),
    REPLY("reply to a markup"),
    RESOLVE("resolve a markup"),
    REOPEN("reopen a markup");

    private final String label;

    ReviewAction(String label) {
        this.label = label;
    }

    public String label() { return label; }
}
