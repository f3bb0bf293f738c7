package com.baysheet.project;

/**
 * A stored project: its id, the version every change is based on, what it is, and whether it is archived
 * (kept, out of the default list, its model closed to changes until it is un-archived).
 */
public record Project(long id, long version, ProjectInfo info, boolean archived) {
    /** The project's state in a person's words, as pages and refusals name it. */
    public String state() {
        return archived ? "archived" : "current";
    }
}
