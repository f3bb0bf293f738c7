package com.baysheet.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.format.DateTimeFormatter;
import java.time.ZoneOffset;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;

/**
 * Backups of the embedded H2 database and their restore. A backup is H2's {@code BACKUP TO}: a zip of the database
 * file that is consistent (every transaction in it whole, none half) while the server goes on writing. Taken
 * through the server's own pool (the administrator's download), through {@link BackupPort} when a server holds the
 * file, or on the file itself when none runs. Restoring unpacks the one file of the zip into a data directory
 * that no server is using; a database already there is kept aside, and replaced only when asked.
 */
public final class Backups {
    /** The one file a backup holds. */
    static final String DB_FILE = "baysheet.mv.db";
    /** H2's error code for a database file that another process has open. */
    private static final int IN_USE = 90020;

    private Backups() {}

    /** The database's name as H2 opens it (the file without its extension). */
    static String databasePath(Path dataDir) {
        return dataDir.toAbsolutePath().normalize().resolve("baysheet").toString();
    }

    /** Writes a consistent copy of the database {@code c} is on (an H2 file database) to {@code zip}. */
    public static void backup(Connection c, Path zip) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.execute("BACKUP TO '" + zip.toAbsolutePath().normalize().toString().replace("'", "''") + "'");
        }
    }

    /** Where a backup of the data directory was taken from. */
    public enum Source { RUNNING_SERVER, FILE }

    /**
     * Backs up the embedded database of {@code dataDir}: through the running server's listener if one is running,
     * otherwise from the file, which is then opened only for the backup.
     */
    public static Source backup(Path dataDir, Path zip) throws IOException, SQLException {
        var url = BackupPort.url(dataDir);
        if (url.isPresent()) {
            Connection c = null;
            try {
                c = DriverManager.getConnection(url.get());
            } catch (SQLException e) {
                // a file left by a server that did not stop cleanly: nobody listens, so the file is free
            }
            if (c != null) {
                try (Connection open = c) {
                    backup(open, zip);
                    return Source.RUNNING_SERVER;
                }
            }
        }
        if (!Files.isRegularFile(dataDir.resolve(DB_FILE)))
            throw new IOException("no Baysheet database in " + dataDir + " (no " + DB_FILE + ")");
        try (Connection c = DriverManager.getConnection(Database.h2Url(dataDir) + ";IFEXISTS=TRUE")) {
            backup(c, zip);
            return Source.FILE;
        }
    }

    /** Whether a server (or anything else) has the data directory's database open now. */
    public static boolean inUse(Path dataDir) {
        if (!Files.isRegularFile(dataDir.resolve(DB_FILE))) return false;
        try (Connection c = DriverManager.getConnection(Database.h2Url(dataDir) + ";IFEXISTS=TRUE")) {
            return false;
        } catch (SQLException e) {
            return e.getErrorCode() == IN_USE || (e.getCause() instanceof SQLException s && s.getErrorCode() == IN_USE)
                    || String.valueOf(e.getMessage()).contains("already in use");
        }
    }

    /**
     * Puts the database of a backup zip into {@code dataDir}. Refuses a directory whose database is open, and one
     * that holds a database unless {@code replace}; a replaced database is kept beside as
     * {@code baysheet.mv.db.replaced-<UTC time>}. Returns the path of the kept file, or null.
     */
    public static Path restore(Path zip, Path dataDir, boolean replace, Instant now) throws IOException {
        if (inUse(dataDir)) throw new IOException("a server is using the database in " + dataDir + ": stop it first");
        Path target = dataDir.resolve(DB_FILE);
        if (Files.exists(target) && !replace)
            throw new IOException(dataDir + " already holds a database: add --force to replace it (it is kept as "
                    + DB_FILE + ".replaced-...)");
        Database.prepareDataDir(dataDir);
        Path part = dataDir.resolve(DB_FILE + ".restoring");
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(zip))) {
            boolean found = false;
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                // only the database file, by its plain name: nothing else is unpacked, and no path leaves the directory
                if (!e.getName().equals(DB_FILE) || found) throw new IOException(zip + " is not a Baysheet backup: it holds " + e.getName());
                Files.copy(in, part, StandardCopyOption.REPLACE_EXISTING);
                found = true;
            }
            if (!found) throw new IOException(zip + " is not a Baysheet backup: it holds no " + DB_FILE);
        } catch (IOException e) {
            Files.deleteIfExists(part);
            throw e;
        }
        Path kept = null;
        if (Files.exists(target)) {
            kept = dataDir.resolve(DB_FILE + ".replaced-" + DateTimeFormatter.ofPattern("uuuuMMdd'T'HHmmss'Z'").format(now.atOffset(ZoneOffset.UTC)));
            Files.move(target, kept);
        }
        Files.move(part, target, StandardCopyOption.ATOMIC_MOVE);
        Database.restrictFiles(dataDir);
        return kept;
    }
}
