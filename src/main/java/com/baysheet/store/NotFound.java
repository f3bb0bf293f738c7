package com.baysheet.store;

/** An id that names nothing: a project, level or member that does not exist (any more). */
public final class NotFound extends RuntimeException {
    public NotFound(String what, Object id) {
        super("no " + what + " " + id);
    }
}
