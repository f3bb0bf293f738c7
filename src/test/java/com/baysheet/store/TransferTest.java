package com.baysheet.store;

import com.baysheet.TransferCommand;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.baysheet.project.ProjectInfo;
import com.baysheet.engine.units.UnitSystem;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Clob;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;

/** The move from an office's H2 file onto PostgreSQL (BAYSHEET_TEST_PG_URL), each test into a fresh schema. */
class TransferTest {
    @TempDir
    static Path data;
    private static String server;
    private static User[] users;

    @BeforeAll
    static void office() throws Exception {
        server = System.getenv(TestDatabases.PG_ENV);
        if (server == null || server.isBlank()) {
            String reason = "transfer tests skipped: " + TestDatabases.PG_ENV + " is not set (.ci/run sets it)";
            System.out.println(reason);
            Assumptions.abort(reason);
        }
        users = TransferOffice.load(data);
    }

    @Test
    void theDemoOfficeMovesWhole_EveryIssuedPdfVerified_AndTheTargetTakesNewWork() throws Exception {
        String target = TestDatabases.postgresSchema(server);
        Run run = transfer(target);
        assertThat(run.code).as(run.err).isEqualTo(TransferCommand.OK);
        Map<String, List<String>> source = contents(Database.h2Url(data) + ";IFEXISTS=TRUE"), copied = contents(target);
        assertThat(copied.keySet()).containsExactlyInAnyOrderElementsOf(source.keySet());
        for (String t : source.keySet()) assertThat(copied.get(t)).as("table " + t + ", row by row").isEqualTo(source.get(t));
        assertThat(source.get("sheet_revision")).as("issued revisions").hasSizeGreaterThanOrEqualTo(3);
        assertThat(source.get("markup")).isNotEmpty();
        assertThat(source.get("markup_reply")).isNotEmpty();
        assertThat(source.get("audit_event")).hasSizeGreaterThan(10);
        assertThat(String.join("\n", source.get("building_level"))).contains("eave_to_ridge=NaN");
        assertThat(run.out).contains("sheet_revision").contains("3 issued PDFs");

        // every issued PDF on the target hashes to the SHA-256 stored when it was issued
        int pdfs = 0;
        try (Connection c = DriverManager.getConnection(target); Statement s = c.createStatement();
             ResultSet rs = s.executeQuery("SELECT pdf, pdf_sha256 FROM sheet_revision WHERE pdf_sha256 IS NOT NULL")) {
            while (rs.next()) {
                assertThat(Tokens.sha256(rs.getBytes(1))).isEqualTo(rs.getString(2));
                assertThat(new String(rs.getBytes(1), 0, 5, StandardCharsets.US_ASCII)).isEqualTo("%PDF-");
                pdfs++;
            }
        }
        assertThat(pdfs).isEqualTo(3);

        // a server on the target saves a model change, makes a project and issues a revision: new ids, no collision
        try (Database db = Database.open(target)) {
            TransferOffice o = TransferOffice.over(db, users[0], users[1]);
            long project = o.store.projects().findAll().get(0).id();
            o.store.levels().add(Editor.DEMO, project, o.store.projects().find(project).version(), ModelJson.level(
                    new ObjectMapper().readTree("{\"name\": \"Penthouse roof\", \"elevation\": 52, \"roof\": true, \"roofSlope\": 0.25}")));
            long made = o.store.projects().create(Editor.DEMO, new ProjectInfo("T-9", "After the move", "", "", "ASCE 7-16",
                    UnitSystem.US, false, false)).id();
            assertThat(made).isGreaterThan(maxId(source.get("project")));
            o.issue(project, 3, true);
            assertThat(o.review.audit().verify().holds()).as("the audit chain goes on from the copied head").isTrue();
        }
        assertThat(contents(target).get("sheet_revision")).hasSize(source.get("sheet_revision").size() + 1);
    }

    @Test
    void aTargetHoldingWorkIsRefusedAndLeftAsItWas() throws Exception {
        String target = TestDatabases.postgresSchema(server);
        try (Database db = Database.open(target)) {
            new ProjectStore(new ModelWrites(new Sql(db.dataSource()), com.baysheet.framing.Derivation::derive)).create(Editor.DEMO,
                    new ProjectInfo("J-7", "Work already here", "", "", "ASCE 7-16", UnitSystem.US, false, false));
        }
        Map<String, List<String>> before = contents(target);
        Run run = transfer(target);
        assertThat(run.code).isEqualTo(TransferCommand.TARGET);
        assertThat(run.err).startsWith("baysheet: transfer refused: the target is not empty: table ")
                .endsWith("; transfer only into a new, empty database" + System.lineSeparator()).hasLineCount(1);
        assertThat(contents(target)).isEqualTo(before);
    }

    @Test
    void aSecondTransferIntoTheSameDatabaseIsRefused() throws Exception {
        String target = TestDatabases.postgresSchema(server);
        assertThat(transfer(target).code).isEqualTo(TransferCommand.OK);
        Map<String, List<String>> before = contents(target);
        Run again = transfer(target);
        assertThat(again.code).isEqualTo(TransferCommand.TARGET);
        assertThat(again.err).contains("the target is not empty: table ").doesNotContain("Exception");
        assertThat(contents(target)).isEqualTo(before);
    }

