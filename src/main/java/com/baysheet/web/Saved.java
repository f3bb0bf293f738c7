package com.baysheet.web;

import io.javalin.http.Context;

/**
 * The confirmation after a save: the handler redirects (post-redirect-get) to its page with
 * {@code ?saved=CODE}, and the layout shows the message of that code. Only these codes are shown; any other
 * value of the parameter shows nothing, so no text of the address reaches the page.
 */
public enum Saved {
    FIRM("firm", "Saved: firm settings."),
    MAIL("mail", "Saved: e-mail notice settings. The next notice is sent with them."),
    PROJECT("project", "Saved: project settings."),
    SUBMITTAL("submittal", "Saved: submittal data."),
    PASSWORD("password", "Saved: your new password. Your other logins were ended."),
    USER("user", "Saved: user account."),
    DELETED("deleted", "Deleted. It is kept for 30 days, and the administrator can restore it (Deleted items)."),
    CLEARED("cleared", "Cleared. Whatever bays they held are kept for 30 days, and the administrator can restore them (Deleted items)."),
    RESTORED("restored", "Restored: it is back where it was, and the audit trail records it."),
    TOKEN_REVOKED("token", "Revoked: that API token no longer opens anything."),

    COPIED("copied", "Copied: this is the new job, with the old one's model and no sheets yet; the old job keeps its reviews and revisions."),
    ARCHIVED("archived", "Archived: the project is kept, out of the project list, and its model takes no change until it is un-archived."),
    UNARCHIVED("unarchived", "Un-archived: the project is back in the list and its model can be changed again."),
    OCCUPANCY("occupancy", "Saved: firm occupancy. Every project that uses it now computes with the new values."),
    DELETED_OCCUPANCY("occupancy-deleted", "Deleted: the occupancy has left the firm's catalogue; the audit trail records its values.");

    /** The request attribute the layout reads the message by. */
    public static final String ATTRIBUTE = "saved";
    private static final String PARAM = "saved";

    private final String code;
    private final String message;

    Saved(String code, String message) {
        this.code = code;
        this.message = message;
    }

    public String message() { return message; }

    /** The page to redirect to after this save: {@code path} with the confirmation asked for. */
    public String after(String path) {
        return path + (path.contains("?") ? "&" : "?") + PARAM + "=" + code;
    }

    /** A before-filter: a page asked with a known {@code saved} code gets its message. */
    public static void onRequest(Context ctx) {
        String asked = ctx.queryParam(PARAM);
        if (asked == null) return;
        for (Saved s : values()) if (s.code.equals(asked)) ctx.attribute(ATTRIBUTE, s.message);
    }
}
