package com.baysheet.store;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;

/** The store on the PostgreSQL server named by BAYSHEET_TEST_PG_URL (exported by .ci/run), in a fresh schema per test. */
class PostgresUrlStoreTest extends StoreContract {
    private static String serverUrl;

    @BeforeAll
    static void server() {
        serverUrl = System.getenv(TestDatabases.PG_ENV);
        if (serverUrl == null || serverUrl.isBlank()) {
            String reason = "PostgreSQL store tests skipped: " + TestDatabases.PG_ENV + " is not set (.ci/run sets it)";
            System.out.println(reason);
            Assumptions.abort(reason);
        }
    }

    @Override
    protected String freshUrl() { return TestDatabases.postgresSchema(serverUrl); }
}
