package com.baysheet.store;

import com.baysheet.framing.model.Limits;
import org.jdbi.v3.core.Handle;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.Optional;

/**
 * The office's queue of package checking copies, shared by every server on the database. A server claims the
 * oldest waiting job for a lease ({@link PackageJobClaims}), renews the lease by heartbeat while it renders,
 * and stores the PDF or the failure; a cancel is seen by the renderer at its next heartbeat (which then finds
 * its job no longer running for it). Every write that belongs to a renderer names it as the lease's owner, so
 * a server whose lease ran out and was claimed by another can no longer change the job.
 */
public final class PackageJobStore {
    /** Finished jobs kept per project (the newest); older ones and their PDFs are deleted by {@link #prune}. */
    public static final int KEPT = 20;
    private static final int MAX_ERROR = 1000;
    static final String COLUMNS = "id, project_id, level_name, title, file_name, requested_by, state, attempts, done_count, "
            + "total_count, error_text, pdf_sha256, created_at, finished_at";
    /** A renderer's own running job. */
    private static final String MINE = "id = :id AND state = 'running' AND lease_owner = :owner";

    private final Sql sql;
    private final PackageJobClaims claims;

    public PackageJobStore(Sql sql) {
        this.sql = sql;
        this.claims = new PackageJobClaims(sql);
    }

