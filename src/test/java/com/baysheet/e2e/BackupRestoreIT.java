package com.baysheet.e2e;

import com.baysheet.store.Editor;

import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.project.ProjectInfo;
import com.baysheet.store.Store;
import com.baysheet.engine.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.net.http.HttpResponse;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * H2's two online backups of the embedded database, taken while the pool is open and in use: {@code BACKUP TO}
 * (a zip of the database file, restored by unzipping it as the data directory's file) and {@code SCRIPT TO}
 * (SQL, restored with {@code RUNSCRIPT FROM} into an empty database). Both give back the state at the backup,
 * and the shipped jar, started on the restored data directory, serves it without migrating or repairing anything.
 */
class BackupRestoreIT {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    void backupToZipRestoresTheStateAtTheBackup() throws Exception {
        Path data = dir.resolve("data");
        Files.createDirectories(data);
        Path zip = dir.resolve("baysheet-backup.zip");
        String atBackup;
        try (Database db = Database.open(Database.h2Url(data))) {
            Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
            Demo.loadIfEmpty(store);
            atBackup = projects(db);
            sql(db, "BACKUP TO '" + zip.toAbsolutePath() + "'");
            store.projects().create(Editor.DEMO, new ProjectInfo("AFTER-1", "Saved after the backup", "", "", "ASCE 7-16", UnitSystem.US, false, false));
            assertThat(projects(db)).isNotEqualTo(atBackup);
        }
        Path restored = dir.resolve("restored");
        unzip(zip, restored);
        try (Database db = Database.open(Database.h2Url(restored))) {
            assertThat(projects(db)).isEqualTo(atBackup);
            Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
            long first = store.projects().findAll().get(0).id();
            assertThat(store.results().of(first).derived().members()).as("the restored demo derives its members").isNotEmpty();
        }
        servedByTheJar(restored, atBackup);
    }

    @Test
    void scriptToRestoresIntoAnEmptyDatabase() throws Exception {
        Path data = dir.resolve("data");
        Files.createDirectories(data);
        Path script = dir.resolve("baysheet-backup.sql");
        String atBackup;
        try (Database db = Database.open(Database.h2Url(data))) {
            Demo.loadIfEmpty(Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC()));
            atBackup = projects(db);
            sql(db, "SCRIPT TO '" + script.toAbsolutePath() + "'");
        }
        Path fresh = dir.resolve("fresh");
        Files.createDirectories(fresh);
        try (Connection empty = DriverManager.getConnection(Database.h2Url(fresh)); Statement s = empty.createStatement()) {
            s.execute("RUNSCRIPT FROM '" + script.toAbsolutePath() + "'");
        }
        try (Database db = Database.open(Database.h2Url(fresh))) {
            assertThat(db.migrate()).as("the restored schema is up to date").isZero();
            assertThat(projects(db)).isEqualTo(atBackup);
        }
        servedByTheJar(fresh, atBackup);
    }

    private static final String PASSWORD = "backup office words 24";

    /**
     * {@code baysheet backup} against a server under a stream of saves, the administrator's download beside it;
     * {@code baysheet restore} into a new data directory (refusing one in use, or one that holds a database without
     * --force); the shipped server on the restored directory serves the data, and the backup is consistent: the
     * project's version is the one its last audit entry moved it to (a change and its entry are one transaction),
     * and the audit chain verifies.
     */
    @Test
    void theBackupCommandCopiesARunningServerUnderSavesAndTheRestoreServesIt() throws Exception {
        Path live = dir.resolve("live");
        Files.createDirectories(live);
        Path zip = dir.resolve("cli-backup.zip");
        long own;
        try (ChildServer server = ChildServer.start(live, false)) {
            OfficeClient admin = new OfficeClient(server.base()).setUp("admin", PASSWORD, server.setupCode());
            admin.addUser("erin", "engineer", PASSWORD);
            OfficeClient eng = new OfficeClient(server.base()).logIn("erin", PASSWORD);
            own = JSON.readTree(OfficeClient.expect(eng.json("POST", "/api/projects",
                    "{\"jobNumber\": \"BK-1\", \"name\": \"Backed up\", \"units\": \"US\"}"), 201).body()).path("id").asLong();
            AtomicBoolean stop = new AtomicBoolean();
            AtomicLong saves = new AtomicLong();
            Thread saver = new Thread(() -> {
                long version = 1;
                while (!stop.get()) {
                    HttpResponse<String> r = eng.json("PUT", "/api/projects/" + own, "{\"version\": " + version
                            + ", \"jobNumber\": \"BK-1\", \"name\": \"Backed up, save " + saves.get() + "\", \"units\": \"US\"}");
                    if (r.statusCode() != 200) throw new IllegalStateException("save answered " + r.statusCode() + ": " + r.body());
                    try {
                        version = JSON.readTree(r.body()).path("version").asLong();
                    } catch (Exception e) {
                        throw new IllegalStateException(e);
                    }
                    saves.incrementAndGet();
                }
            });
            saver.start();
            while (saves.get() < 5 && saver.isAlive()) Thread.sleep(10);
            Cli backup = cli("backup", zip.toString(), "--data", live.toString());
            long during = saves.get();
            while (saves.get() < during + 5 && saver.isAlive()) Thread.sleep(10);
            stop.set(true);
            saver.join(30_000);
            assertThat(backup.exit).as(backup.output).isZero();
            assertThat(backup.output).contains("taken from the running server");
            assertThat(saves.get()).as("saves went on across the backup").isGreaterThan(during);
            assertThat(cli("backup", zip.toString(), "--data", live.toString()).output).as("no silent overwrite").contains("--force");

            HttpResponse<byte[]> download = admin.formBytes("/admin/backup", Map.of("confirm", "backup"));
            assertThat(download.statusCode()).isEqualTo(200);
            assertThat(download.headers().firstValue("Content-Type").orElse("")).startsWith("application/zip");
            assertThat(zipNames(download.body())).containsExactly("baysheet.mv.db");
            assertThat(cli("restore", zip.toString(), "--data", live.toString(), "--force").output)
                    .as("never into a database in use").contains("a server is using");
        }
        Path restored = dir.resolve("restored-cli");
        Cli restore = cli("restore", zip.toString(), "--data", restored.toString());
        assertThat(restore.exit).as(restore.output).isZero();
        assertThat(restore.output).contains("audit chain verified");
        assertThat(cli("restore", zip.toString(), "--data", restored.toString()).output).contains("already holds a database");

        try (ChildServer server = ChildServer.start(restored, false)) {
            OfficeClient eng = new OfficeClient(server.base()).logIn("erin", PASSWORD);
            long version = 0;
            for (JsonNode p : JSON.readTree(OfficeClient.expect(eng.get("/api/projects"), 200).body()))
                if (p.path("id").asLong() == own) version = p.path("version").asLong();
            OfficeClient admin = new OfficeClient(server.base()).logIn("admin", PASSWORD);
            String csv = OfficeClient.expect(admin.get("/admin/audit.csv"), 200).body();
            long last = 0;
            Matcher m = Pattern.compile("model version \\d+ → (\\d+)").matcher(csv);
            while (m.find()) last = Math.max(last, Long.parseLong(m.group(1)));
            assertThat(version).as("the restored project is at the version its last audit entry names").isEqualTo(last).isGreaterThan(1);
            assertThat(OfficeClient.expect(admin.get("/admin/audit/verify"), 200).body()).contains("Chain verified");
        }
    }

    private record Cli(int exit, String output) {}

    /** Runs the shipped jar's command line and waits for it. */
    private Cli cli(String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-jar",
                ChildServer.jar().toString()));
        cmd.addAll(List.of(args));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertThat(p.waitFor(120, java.util.concurrent.TimeUnit.SECONDS)).isTrue();
        return new Cli(p.exitValue(), out);
    }

    private static List<String> zipNames(byte[] zip) throws Exception {
        List<String> names = new ArrayList<>();
        try (ZipInputStream in = new ZipInputStream(new java.io.ByteArrayInputStream(zip))) {
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) names.add(e.getName());
        }
        return names;
    }

    /** The shipped server, started on the restored directory, lists the projects as they were at the backup. */
    private static void servedByTheJar(Path data, String atBackup) throws Exception {
        try (ChildServer server = ChildServer.start(data, false)) {
            OfficeClient admin = new OfficeClient(server.base()).setUp("admin", "restored office 2024", server.setupCode());
            List<JsonNode> listed = new ArrayList<>();
            JSON.readTree(OfficeClient.expect(admin.get("/api/projects"), 200).body()).forEach(listed::add);
            listed.sort(Comparator.comparingLong(p -> p.path("id").asLong()));
            StringBuilder b = new StringBuilder();
            for (JsonNode p : listed)
                b.append(p.path("id").asLong()).append(' ').append(p.path("info").path("jobNumber").asText()).append(' ')
                        .append(p.path("version").asLong()).append('\n');
            assertThat(b.toString()).as("the projects the restored server lists").isEqualTo(atBackup);
            assertThat(server.logText()).as("the restored schema is current").doesNotContain("Migrating schema")
                    .doesNotContainIgnoringCase("corrupt");
        }
    }

    private static String projects(Database db) throws Exception {
        try (Connection c = db.dataSource().getConnection(); Statement s = c.createStatement();
             ResultSet r = s.executeQuery("SELECT id, job_number, version FROM project ORDER BY id")) {
            StringBuilder b = new StringBuilder();
            while (r.next()) b.append(r.getLong(1)).append(' ').append(r.getString(2)).append(' ').append(r.getLong(3)).append('\n');
            return b.toString();
        }
    }

    private static void sql(Database db, String statement) throws Exception {
        try (Connection c = db.dataSource().getConnection(); Statement s = c.createStatement()) {
            s.execute(statement);
        }
    }

    private static void unzip(Path zip, Path into) throws Exception {
        Files.createDirectories(into);
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(zip))) {
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                Path out = into.resolve(Path.of(e.getName()).getFileName().toString());
                Files.copy(in, out);
            }
        }
    }
}
