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
