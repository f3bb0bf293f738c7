package com.baysheet.store;

import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Bay;
import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A database of the schema before stable grid line ids (bays keyed by cell position, sheets by position-based
 * member ids) upgrades without loss: same bays in the same cells, every sheet with its revisions, PDF and
 * markups under the id its member has now, a sheet whose member had gone kept aside, each move audited.
 */
class GridLineIdsMigrationTest {
    @Test
    void anOldDatabaseWithBaysAndSheetsUpgradesWithoutLossOnH2() throws SQLException {
        upgrade(TestDatabases.h2());
    }

    @Test
    void anOldDatabaseWithBaysAndSheetsUpgradesWithoutLossOnPostgresql() throws SQLException {
        String server = System.getenv(TestDatabases.PG_ENV);
        Assumptions.assumeTrue(server != null && !server.isBlank(),
                () -> { System.out.println("PostgreSQL migration test skipped: " + TestDatabases.PG_ENV + " is not set"); return "no PostgreSQL"; });
        upgrade(TestDatabases.postgresSchema(server));
    }

    private static void upgrade(String url) throws SQLException {
        Flyway.configure().dataSource(url, null, null).locations("classpath:db/migration").target("102").load().migrate();
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute("INSERT INTO project (id, version, job_number, name, address, client, edition, unit_system, "
                    + "partition_allowance, reduce_partitions, created_at, updated_at) VALUES (7, 3, 'OLD-1', 'Old block', '', '', "
                    + "'ASCE 7-16', 'US', FALSE, FALSE, CURRENT_TIMESTAMP, CURRENT_TIMESTAMP)");
            String[][] lines = {{"x", "0", "1", "30"}, {"x", "1", "2", "25"}, {"x", "2", "3", null},
                    {"y", "0", "A", "30"}, {"y", "1", "B", "20"}, {"y", "2", "C", null}};
            for (String[] l : lines)
                s.execute("INSERT INTO grid_line (project_id, axis, seq, name, spacing_after) VALUES (7, '" + l[0] + "', "
                        + l[1] + ", '" + l[2] + "', " + l[3] + ")");
            // level 1 has only an opening, so the old derivation numbered level 2 as L0
            s.execute("INSERT INTO building_level (id, project_id, name, elevation, is_roof) VALUES (11, 7, 'Level 1', 0, FALSE)");
            s.execute("INSERT INTO building_level (id, project_id, name, elevation, is_roof) VALUES (12, 7, 'Level 2', 12, FALSE)");
            s.execute("INSERT INTO bay (level_id, col_index, row_index, is_opening) VALUES (11, 0, 0, TRUE)");
            for (int[] cell : new int[][]{{0, 0}, {1, 0}, {0, 1}, {1, 1}})
                s.execute("INSERT INTO bay (level_id, col_index, row_index, is_opening, occupancy, dead_load, beam_direction, "
                        + "infill_beams, cantilever_north) VALUES (12, " + cell[0] + ", " + cell[1] + ", FALSE, 'office', "
                        + (60 + 10 * cell[0]) + ", 'Y', 2, " + (cell[1] == 1 ? "5" : "NULL") + ")");
            s.execute("INSERT INTO app_user (id, username, full_name, initials, role, password_hash, active, version, created_at) "
                    + "VALUES (5, 'eng', 'An Engineer', 'AE', 'ENGINEER', 'x', TRUE, 1, CURRENT_TIMESTAMP)");
            String[] subjects = {"L0-c1x2", "L0-bay0x0-b1", "L0-h0x1", "package-project", "L5-c0x0"};
            for (int i = 0; i < subjects.length; i++) {
                s.execute("INSERT INTO review_sheet (id, project_id, subject) VALUES (" + (20 + i) + ", 7, '" + subjects[i] + "')");
                try (var ps = c.prepareStatement("INSERT INTO sheet_revision (id, sheet_id, revision_no, state, version, "
                        + "record_json, pdf, pdf_sha256, updated_at) VALUES (?, ?, 1, 'ISSUED', 4, ?, ?, ?, CURRENT_TIMESTAMP)")) {
                    ps.setInt(1, 30 + i);
                    ps.setInt(2, 20 + i);
                    ps.setString(3, "{\"n\":" + i + "}");
                    ps.setBytes(4, ("%PDF-" + i).getBytes(java.nio.charset.StandardCharsets.US_ASCII));
                    ps.setString(5, "sha" + i);
                    ps.executeUpdate();
                }
                s.execute("INSERT INTO markup (revision_id, target, author_id, author_initials, body, resolved, version, created_at) "
                        + "VALUES (" + (30 + i) + ", 'sheet', 5, 'AE', 'note " + i + "', FALSE, 1, CURRENT_TIMESTAMP)");
            }
        }

