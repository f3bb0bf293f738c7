package com.baysheet.store;

import org.testcontainers.junit.jupiter.Container;
import org.testcontainers.junit.jupiter.Testcontainers;
import org.testcontainers.postgresql.PostgreSQLContainer;

/** The store on PostgreSQL 15 from Testcontainers, where a Docker engine is there; skipped cleanly where not. */
@Testcontainers(disabledWithoutDocker = true)
class PostgresContainerStoreTest extends StoreContract {
    @Container
    private static final PostgreSQLContainer PG = new PostgreSQLContainer("postgres:15-alpine");

    @Override
    protected String freshUrl() {
        return TestDatabases.postgresSchema(PG.getJdbcUrl() + "?user=" + PG.getUsername() + "&password=" + PG.getPassword());
    }
}
