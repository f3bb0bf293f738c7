package com.baysheet.store;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.StatementContext;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Optional;

/**
 * Claiming the next package job so that two servers never render the same one. On PostgreSQL the candidate row
 * is locked with {@code FOR UPDATE SKIP LOCKED}, so a second claimer passes over it to the next instead of
 * waiting; on H2 (one process holds the file) the conditional update alone decides: of two claimers, the one
 * whose {@code UPDATE ... WHERE state = 'queued'} changes a row has it. Either way the update repeats the
 * condition, so a claim never takes a job another claim has just taken.
 */
final class PackageJobClaims {
    /** Claims of one job after which a job that stopped its server every time is failed rather than claimed again. */
    static final int MAX_ATTEMPTS = 3;
    /** Candidates an H2 claim tries in turn (the others are being taken by concurrent claimers). */
    private static final int CANDIDATES = 8;
    private static final String CLAIMABLE = "(state = 'queued' OR (state = 'running' AND lease_until < :now))";

    private final Sql sql;

    PackageJobClaims(Sql sql) {
        this.sql = sql;
    }

    Optional<PackageJob> claim(String owner, Duration lease) {
        if (owner == null || owner.isBlank()) throw new IllegalArgumentException("owner: a claim names its server");
        return sql.tx(c -> {
            Instant now = sql.now();
            try (Handle h = Sql.on(c)) {
                wornOut(h, now);
                List<Long> candidates = postgres(c)
                        ? h.createQuery("SELECT id FROM package_job WHERE " + CLAIMABLE + " ORDER BY id LIMIT 1 FOR UPDATE SKIP LOCKED")
                            .bind("now", Sql.stampOf(now)).mapTo(Long.class).list()
                        : h.createQuery("SELECT id FROM package_job WHERE " + CLAIMABLE + " ORDER BY id LIMIT " + CANDIDATES)
                            .bind("now", Sql.stampOf(now)).mapTo(Long.class).list();
                for (long id : candidates) {
                    int taken = h.createUpdate("UPDATE package_job SET state = 'running', lease_owner = :owner, lease_until = :until, "
                                    + "heartbeat_at = :now, attempts = attempts + 1, done_count = 0 WHERE id = :id AND " + CLAIMABLE)
                            .bind("owner", owner).bind("until", Sql.stampOf(now.plus(lease))).bind("now", Sql.stampOf(now))
                            .bind("id", id).execute();
                    if (taken == 1)
                        return h.createQuery("SELECT " + PackageJobStore.COLUMNS + " FROM package_job WHERE id = :id")
                                .bind("id", id).map(PackageJobClaims::job).findOne();
                }
                return Optional.<PackageJob>empty();
            }
        });
    }

    /** Fails the jobs whose lease ran out after {@link #MAX_ATTEMPTS} claims: each stopped its server mid-render. */
    private static void wornOut(Handle h, Instant now) {
        h.createUpdate("UPDATE package_job SET state = 'failed', error_text = :error, finished_at = :now, lease_owner = NULL, "
                        + "lease_until = NULL WHERE state = 'running' AND lease_until < :now AND attempts >= :max")
                .bind("error", "the rendering stopped " + MAX_ATTEMPTS + " times without finishing (the server stopped or "
                        + "ran out of memory each time); a smaller package, one level, may render")
                .bind("now", Sql.stampOf(now)).bind("max", MAX_ATTEMPTS).execute();
    }

    private static boolean postgres(Connection c) throws SQLException {
        return c.getMetaData().getDatabaseProductName().toLowerCase().contains("postgres");
    }

    static PackageJob job(ResultSet rs, StatementContext ctx) throws SQLException {
        return new PackageJob(rs.getLong("id"), rs.getLong("project_id"), rs.getString("level_name"), rs.getString("title"),
                rs.getString("file_name"), rs.getString("requested_by"), PackageJob.State.of(rs.getString("state")),
                rs.getInt("attempts"), rs.getInt("done_count"), rs.getInt("total_count"), rs.getString("error_text"),
                rs.getString("pdf_sha256"), instant(rs, "created_at"), instant(rs, "finished_at"));
    }

    private static Instant instant(ResultSet rs, String column) throws SQLException {
        OffsetDateTime t = rs.getObject(column, OffsetDateTime.class);
        return t == null ? null : t.toInstant();
    }
}
