package com.baysheet.store;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import org.flywaydb.core.Flyway;
import org.jdbi.v3.core.Handle;

import javax.sql.DataSource;
import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.Statement;
import java.util.Set;
import java.util.stream.Stream;

/**
 * The connection pool and the schema. The same migrations (classpath:db/migration) run on the embedded
 * H2 file database and on PostgreSQL.
 */
public final class Database implements AutoCloseable {
    private final HikariDataSource pool;

    private Database(HikariDataSource pool) {
        this.pool = pool;
    }

    /** Opens a pool on a JDBC URL (user and password may be in the URL) and brings the schema up to date. */
    public static Database open(String jdbcUrl) {
        return open(jdbcUrl, null);
    }

    /**
     * The same with the password given apart from the URL (null: none, or the URL's own), as it comes from
     * an environment variable or a file rather than the command line, where every user of the machine sees it.
     */
    public static Database open(String jdbcUrl, String password) {
        HikariConfig c = new HikariConfig();
        c.setJdbcUrl(jdbcUrl);
        if (password != null) c.setPassword(password);
        c.setMaximumPoolSize(8);
        c.setPoolName("baysheet");
        Database db = new Database(new HikariDataSource(c));
        db.migrate();
        return db;
    }

    /**
     * The URL of the embedded database under a data directory; H2 in its closest-to-PostgreSQL mode.
     * WRITE_DELAY=0: H2's MVStore then writes every transaction to the file as it commits (by default it
     * writes committed changes in the background up to half a second later, and a killed server lost
     * saves it had already answered; see docs/reliability.md).
     */
    public static String h2Url(Path dataDir) {
        Path file = dataDir.toAbsolutePath().normalize().resolve("baysheet");
        return "jdbc:h2:file:" + file + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;WRITE_DELAY=0";
    }

    private static final Set<PosixFilePermission> OWNER_DIR = PosixFilePermissions.fromString("rwx------");
    private static final Set<PosixFilePermission> OWNER_FILE = PosixFilePermissions.fromString("rw-------");

    /**
     * Creates the data directory if needed and makes it, and the database files already in it, the owner's
     * alone (rwx------ and rw-------): the file holds every project and the password hashes. On a file system
     * without POSIX permissions (Windows) the folder is only created; its access is the system's to set.
     */
    public static void prepareDataDir(Path dir) throws IOException {
        boolean posix = FileSystems.getDefault().supportedFileAttributeViews().contains("posix");
        if (!posix) {
            Files.createDirectories(dir);
            return;
        }
        if (!Files.isDirectory(dir)) Files.createDirectories(dir, PosixFilePermissions.asFileAttribute(OWNER_DIR));
        Files.setPosixFilePermissions(dir, OWNER_DIR); // a folder made by hand, or by an older version, too
        restrictFiles(dir);
    }

    /** The database files under the data directory: the owner's alone (after H2 made them with the umask's bits). */
    public static void restrictFiles(Path dir) throws IOException {
        if (!FileSystems.getDefault().supportedFileAttributeViews().contains("posix") || !Files.isDirectory(dir)) return;
        try (Stream<Path> files = Files.list(dir)) {
            for (Path f : (Iterable<Path>) files::iterator)
                if (Files.isRegularFile(f) && f.getFileName().toString().startsWith("baysheet."))
                    Files.setPosixFilePermissions(f, OWNER_FILE);
        }
    }

    /** Applies pending migrations; returns how many ran. Safe to call again. */
    public int migrate() {
        return Flyway.configure().dataSource(pool).locations("classpath:db/migration").load()
                .migrate().migrationsExecuted;
    }

    public DataSource dataSource() { return pool; }

    /**
     * Whether the database answers a {@code SELECT 1} within {@code timeoutSeconds} (the server's health check): a
     * connection that cannot be had, a closed pool or a statement past its timeout is a no, never an exception.
     */
    public static boolean answers(DataSource ds, int timeoutSeconds) {
        try (Connection c = ds.getConnection(); Handle h = Sql.on(c)) {
            try {
                return h.createQuery("SELECT 1").setQueryTimeout(timeoutSeconds).mapTo(Integer.class).findFirst().orElse(0) == 1;
            } finally {
                // H2 takes a statement's query timeout as its session's (SET QUERY_TIMEOUT), and the pool does not reset
                // it: left, every later statement on this pooled connection past the probe's few seconds would be
                // cancelled (a large save refused with a server error); on PostgreSQL this is the statement's own, a no-op
                try (Statement s = c.createStatement()) {
                    s.setQueryTimeout(0);
                }
            }
        } catch (Exception e) {
            return false;
        }
    }

    @Override
    public void close() { pool.close(); }
}