    /**
     * Queues a job; refused ({@link TooBusy}, a 429 naming the limit) when the office already has
     * {@link Limits#MAX_QUEUED_PACKAGES} queued or running.
     */
    public long enqueue(PackageJob.Request r) {
        Limits.count("package", r.total(), Limits.MAX_PACKAGE_SHEETS, "member sheets in one package");
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                // counted under a lock of the firm's one state row: two requests at once, on one server or two,
                // cannot both take the last place in the queue
                h.createQuery("SELECT id FROM firm_state WHERE id = 1 FOR UPDATE").mapTo(Integer.class).findOne();
                int waiting = h.createQuery("SELECT COUNT(*) FROM package_job WHERE state IN ('queued', 'running')")
                        .mapTo(Integer.class).one();
                if (waiting >= Limits.MAX_QUEUED_PACKAGES)
                    throw new TooBusy("packageQueue", "at most " + Limits.MAX_QUEUED_PACKAGES + " packages are rendered or "
                            + "waiting at once in the office (limit packageQueue); try again in a minute", 60);
                return h.createUpdate("INSERT INTO package_job (project_id, level_name, title, file_name, requested_by, state, "
                                + "attempts, done_count, total_count, created_at) VALUES (:project, :level, :title, :fileName, "
                                + ":requestedBy, 'queued', 0, 0, :total, :createdAt)")
                        .bind("project", r.project()).bind("level", r.level()).bind("title", r.title())
                        .bind("fileName", r.fileName()).bind("requestedBy", r.requestedBy()).bind("total", r.total())
                        .bind("createdAt", Sql.stampOf(sql.now()))
                        .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
            }
        });
    }

    /**
     * The oldest job waiting, or running under a lease that has run out (its server stopped mid-render), now
     * running for {@code owner} until {@code lease} from now; empty when there is none.
     */
    public Optional<PackageJob> claim(String owner, Duration lease) {
        return claims.claim(owner, lease);
    }

    /**
     * Renews the owner's lease and records the progress; false when the job is no longer running for this owner
     * (cancelled, or claimed by another after the lease ran out): the renderer stops.
     */
    public boolean heartbeat(long id, String owner, Duration lease, int done, int total) {
        Instant now = sql.now();
        return mine(id, owner, "SET lease_until = :until, heartbeat_at = :now, done_count = :done, total_count = :total", h -> h
                .bind("until", Sql.stampOf(now.plus(lease))).bind("now", Sql.stampOf(now)).bind("done", done).bind("total", total));
    }

    /** Stores the rendered PDF and its hash: done. False (and nothing stored) when the job is no longer the owner's. */
    public boolean finish(long id, String owner, Path pdf, String sha256) {
        try (InputStream in = Files.newInputStream(pdf)) {
            int length = Math.toIntExact(Files.size(pdf));
            return mine(id, owner, "SET state = 'done', pdf = :pdf, pdf_sha256 = :sha, done_count = total_count, "
                    + "finished_at = :now, lease_owner = NULL, lease_until = NULL", h -> h
                    .bindBinaryStream("pdf", in, length).bind("sha", sha256).bind("now", Sql.stampOf(sql.now())));
        } catch (IOException e) {
            throw new UncheckedIOException("the rendered package could not be read back: " + e.getMessage(), e);
        }
    }

    /** Records why the render failed. False when the job is no longer the owner's. */
    public boolean fail(long id, String owner, String message) {
        String m = message == null || message.isBlank() ? "the package could not be rendered" : message;
        String kept = m.length() > MAX_ERROR ? m.substring(0, MAX_ERROR) : m;
        return mine(id, owner, "SET state = 'failed', error_text = :error, finished_at = :now, lease_owner = NULL, "
                + "lease_until = NULL", h -> h.bind("error", kept).bind("now", Sql.stampOf(sql.now())));
    }

    /** Puts the owner's job back in the queue (its server is stopping), not counting the claim as an attempt. */
    public boolean release(long id, String owner) {
        return mine(id, owner, "SET state = 'queued', lease_owner = NULL, lease_until = NULL, done_count = 0, "
                + "attempts = attempts - 1", h -> h);
    }

    /** Cancels a queued or running job of the project; false when it has finished (or is not the project's). */
    public boolean cancel(long project, long id) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createUpdate("UPDATE package_job SET state = 'cancelled', finished_at = :now, lease_owner = NULL, "
                                + "lease_until = NULL WHERE id = :id AND project_id = :project AND state IN ('queued', 'running')")
                        .bind("now", Sql.stampOf(sql.now())).bind("id", id).bind("project", project).execute() == 1;
            }
        });
    }

    /** Deletes the project's finished jobs (and their PDFs) older than the newest {@link #KEPT}; how many went. */
    public int prune(long project) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                Optional<Long> oldestKept = h.createQuery("SELECT id FROM package_job WHERE project_id = :project "
                                + "AND state IN ('done', 'failed', 'cancelled') ORDER BY id DESC LIMIT 1 OFFSET " + (KEPT - 1))
                        .bind("project", project).mapTo(Long.class).findOne();
                if (oldestKept.isEmpty()) return 0;
                return h.createUpdate("DELETE FROM package_job WHERE project_id = :project AND id < :oldest "
                                + "AND state IN ('done', 'failed', 'cancelled')")
                        .bind("project", project).bind("oldest", oldestKept.get()).execute();
            }
        });
    }

    /** A job of the project, whatever its state. */
    public Optional<PackageJob> find(long project, long id) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT " + COLUMNS + " FROM package_job WHERE id = :id AND project_id = :project")
                        .bind("id", id).bind("project", project).map(PackageJobClaims::job).findOne();
            }
        });
    }

    /** The rendered PDF of a done job of the project. */
    public Optional<byte[]> pdf(long project, long id) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT pdf FROM package_job WHERE id = :id AND project_id = :project AND state = 'done'")
                        .bind("id", id).bind("project", project).mapTo(byte[].class).findOne();
            }
        });
    }

    private interface Binds {
        org.jdbi.v3.core.statement.Update bind(org.jdbi.v3.core.statement.Update u);
    }

    /** Runs an update of the owner's own running job; whether it was still theirs. */
    private boolean mine(long id, String owner, String set, Binds binds) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return binds.bind(h.createUpdate("UPDATE package_job " + set + " WHERE " + MINE)
                        .bind("id", id).bind("owner", owner)).execute() == 1;
            }
        });
    }
}
