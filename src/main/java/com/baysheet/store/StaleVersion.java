package com.baysheet.store;

/**
 * A change based on an old version of a project: someone saved the project after this change's form was
 * opened. Refused, never merged silently.
 */
public final class StaleVersion extends RuntimeException {
    private final long given;
    private final long current;

    public StaleVersion(long projectId, long given, long current) {
        super("project " + projectId + " was changed by another save since you opened it (your version "
                + given + ", now " + current + "); reload it and apply your change again");
        this.given = given;
        this.current = current;
    }

    public long given() { return given; }

    public long current() { return current; }
}
