package com.baysheet.store;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;

/** Fresh, empty databases for store tests: an H2 memory database, or a new schema on a PostgreSQL server. */
final class TestDatabases {
    private TestDatabases() {}

    /** The environment variable .ci/run exports: a full JDBC URL with user and password. */
    static final String PG_ENV = "BAYSHEET_TEST_PG_URL";

    static String h2() {
        return "jdbc:h2:mem:t" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1";
    }

    /** Creates an empty schema on the server and returns a URL whose connections use it. */
    static String postgresSchema(String serverUrl) {
        String schema = "t" + UUID.randomUUID().toString().replace("-", "").substring(0, 16);
        try (Connection c = DriverManager.getConnection(serverUrl); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create a test schema on " + serverUrl, e);
        }
        return serverUrl + (serverUrl.contains("?") ? "&" : "?") + "currentSchema=" + schema;
    }
}