    @Test
    void aDirectoryWithoutAnOfficeIsRefusedNamingIt(@TempDir Path empty) {
        Run run = run("--from", empty.toString(), "--to", TestDatabases.postgresSchema(server));
        assertThat(run.code).isEqualTo(TransferCommand.SOURCE);
        assertThat(run.err).contains("no readable Baysheet database in " + empty).hasLineCount(1);
    }

    @Test
    void anIssuedPdfThatNoLongerMatchesItsHashFailsTheTransferAndNothingIsKept(@TempDir Path copy) throws Exception {
        java.nio.file.Files.copy(data.resolve("baysheet.mv.db"), copy.resolve("baysheet.mv.db"));
        try (Connection c = DriverManager.getConnection(Database.h2Url(copy) + ";IFEXISTS=TRUE"); Statement s = c.createStatement()) {
            // one byte of one issued copy changed after its issue, as damage on disk would
            assertThat(s.executeUpdate("UPDATE sheet_revision SET pdf = pdf || X'20' WHERE id = (SELECT MIN(id) FROM sheet_revision "
                    + "WHERE pdf_sha256 IS NOT NULL)")).isEqualTo(1);
        }
        String target = TestDatabases.postgresSchema(server);
        Run run = run("--from", copy.toString(), "--to", target);
        assertThat(run.code).isEqualTo(TransferCommand.VERIFICATION);
        assertThat(run.err).contains("does not match the SHA-256 stored at its issue; nothing was kept").hasLineCount(1);
        Map<String, List<String>> left = contents(target);
        assertThat(left.get("project")).isEmpty();
        assertThat(left.get("sheet_revision")).isEmpty();
        assertThat(left.get("audit_event")).isEmpty();
    }

    @Test
    void aSourceAtAnotherMigrationIsRefusedSayingBoth(@TempDir Path older) throws Exception {
        Database.prepareDataDir(older);
        Database.open(Database.h2Url(older)).close();
        List<Integer> versions = new java.util.ArrayList<>();
        try (Connection c = DriverManager.getConnection(Database.h2Url(older) + ";IFEXISTS=TRUE"); Statement s = c.createStatement()) {
            try (var rs = s.executeQuery("SELECT version FROM flyway_schema_history WHERE version IS NOT NULL")) {
                while (rs.next()) versions.add(Integer.parseInt(rs.getString(1)));
            }
            versions.sort(null);
            int newest = versions.get(versions.size() - 1);
            // as a data directory one release behind: its newest migration not yet applied
            s.executeUpdate("DELETE FROM flyway_schema_history WHERE version = '" + newest + "'");
        }
        int newest = versions.get(versions.size() - 1), before = versions.get(versions.size() - 2);
        Run run = run("--from", older.toString(), "--to", TestDatabases.postgresSchema(server));
        assertThat(run.code).isEqualTo(TransferCommand.SOURCE);
        assertThat(run.err).contains("the source is at migration " + before + ", the target at " + newest).hasLineCount(1);
    }

    private record Run(int code, String out, String err) {}

    private static Run transfer(String target) {
        return run("--from", data.toString(), "--to", target);
    }

    private static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(), err = new ByteArrayOutputStream();
        int code = TransferCommand.run(args, Map.of(), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static long maxId(List<String> rows) {
        return rows.stream().mapToLong(r -> Long.parseLong(r.replaceAll("(?s).*\\bid=(\\d+).*", "$1"))).max().orElse(0);
    }

    /** Every table but Flyway's, each row as its columns by name with database-neutral values, the rows sorted. */
    static Map<String, List<String>> contents(String url) throws SQLException {
        Map<String, List<String>> out = new LinkedHashMap<>();
        try (Connection c = DriverManager.getConnection(url)) {
            for (String t : TableCopy.ordered(c)) {
                List<String> rows = new ArrayList<>();
                try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT * FROM " + TableCopy.quote(t))) {
                    ResultSetMetaData md = rs.getMetaData();
                    while (rs.next()) {
                        Map<String, String> row = new TreeMap<>();
                        for (int i = 1; i <= md.getColumnCount(); i++) row.put(md.getColumnName(i).toLowerCase(), neutral(rs.getObject(i)));
                        rows.add(row.toString());
                    }
                }
                rows.sort(null);
                out.put(t, rows);
            }
        }
        return out;
    }

    private static String neutral(Object v) throws SQLException {
        if (v == null) return "NULL";
        if (v instanceof byte[] b) return "bytes:" + HexFormat.of().formatHex(b);
        if (v instanceof Clob c) return c.getSubString(1, (int) c.length());
        if (v instanceof java.sql.Timestamp ts) return ts.toInstant().toString();
        if (v instanceof OffsetDateTime t) return t.toInstant().toString();
        if (v instanceof Integer || v instanceof Short || v instanceof Long) return String.valueOf(((Number) v).longValue());
        return v.toString();
    }
}
