package com.baysheet.web.auth;

import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Backups;
import com.baysheet.store.StoreFailure;
import com.baysheet.store.review.AuditTrail;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import javax.sql.DataSource;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.time.Clock;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.HashMap;
import java.util.Map;

/**
 * The administrator's backup download (under /admin): a consistent copy of the embedded database, taken while the
 * office works on ({@link Backups}), written to a temporary file readable by the server alone, streamed, deleted,
 * and recorded in the audit trail. A database server (PostgreSQL) is backed up with its own tools: the page says so.
 */
public record BackupRoutes(DataSource ds, AuditTrail audit, Clock clock) {
    private static final DateTimeFormatter NAME = DateTimeFormatter.ofPattern("uuuuMMdd-HHmm");

    public void install(RoutesConfig r) {
        r.get("/admin/backup", this::page, Admit.ADMINISTRATOR);
        r.post("/admin/backup", this::download, Admit.ADMINISTRATOR);
    }

    void page(Context ctx) {
        Map<String, Object> m = new HashMap<>();
        m.put("embedded", embedded());
        ctx.render("auth/backup", m);
    }

    /** A POST (it writes a file and an audit entry), with {@code confirm=backup} so that an empty POST makes none. */
    void download(Context ctx) throws IOException {
        if (!"backup".equals(ctx.formParam("confirm")))
            throw new InputError("confirm", String.valueOf(ctx.formParam("confirm")), "must be \"backup\" to download a backup");
        if (!embedded()) throw new InputError("confirm", "backup", "this database is a server: back it up with its own tools (pg_dump)");
        Path tmp = Files.createTempFile("baysheet-backup-", ".zip"); // rw------- on POSIX
        try {
            Files.delete(tmp); // BACKUP TO writes the file itself
            try (Connection c = ds.getConnection()) {
                Backups.backup(c, tmp);
            } catch (SQLException e) {
                throw new StoreFailure(e);
            }
            long size = Files.size(tmp);
            User u = Access.user(ctx);
            audit.append(AuditEvent.of(u.id(), u.username(), "backup downloaded", "database", size + " bytes", ctx.ip()));
            ctx.contentType("application/zip");
            ctx.header("Content-Disposition", "attachment; filename=\"baysheet-backup-"
                    + NAME.format(clock.instant().atOffset(ZoneOffset.UTC)) + ".zip\"");
            ctx.header("Content-Length", Long.toString(size));
            Files.copy(tmp, ctx.outputStream());
        } finally {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    private boolean embedded() {
        try (Connection c = ds.getConnection()) {
            return c.getMetaData().getURL().startsWith("jdbc:h2:file:");
        } catch (SQLException e) {
            throw new StoreFailure(e);
        }
    }
}
