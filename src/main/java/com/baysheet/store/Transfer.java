package com.baysheet.store;

import com.baysheet.auth.Tokens;
import com.baysheet.review.ChainCheck;
import com.baysheet.store.review.AuditTrail;
import org.flywaydb.core.api.MigrationVersion;
import org.jdbi.v3.core.Handle;

import java.nio.file.Files;
import java.nio.file.Path;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;

/**
 * Moves an office from its embedded H2 file onto an empty PostgreSQL database: the target is brought to the same
 * migrations by the normal path ({@link Database#open}), every table is copied in one transaction (parents first),
 * the identity columns are advanced past the largest id copied, and the copy is verified (row counts, every issued
 * PDF against the SHA-256 stored at its issue, the audit chain) before it is committed. The source is only read.
 */
public final class Transfer {
    /** What stopped a transfer, so the command can say which and exit with its code. */
    public enum Stop { SOURCE, TARGET, VERIFICATION }

    /** A transfer refused or failed; the message is one line naming what to do. */
    public static final class Refused extends RuntimeException {
        public final Stop stop;

        Refused(Stop stop, String message) {
            super(message);
            this.stop = stop;
        }
    }

    /** One table's rows on each side. */
    public record Table(String name, long source, long target) {}

    /** What was carried and checked. */
    public record Report(String version, List<Table> tables, int pdfsVerified, int identitiesAdvanced, ChainCheck chain) {}

    private Transfer() {}

    /** @param password the target's password when it is not in the URL (null: none, or the URL's own) */
    public static Report run(Path dataDir, String targetUrl, String password) {
        Path file = dataDir.toAbsolutePath().normalize().resolve("baysheet.mv.db");
        if (!Files.isRegularFile(file) || !Files.isReadable(file))
            throw new Refused(Stop.SOURCE, "no readable Baysheet database in " + dataDir + " (expected " + file.getFileName() + ")");
        // IFEXISTS: never make an empty database where the office was expected; read-only: the source stays as it was
        try (Connection from = open(Stop.SOURCE, Database.h2Url(dataDir) + ";IFEXISTS=TRUE;ACCESS_MODE_DATA=r", null)) {
            Map<String, Long> seeds;
            try (Connection found = open(Stop.TARGET, targetUrl, password)) {
                seeds = seedRows();
                refuseWork(found, seeds); // before migrating: a refused target is left as it was
            }
            try (Database db = Database.open(targetUrl, password)) {
                String version = sameVersion(from, db);
                Report r = copy(from, db, version, seeds);
                ChainCheck chain = new AuditTrail(new Sql(db.dataSource())).verify();
                if (!chain.holds()) throw new Refused(Stop.VERIFICATION, "the audit chain on the target is broken at entry "
                        + chain.brokenAt() + ": " + chain.why());
                return new Report(r.version(), r.tables(), r.pdfsVerified(), r.identitiesAdvanced(), chain);
            }
        } catch (SQLException e) {
            throw new Refused(Stop.TARGET, "the transfer failed: " + e.getMessage());
        }
    }

    private static Connection open(Stop side, String url, String password) {
        Properties p = new Properties();
        if (password != null) p.setProperty("password", password);
        try {
            return DriverManager.getConnection(url, p);
        } catch (SQLException e) {
            throw new Refused(side, (side == Stop.SOURCE ? "cannot open the H2 database (is a server still running on it? "
                    + "stop it first): " : "cannot connect to the target: ") + e.getMessage().lines().findFirst().orElse(""));
        }
    }

