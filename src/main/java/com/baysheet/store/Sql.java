package com.baysheet.store;

import org.jdbi.v3.core.ConnectionFactory;
import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.Handles;
import org.jdbi.v3.core.Jdbi;
import org.jdbi.v3.core.JdbiException;
import org.jdbi.v3.core.argument.Argument;

import javax.sql.DataSource;
import java.sql.Connection;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

/**
 * Transactions over the pool; a database fault becomes {@link StoreFailure}, a user's mistake passes through,
 * and a unique constraint refusing a second save of the same value becomes {@link Duplicate} (a 409).
 */
public final class Sql {
    /** Work done on one connection. */
    @FunctionalInterface
    public interface Work<T> {
        T run(Connection c) throws SQLException;
    }

    /**
     * Statements with named binds and row mappers, run on a connection the store already holds: {@link #tx} owns the
     * connection and its one transaction (commit, rollback, close), so a handle neither closes the connection nor
     * ends the transaction. The factory hands Jdbi the connection being wrapped, only while {@link #on} opens it.
     */
    private static final ThreadLocal<Connection> OPENING = new ThreadLocal<>();
    private static final Jdbi JDBI = Jdbi.create(new ConnectionFactory() {
        @Override
        public Connection openConnection() { return OPENING.get(); }

        @Override
        public void closeConnection(Connection c) {
            // the transaction's connection: Sql.tx closes it
        }
    });

    static {
        JDBI.getConfig(Handles.class).setForceEndTransactions(false);
    }

    private final DataSource ds;
    private final Clock clock;

    /** Over the system clock in UTC; tests pass their own clock. */
    public Sql(DataSource ds) {
        this(ds, Clock.systemUTC());
    }

    public Sql(DataSource ds, Clock clock) {
        this.ds = ds;
        this.clock = clock;
    }

    /** The one reading of the time a write stamps on its rows. */
    public Instant now() {
        return clock.instant();
    }

    /** {@link #now()} as the TIMESTAMP WITH TIME ZONE columns take it. */
    public OffsetDateTime stamp() {
        return stamp(now());
    }

    public static OffsetDateTime stamp(Instant at) {
        return OffsetDateTime.ofInstant(at, ZoneOffset.UTC);
    }

    public Clock clock() {
        return clock;
    }

    /**
     * Runs a read of one statement on a connection in auto-commit mode, as the pool hands it out: one statement is
     * its own transaction, so there is nothing to commit, and the connection goes back as it came. For the few reads
     * every page request makes; work of more than one statement goes through {@link #tx}.
     */
    public <T> T readOne(Work<T> work) {
        try (Connection c = ds.getConnection()) {
            if (!c.getAutoCommit()) c.setAutoCommit(true);
            return work.run(c);
        } catch (SQLException e) {
            throw failure(e);
        }
    }

    /** Runs work in one transaction: committed when it returns, rolled back when it throws. */
    public <T> T tx(Work<T> work) {
        try (Connection c = ds.getConnection()) {
            c.setAutoCommit(false);
            try {
                T result = work.run(c);
                c.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                c.rollback();
                throw e;
            }
        } catch (SQLException e) {
            throw failure(e);
        } catch (JdbiException e) {
            // a statement run through a handle: the database's refusal is inside
            if (e.getCause() instanceof SQLException s) throw failure(s);
            throw e;
        }
    }

    private static RuntimeException failure(SQLException e) {
        return Duplicate.is(e) ? Duplicate.of(e) : new StoreFailure(e);
    }

    /**
     * A Jdbi handle on a connection of {@link #tx}: its statements run in that transaction. Closing the handle
     * (try-with-resources) releases its statements and leaves the connection and the transaction as they are.
     */
    public static Handle on(Connection c) {
        OPENING.set(c);
        try {
            return JDBI.open();
        } finally {
            OPENING.remove();
        }
    }

    /** A time bound as the TIMESTAMP WITH TIME ZONE columns take it, by the same JDBC call as a hand-bound one. */
    public static Argument stampOf(Instant at) {
        OffsetDateTime t = stamp(at);
        return (position, statement, ctx) -> statement.setObject(position, t);
    }

    /** A value that may be absent as a bind: NaN or null becomes SQL NULL. */
    static Double orNull(Double v) {
        return v == null || v.isNaN() ? null : v;
    }

    /** Reads a nullable DOUBLE PRECISION column: NaN where NULL. */
    static double getDouble(java.sql.ResultSet rs, String col) throws SQLException {
        double v = rs.getDouble(col);
        return rs.wasNull() ? Double.NaN : v;
    }
}
