package com.baysheet.store;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import org.flywaydb.core.Flyway;

import javax.sql.DataSource;
import java.nio.file.Path;

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
        HikariConfig c = new HikariConfig();
        c.setJdbcUrl(jdbcUrl);
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

    /** Applies pending migrations; returns how many ran. Safe to call again. */
    public int migrate() {
        return Flyway.configure().dataSource(pool).locations("classpath:db/migration").load()
                .migrate().migrationsExecuted;
    }

    public DataSource dataSource() { return pool; }

    @Override
    public void close() { pool.close(); }
}
