package com.baysheet.store;

import com.baysheet.framing.Derivation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** Empty database, migrate, load the demo, migrate again on reopening: nothing lost, nothing run twice. */
class MigrationTest {
    static final List<String> TABLES = List.of("project", "grid_line", "building_level", "bay", "firm_occupancy", "firm_state");

    @Test
    void migratingAgainAfterTheDemoLosesNothingOnTheEmbeddedFile(@TempDir Path dir) throws SQLException {
        Map<String, Long> before;
        int members;
        try (Database db = Database.open(Database.h2Url(dir))) {
            assertThat(db.migrate()).isZero();
            Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
            Demo.loadIfEmpty(store);
            before = counts(db);
            members = store.results().of(store.projects().findAll().get(0).id()).derived().members().size();
        }
        try (Database db = Database.open(Database.h2Url(dir))) {
            assertThat(db.migrate()).isZero();
            assertThat(counts(db)).isEqualTo(before);
            Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
            assertThat(Demo.loadIfEmpty(store)).isEmpty();
            assertThat(store.results().of(store.projects().findAll().get(0).id()).derived().members()).hasSize(members);
        }
        assertThat(before.get("project")).isEqualTo(2);
        assertThat(before.get("bay")).isPositive();
    }

    @Test
    void migratingAgainLosesNothingOnPostgresql() throws SQLException {
        String server = System.getenv(TestDatabases.PG_ENV);
        org.junit.jupiter.api.Assumptions.assumeTrue(server != null && !server.isBlank(),
                () -> { System.out.println("PostgreSQL migration test skipped: " + TestDatabases.PG_ENV + " is not set"); return "no PostgreSQL"; });
        String url = TestDatabases.postgresSchema(server);
        Map<String, Long> before;
        try (Database db = Database.open(url)) {
            Demo.loadIfEmpty(Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC()));
            before = counts(db);
        }
        try (Database db = Database.open(url)) {
            assertThat(db.migrate()).isZero();
            assertThat(counts(db)).isEqualTo(before);
        }
    }

    private static Map<String, Long> counts(Database db) throws SQLException {
        Map<String, Long> out = new LinkedHashMap<>();
        try (Connection c = db.dataSource().getConnection(); Statement s = c.createStatement()) {
            for (String t : TABLES)
                try (ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM " + t)) {
                    rs.next();
                    out.put(t, rs.getLong(1));
                }
        }
        return out;
    }
}
