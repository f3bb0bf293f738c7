package com.baysheet.store;

/** The store on the embedded H2 database, in the mode the server uses. */
class H2StoreTest extends StoreContract {
    @Override
    protected String freshUrl() { return TestDatabases.h2(); }
}
