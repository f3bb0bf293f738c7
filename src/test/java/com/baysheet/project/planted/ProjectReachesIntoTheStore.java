package com.baysheet.project.planted;

import com.baysheet.store.Store;

/** A deliberate fault for LayeringTest: a project model class that depends on the store. Never used by the program. */
public final class ProjectReachesIntoTheStore {
    private ProjectReachesIntoTheStore() {}

    public static Class<?> store() { return Store.class; }
}
