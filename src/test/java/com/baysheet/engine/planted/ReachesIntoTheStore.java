package com.baysheet.engine.planted;

import com.baysheet.store.Store;

/** A deliberate fault for LayeringTest: an engine class that depends on the store. Never used by the program. */
public final class ReachesIntoTheStore {
    private ReachesIntoTheStore() {}

    public static Class<?> store() { return Store.class; }
}