    /** The rows the migrations themselves write into a new database (the firm's settings, the audit chain's head). */
    private static Map<String, Long> seedRows() throws SQLException {
        try (Database fresh = Database.open("jdbc:h2:mem:seeds" + java.util.UUID.randomUUID() + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH");
             Connection c = fresh.dataSource().getConnection()) {
            Map<String, Long> out = new LinkedHashMap<>();
            for (String t : TableCopy.ordered(c)) out.put(t, TableCopy.count(c, t));
            return out;
        }
    }

    /** Refuses a target holding any row its migrations did not write: an office's work is never merged or overwritten. */
    private static void refuseWork(Connection c, Map<String, Long> seeds) throws SQLException {
        for (String t : TableCopy.ordered(c)) {
            long n = TableCopy.count(c, t);
            if (n > seeds.getOrDefault(t, 0L)) throw new Refused(Stop.TARGET, "the target is not empty: table " + t + " holds "
                    + n + (n == 1 ? " row" : " rows") + "; transfer only into a new, empty database");
        }
    }

    private static String sameVersion(Connection from, Database to) throws SQLException {
        try (Connection c = to.dataSource().getConnection()) {
            MigrationVersion source = version(from), target = version(c);
            if (!source.equals(target)) throw new Refused(Stop.SOURCE, "the source is at migration " + source + ", the target at "
                    + target + ": start this version of Baysheet once on the data directory (it migrates it), stop it, then transfer");
            return target.getVersion();
        }
    }

    private static MigrationVersion version(Connection c) throws SQLException {
        MigrationVersion max = MigrationVersion.EMPTY;
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT version FROM "
                + TableCopy.quote(TableCopy.HISTORY) + " WHERE success = TRUE AND version IS NOT NULL")) {
            while (rs.next()) {
                MigrationVersion v = MigrationVersion.fromVersion(rs.getString(1));
                if (v.isNewerThan(max)) max = v;
            }
        }
        return max;
    }

    /** One transaction on the target: the migrations' own rows replaced by the source's, every table, identities, checks. */
    private static Report copy(Connection from, Database db, String version, Map<String, Long> seeds) throws SQLException {
        try (Connection to = db.dataSource().getConnection()) {
            to.setAutoCommit(false);
            try {
                refuseWork(to, seeds);
                List<String> tables = TableCopy.ordered(from);
                for (int i = tables.size() - 1; i >= 0; i--) delete(to, tables.get(i)); // children first
                List<Table> copied = new ArrayList<>();
                for (String t : tables) {
                    long n = TableCopy.copy(from, to, t);
                    copied.add(new Table(t, TableCopy.count(from, t), TableCopy.count(to, t)));
                    if (copied.get(copied.size() - 1).source() != n) throw new Refused(Stop.VERIFICATION, "table " + t + ": read " + n
                            + " rows of " + copied.get(copied.size() - 1).source() + "; nothing was kept");
                }
                for (Table t : copied)
                    if (t.source() != t.target()) throw new Refused(Stop.VERIFICATION, "table " + t.name() + ": " + t.source()
                            + " rows on the source, " + t.target() + " on the target; nothing was kept");
                int identities = advanceIdentities(to);
                int pdfs = verifyIssuedPdfs(to);
                to.commit();
                return new Report(version, copied, pdfs, identities, null);
            } catch (SQLException | RuntimeException e) {
                to.rollback();
                throw e;
            }
        }
    }

    private static void delete(Connection c, String table) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.executeUpdate("DELETE FROM " + TableCopy.quote(table));
        }
    }

    /** Every identity column restarts past its largest id, so the next row the server adds takes a new one. */
    private static int advanceIdentities(Connection c) throws SQLException {
        Map<String, String> columns = new LinkedHashMap<>();
        String schema = c.getSchema();
        try (Handle h = Sql.on(c)) {
            h.createQuery("SELECT table_name, column_name FROM information_schema.columns "
                            + "WHERE table_schema = :schema AND is_identity = 'YES' ORDER BY table_name, column_name")
                    .bind("schema", schema).map((rs, ctx) -> new String[] {rs.getString(1), rs.getString(2)})
                    .forEach(tc -> columns.put(tc[0] + "." + tc[1], tc[1]));
        }
        for (var e : columns.entrySet()) {
            String table = e.getKey().substring(0, e.getKey().indexOf('.')), col = TableCopy.quote(e.getValue());
            long next;
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(" + col + "), 0) + 1 FROM "
                    + TableCopy.quote(table))) {
                rs.next();
                next = rs.getLong(1);
            }
            try (Statement s = c.createStatement()) {
                s.execute("ALTER TABLE " + TableCopy.quote(table) + " ALTER COLUMN " + col + " RESTART WITH " + next);
            }
        }
        return columns.size();
    }

    /** Each issued revision's PDF as the target holds it, hashed again and compared with the SHA-256 stored at its issue. */
    private static int verifyIssuedPdfs(Connection c) throws SQLException {
        int n = 0;
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery(
                "SELECT id, pdf, pdf_sha256 FROM sheet_revision WHERE pdf_sha256 IS NOT NULL ORDER BY id")) {
            while (rs.next()) {
                byte[] pdf = rs.getBytes("pdf");
                if (pdf == null || !Tokens.sha256(pdf).equals(rs.getString("pdf_sha256")))
                    throw new Refused(Stop.VERIFICATION, "the issued PDF of revision " + rs.getLong("id") + " does not match the "
                            + "SHA-256 stored at its issue; nothing was kept");
                n++;
            }
        }
        return n;
    }
}
