package com.baysheet.web.auth;

/** A request the access filter stops: nobody logged in, a role that may not, a form without its token,
 * a password set by someone else not yet changed, or an API token that opens nothing here. */
public final class AccessRefused extends RuntimeException {
    public enum Why { LOGIN, FORBIDDEN, FORM_TOKEN, SET_UP, CHANGE_PASSWORD, TOKEN }

    private final Why why;

    public AccessRefused(Why why, String message) {
        super(message);
        this.why = why;
    }

    public Why why() { return why; }

    public int status() {
        return switch (why) {
            case LOGIN, TOKEN -> 401;
            case FORBIDDEN, FORM_TOKEN, CHANGE_PASSWORD -> 403;
            case SET_UP -> 503;
        };
    }
}
