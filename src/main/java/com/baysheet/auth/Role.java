package com.baysheet.auth;

import com.baysheet.engine.InputError;

import java.util.Locale;

/**
 * What a user of the office may do. An engineer prepares sheets; a checker prepares too, and checks and
 * approves other people's sheets; an administrator keeps the users, the firm's settings and the audit
 * trail and reads everything, but neither prepares nor checks (so the person who keeps the records is
 * not also the one whose work they record).
 */
public enum Role {
    ENGINEER("engineer"),
    CHECKER("checker"),
    ADMINISTRATOR("administrator");

    private final String label;

    Role(String label) {
        this.label = label;
    }

    public String label() { return label; }

    public boolean mayPrepare() { return this != ADMINISTRATOR; }

    public boolean mayCheck() { return this == CHECKER; }

    public boolean mayAdminister() { return this == ADMINISTRATOR; }

    /** The role named on a form ("checker"), or an input error naming the field. */
    public static Role parse(String field, String text) {
        if (text != null) {
            for (Role r : values()) if (r.label.equals(text.strip().toLowerCase(Locale.ROOT))) return r;
        }
        throw new InputError(field, text == null ? "nothing" : "\"" + text + "\"",
                "must be one of engineer, checker, administrator");
    }
}
