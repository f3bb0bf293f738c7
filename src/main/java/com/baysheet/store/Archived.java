package com.baysheet.store;

/**
 * A change to the model of an archived project: refused, naming the project and its state, until it is
 * un-archived on its settings page. Answered 409 (the project's state, not the input, is in the way).
 */
public final class Archived extends RuntimeException {
    public Archived(String project) {
        super("project " + project + " is archived: its model takes no change until it is un-archived (on its settings page)");
    }
}
