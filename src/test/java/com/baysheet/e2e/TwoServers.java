package com.baysheet.e2e;

import org.junit.jupiter.api.Assumptions;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Two shipped servers (A and B, each a process of its own) on one PostgreSQL database, as an office runs them behind
 * a proxy: a fresh schema of their own on the server of BAYSHEET_TEST_PG_URL, the password passed in the environment
 * (BAYSHEET_DB_PASSWORD) rather than on the command line. A starts first, loads the demo and migrates; the
 * administrator is set up on A with the code A printed, an engineer added there; B then starts on the same database
 * and everyone logs in on each server. Skipped, saying why, when BAYSHEET_TEST_PG_URL is not set.
 */
final class TwoServers implements AutoCloseable {
    static final String PG_ENV = "BAYSHEET_TEST_PG_URL";
    static final String PASSWORD = "two servers one office 17";
    private static final Pattern PASSWORD_PARAM = Pattern.compile("([?&])password=([^&]*)");

    final ChildServer a;
    final ChildServer b;
    final OfficeClient engineerA;
    final OfficeClient engineerB;
    final OfficeClient adminB;
    /** The test's own way into the database (with the password), on the servers' schema. */
    private final String testUrl;
    private final String adminUrl;
    private final String schema;

    private TwoServers(ChildServer a, ChildServer b, OfficeClient engineerA, OfficeClient engineerB, OfficeClient adminB,
                       String testUrl, String adminUrl, String schema) {
        this.a = a;
        this.b = b;
        this.engineerA = engineerA;
        this.engineerB = engineerB;
        this.adminB = adminB;
        this.testUrl = testUrl;
        this.adminUrl = adminUrl;
        this.schema = schema;
    }

    /** The PostgreSQL server's URL, or the test is skipped with the reason printed. */
    static String serverUrl() {
        String url = System.getenv(PG_ENV);
        if (url == null || url.isBlank()) {
            String why = PG_ENV + " is not set: the test of two servers on one PostgreSQL database is skipped (.ci/run sets it)";
            System.out.println(why);
            Assumptions.abort(why);
        }
        return url;
    }

    /** Starts both servers on a fresh schema; {@code jvmOptions} are given to both (such as the package lease). */
    static TwoServers start(Path dir, String serverUrl, List<String> jvmOptions) throws Exception {
        String schema = "two" + UUID.randomUUID().toString().replace("-", "").substring(0, 12);
        try (Connection c = DriverManager.getConnection(serverUrl); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        }
        String testUrl = serverUrl + (serverUrl.contains("?") ? "&" : "?") + "currentSchema=" + schema;
        // the servers get the URL without its password, and the password as an office passes it: in the environment
        Matcher m = PASSWORD_PARAM.matcher(testUrl);
        String password = m.find() ? java.net.URLDecoder.decode(m.group(2), java.nio.charset.StandardCharsets.UTF_8) : null;
        String serverSide = m.replaceFirst("$1").replace("?&", "?").replace("&&", "&");
        Map<String, String> env = password == null ? Map.of() : Map.of("BAYSHEET_DB_PASSWORD", password);
        List<String> options = List.of("--db-url", serverSide);
        ChildServer a = null, b = null;
        try {
            a = ChildServer.start(dir.resolve("a"), true, jvmOptions, options, env);
            OfficeClient admin = new OfficeClient(a.base()).setUp("admin", PASSWORD, a.setupCode());
            admin.addUser("erin", "engineer", PASSWORD);
            b = ChildServer.start(dir.resolve("b"), false, jvmOptions, options, env);
            return new TwoServers(a, b, new OfficeClient(a.base()).logIn("erin", PASSWORD),
                    new OfficeClient(b.base()).logIn("erin", PASSWORD), new OfficeClient(b.base()).logIn("admin", PASSWORD),
                    testUrl, serverUrl, schema);
        } catch (Exception | AssertionError e) {
            String logs = (a == null ? "" : "\nserver A:\n" + a.logText()) + (b == null ? "" : "\nserver B:\n" + b.logText());
            if (b != null) b.close();
            if (a != null) a.close();
            dropSchema(serverUrl, schema);
            throw new IllegalStateException("starting two servers on one database failed" + logs, e);
        }
    }

    /** A connection of the test's own to the servers' schema. */
    Connection db() throws SQLException {
        return DriverManager.getConnection(testUrl);
    }

    /** Sends a signal to a server (STOP: it freezes where it is, holding what it holds; CONT: it goes on). */
    static void signal(ChildServer s, String name) throws IOException, InterruptedException {
        Process kill = new ProcessBuilder("kill", "-" + name, String.valueOf(s.process.pid())).redirectErrorStream(true).start();
        String out = new String(kill.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        if (!kill.waitFor(30, TimeUnit.SECONDS) || kill.exitValue() != 0)
            throw new IllegalStateException("kill -" + name + " " + s.process.pid() + " failed: " + out);
    }

    /** Both servers' consoles, for a failure's message. */
    String logs() {
        return "server A (" + a.log + "):\n" + a.logText() + "\nserver B (" + b.log + "):\n" + b.logText();
    }

    @Override
    public void close() throws Exception {
        List<Exception> failed = new ArrayList<>();
        for (ChildServer s : List.of(a, b)) {
            try {
                if (s.process.isAlive()) signal(s, "CONT"); // a stopped process would not act on the request to stop
                s.close();
            } catch (Exception e) {
                failed.add(e);
            }
        }
        dropSchema(adminUrl, schema);
        if (!failed.isEmpty()) throw failed.get(0);
    }

    private static void dropSchema(String serverUrl, String schema) {
        try (Connection c = DriverManager.getConnection(serverUrl); Statement s = c.createStatement()) {
            s.execute("DROP SCHEMA IF EXISTS " + schema + " CASCADE");
        } catch (SQLException e) {
            System.out.println("the test schema " + schema + " was left on the server: " + e.getMessage());
        }
    }
}
