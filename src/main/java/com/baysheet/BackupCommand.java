package com.baysheet;

import com.baysheet.review.ChainCheck;
import com.baysheet.store.Backups;
import com.baysheet.store.Database;
import com.baysheet.store.Sql;
import com.baysheet.store.review.AuditTrail;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.Map;

/**
 * {@code baysheet backup FILE [--data DIR] [--force]}: a consistent copy of the embedded database, taken while the
 * server runs (or from the file when none does). {@code baysheet restore FILE --data DIR [--force]}: puts a backup
 * back into a data directory no server is using, then opens it and verifies its audit chain. {@code --force}
 * overwrites an existing backup file, or replaces a database already in the directory (kept beside). Exit 0 done,
 * 1 refused or failed (one line on standard error), 2 usage. PostgreSQL is backed up with its own tools.
 */
public final class BackupCommand {
    public static final int OK = 0, FAILED = 1, USAGE = 2;
    static final String HELP = "usage: java -jar baysheet.jar backup FILE.zip [--data DIR] [--force]\n"
            + "       java -jar baysheet.jar restore FILE.zip --data DIR [--force]";

    private BackupCommand() {}

    /** @param args the arguments after {@code backup} or {@code restore} */
    public static int run(boolean restore, String[] args, Map<String, String> env, PrintStream out, PrintStream err) {
        String file = null, data = env.getOrDefault("BAYSHEET_DATA", "baysheet-data");
        boolean force = false, dataGiven = false;
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--force" -> force = true;
                case "--data" -> {
                    if (++i == args.length) return usage(err, "--data needs a directory");
                    data = args[i];
                    dataGiven = true;
                }
                default -> {
                    if (args[i].startsWith("--") || file != null) return usage(err, "unknown argument " + args[i]);
                    file = args[i];
                }
            }
        }
        if (file == null) return usage(err, "name the backup file");
        if (restore && !dataGiven) return usage(err, "restore needs --data DIR, the directory to restore into");
        String dbUrl = env.get("BAYSHEET_DB_URL");
        if (dbUrl != null && !dbUrl.isBlank() && !dbUrl.startsWith("jdbc:h2:file:")) {
            err.println("baysheet: BAYSHEET_DB_URL names a database server: back it up with its own tools (PostgreSQL: pg_dump; "
                    + "see docs/reliability.md)");
            return FAILED;
        }
        Path zip = Path.of(file).toAbsolutePath().normalize();
        Path dir = Path.of(data).toAbsolutePath().normalize();
        try {
            return restore ? restore(zip, dir, force, out) : backup(zip, dir, force, out);
        } catch (IOException | SQLException | RuntimeException e) {
            err.println("baysheet: " + (restore ? "restore" : "backup") + " failed: " + e.getMessage());
            return FAILED;
        }
    }

    private static int backup(Path zip, Path dir, boolean force, PrintStream out) throws IOException, SQLException {
        if (Files.exists(zip) && !force) throw new IOException(zip + " exists: add --force to overwrite it");
        Files.deleteIfExists(zip);
        Backups.Source from = Backups.backup(dir, zip);
        out.println("backup written: " + zip + " (" + Files.size(zip) + " bytes), a consistent copy of " + dir
                + (from == Backups.Source.RUNNING_SERVER ? ", taken from the running server" : ", taken from the file (no server running)"));
        return OK;
    }

    private static int restore(Path zip, Path dir, boolean force, PrintStream out) throws IOException, SQLException {
        if (!Files.isRegularFile(zip)) throw new IOException("no backup file " + zip);
        Path kept = Backups.restore(zip, dir, force, Instant.now());
        if (kept != null) out.println("the database that was there is kept as " + kept);
        try (Database db = Database.open(Database.h2Url(dir))) {
            ChainCheck chain = new AuditTrail(new Sql(db.dataSource())).verify();
            out.println("restored into " + dir + ": " + projects(db) + " projects; audit chain "
                    + (chain.holds() ? "verified (" + chain.entries() + " entries, head " + chain.headHash() + ")"
                    : "BROKEN at entry " + chain.brokenAt() + ": " + chain.why()));
            return chain.holds() ? OK : FAILED;
        }
    }

    private static long projects(Database db) throws SQLException {
        try (Connection c = db.dataSource().getConnection(); Statement s = c.createStatement();
             ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM project")) {
            rs.next();
            return rs.getLong(1);
        }
    }

    private static int usage(PrintStream err, String why) {
        err.println("baysheet: " + why);
        err.println(HELP);
        return USAGE;
    }
}
