package com.baysheet.store;

import javax.sql.DataSource;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Types;
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
            if (Duplicate.is(e)) throw Duplicate.of(e);
            throw new StoreFailure(e);
        }
    }

    /** Sets a parameter that may be absent (NaN or null becomes SQL NULL). */
    static void setDouble(PreparedStatement ps, int i, Double v) throws SQLException {
        if (v == null || v.isNaN()) ps.setNull(i, Types.DOUBLE);
        else ps.setDouble(i, v);
    }

    /** Reads a nullable DOUBLE PRECISION column: NaN where NULL. */
    static double getDouble(java.sql.ResultSet rs, String col) throws SQLException {
        double v = rs.getDouble(col);
        return rs.wasNull() ? Double.NaN : v;
    }
}
