package com.baysheet.store;

import org.jdbi.v3.core.Handle;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.sql.Statement;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A Jdbi handle runs in the transaction of Sql.tx: committed with it, rolled back with it, its refusals mapped alike. */
class SqlHandleTest {
    private Database db;
    private Sql sql;

    @BeforeEach
    void open() {
        db = Database.open(TestDatabases.h2());
        sql = new Sql(db.dataSource());
        sql.tx(c -> {
            try (Statement s = c.createStatement()) {
                return s.execute("CREATE TABLE probe (id BIGINT PRIMARY KEY, label VARCHAR(20), weight DOUBLE PRECISION)");
            }
        });
    }

    @AfterEach
    void close() { db.close(); }

    private long count() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT COUNT(*) FROM probe").mapTo(Long.class).one();
            }
        });
    }

    private static int insert(Handle h, long id, double weight) {
        return h.createUpdate("INSERT INTO probe (id, label, weight) VALUES (:id, :label, :weight)")
                .bind("id", id).bind("label", "p" + id).bind("weight", Sql.orNull(weight)).execute();
    }

    @Test
    void aHandleWritesInTheTransactionAndTheConnectionOutlivesIt() {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) { insert(h, 1, 2.5); }
            // the handle is closed; the connection and its transaction go on
            assertThat(c.isClosed()).isFalse();
            assertThat(c.getAutoCommit()).isFalse();
            try (Handle h = Sql.on(c)) { return insert(h, 2, Double.NaN); }
        });
        assertThat(count()).isEqualTo(2);
        Double weight = sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT weight FROM probe WHERE id = 2").mapTo(Double.class).one();
            }
        });
        assertThat(weight).as("NaN is stored as NULL").isNull();
    }

    @Test
    void aFailureAfterAHandleWroteRollsItsRowsBack() {
        assertThatThrownBy(() -> sql.tx(c -> {
            try (Handle h = Sql.on(c)) { insert(h, 1, 1); }
            throw new NotFound("probe", 1);
        })).isInstanceOf(NotFound.class);
        assertThat(count()).isZero();
    }

    @Test
    void aUniqueViolationThroughAHandleIsADuplicateAndAnyOtherRefusalAStoreFailure() {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) { return insert(h, 1, 1); }
        });
        assertThatThrownBy(() -> sql.tx(c -> {
            try (Handle h = Sql.on(c)) { return insert(h, 1, 1); }
        })).isInstanceOf(Duplicate.class);
        assertThatThrownBy(() -> sql.tx(c -> {
            try (Handle h = Sql.on(c)) { return h.createUpdate("INSERT INTO no_such_table (id) VALUES (:id)").bind("id", 1).execute(); }
        })).isInstanceOf(StoreFailure.class);
        assertThat(count()).isEqualTo(1);
    }
}