        try (Database db = Database.open(url)) {
            Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
            List<Bay> bays = store.bays().findByLevel(7, 12);
            assertThat(bays).extracting(b -> b.col() + "," + b.row()).containsExactly("0,0", "1,0", "0,1", "1,1");
            assertThat(bays).extracting(Bay::deadLoad).containsExactly(60.0, 70.0, 60.0, 70.0);
            assertThat(bays.get(3).cantilevers()).containsOnlyKeys(com.baysheet.framing.model.Side.NORTH);
            assertThat(store.bays().findByLevel(7, 11)).singleElement().satisfies(b -> assertThat(b.opening()).isTrue());

            // the sheets follow the members the old ids named: x lines are 1, 2, 3 and y lines 4, 5, 6 now
            Derived d = store.results().of(7).derived();
            assertThat(d.member("L12-c2x6")).hasValueSatisfying(m -> assertThat(m.name()).contains("C/2"));
            assertThat(d.member("L12-bay1x4-b1")).hasValueSatisfying(m -> assertThat(m.name()).contains("A-B/1-2 #1"));
            assertThat(d.member("L12-h1x5")).hasValueSatisfying(m -> assertThat(m.name()).contains("B/1-2"));
            assertThat(column(db, "SELECT subject FROM review_sheet ORDER BY id")).containsExactly(
                    "L12-c2x6", "L12-bay1x4-b1", "L12-h1x5", "package-project", "retired-L5-c0x0");
            assertThat(column(db, "SELECT r.record_json || ' ' || r.pdf_sha256 || ' ' || m.body FROM sheet_revision r "
                    + "JOIN markup m ON m.revision_id = r.id ORDER BY r.id")).containsExactly(
                    "{\"n\":0} sha0 note 0", "{\"n\":1} sha1 note 1", "{\"n\":2} sha2 note 2", "{\"n\":3} sha3 note 3", "{\"n\":4} sha4 note 4");
            assertThat(column(db, "SELECT pdf FROM sheet_revision ORDER BY id")).hasSize(5).doesNotContainNull();
            assertThat(column(db, "SELECT detail FROM audit_event WHERE action = 'sheet re-keyed' ORDER BY subject"))
                    .hasSize(4).anySatisfy(t -> assertThat(t).contains("was member L0-c1x2"));

            // lines inserted later never take an id the migration gave out
            var g = store.grids().find(7);
            store.grids().save(Editor.DEMO, 7, store.projects().find(7).version(), new com.baysheet.framing.model.Grid(
                    new com.baysheet.framing.model.GridAxis("x", List.of("1", "2", "3", "4"), List.of(30.0, 25.0, 10.0)), g.y()));
            assertThat(store.grids().find(7).x().ids()).containsExactly(1, 2, 3, 7);
        }
    }

    private static List<String> column(Database db, String sql) throws SQLException {
        List<String> out = new ArrayList<>();
        try (Connection c = db.dataSource().getConnection(); Statement s = c.createStatement(); ResultSet rs = s.executeQuery(sql)) {
            while (rs.next()) out.add(rs.getString(1));
        }
        return out;
    }
}
