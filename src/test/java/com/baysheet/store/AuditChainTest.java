package com.baysheet.store;

import com.baysheet.review.AuditEvent;
import com.baysheet.review.ChainCheck;
import com.baysheet.store.review.AuditTrail;
import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Test;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The audit trail's hash chain on the real migrations: entries written before V116 are chained by the migration
 * (in Java, with its own copy of the canonical form) so that the application verifies them; a row edited or
 * deleted with plain JDBC is found, and the first broken entry named; concurrent appends still form one chain.
 */
class AuditChainTest {
    @Test
    void entriesFromBeforeTheChainAreChainedByTheMigrationAndVerify() throws Exception {
        String url = TestDatabases.h2();
        Flyway.configure().dataSource(url, null, null).locations("classpath:db/migration").target("111").load().migrate();
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute("INSERT INTO audit_event (occurred_at, actor_id, actor_username, action, subject, detail, address) VALUES "
                    + "(TIMESTAMP WITH TIME ZONE '2025-05-01 09:30:00.123456+02:00', 3, 'jo', 'login', 'user jo', '', '10.0.0.7'), "
                    + "(TIMESTAMP WITH TIME ZONE '2025-05-01 09:31:00+00:00', NULL, 'ünïcode ✓', 'edit', 'project A-1', "
                    + "'grid saved; 3 → 4', '')");
        }
        try (Database db = Database.open(url)) {
            AuditTrail audit = new AuditTrail(new Sql(db.dataSource()));
            assertThat(audit.verify().holds()).as("the migration's genesis verifies with the application's chain").isTrue();
            audit.append(AuditEvent.of(1L, "admin", "login", "user admin", "", "127.0.0.1"));
            ChainCheck after = audit.verify();
            assertThat(after.holds()).isTrue();
            assertThat(after.entries()).isEqualTo(3);
            assertThat(after.headHash()).isEqualTo(audit.all().get(2).hash());
        }
    }

    @Test
    void anEditedRowIsFoundAndTheFirstBrokenEntryNamed() throws Exception {
        String url = TestDatabases.h2();
        try (Database db = Database.open(url)) {
            AuditTrail audit = new AuditTrail(new Sql(db.dataSource()));
            for (int i = 0; i < 5; i++) audit.append(AuditEvent.of(2L, "eng", "edit", "project P-" + i, "load " + i, "10.0.0.1"));
            assertThat(audit.verify().holds()).isTrue();
            long third = audit.all().get(2).id();
            try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
                s.executeUpdate("UPDATE audit_event SET detail = 'load 99' WHERE id = " + third);
            }
            ChainCheck check = audit.verify();
            assertThat(check.holds()).isFalse();
            assertThat(check.brokenAt()).isEqualTo(third);
            assertThat(check.why()).contains("entry " + third);
        }
    }

    @Test
    void aRemovedRowOrACutEndIsFound() throws Exception {
        String url = TestDatabases.h2();
        try (Database db = Database.open(url)) {
            AuditTrail audit = new AuditTrail(new Sql(db.dataSource()));
            for (int i = 0; i < 4; i++) audit.append(AuditEvent.of(2L, "eng", "edit", "project P-" + i, "", ""));
            List<AuditEvent> all = audit.all();
            try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
                s.executeUpdate("DELETE FROM audit_event WHERE id = " + all.get(3).id());
            }
            ChainCheck cut = audit.verify();
            assertThat(cut.holds()).as("the last entry removed: the head names it").isFalse();
            assertThat(cut.why()).contains("head names entry " + all.get(3).id());
            try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
                s.executeUpdate("DELETE FROM audit_event WHERE id = " + all.get(1).id());
            }
            assertThat(audit.verify().brokenAt()).as("the entry after a removed one").isEqualTo(all.get(2).id());
        }
    }

    @Test
    void concurrentAppendsFormOneChain() throws Exception {
        try (Database db = Database.open(TestDatabases.h2())) {
            AuditTrail audit = new AuditTrail(new Sql(db.dataSource()));
            ExecutorService pool = Executors.newFixedThreadPool(6);
            List<Future<?>> done = new ArrayList<>();
            for (int i = 0; i < 120; i++) {
                int n = i;
                done.add(pool.submit(() -> audit.append(AuditEvent.of(null, "u" + (n % 6), "edit", "project " + n, "", ""))));
            }
            for (Future<?> f : done) f.get();
            pool.shutdown();
            ChainCheck check = audit.verify();
            assertThat(check.holds()).as(String.valueOf(check.why())).isTrue();
            assertThat(check.entries()).isEqualTo(120);
        }
    }
}
