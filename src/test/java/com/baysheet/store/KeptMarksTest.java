package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.Rederivation;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import org.junit.jupiter.api.Test;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * A model write that starts from what the project's last write left its marks as (the typical members grouped from
 * that write's grouping, the rows taken as kept) leaves exactly the rows a write that reads them leaves: the same
 * random edits on two databases, one through a store that keeps its marks from write to write (and derives again from
 * the last state, as the server does), the other through a new store for every edit, so that each write reads the rows.
 * The edits change loads, turn beams and open bays (members removed) and floor them again.
 */
class KeptMarksTest {
    @Test
    void writesFromKeptMarksLeaveTheRowsThatWritesReadingThemLeave() throws SQLException {
        try (Database a = Database.open(TestDatabases.h2()); Database b = Database.open(TestDatabases.h2())) {
            Clock clock = Clock.systemUTC();
            Sql sql = new Sql(a.dataSource(), clock);
            Rederivation again = new Rederivation();
            Results results = new Results(sql, again::derive);
            ModelWrites writes = new ModelWrites(sql, again::derive, results);
            ProjectVersions pages = new ProjectVersions(sql, results);
            BayStore kept = new BayStore(writes, new OccupancyStore(sql));
            Store first = Store.on(a.dataSource(), again::derive, clock);
            List<Project> projects = Demo.loadIfEmpty(first);
            Demo.loadIfEmpty(Store.on(b.dataSource(), Derivation::derive, clock));
            Project p = projects.stream().max(Comparator.comparingInt(x -> first.results().of(x.id()).derived().members().size())).orElseThrow();
            Store second = Store.on(b.dataSource(), Derivation::derive, clock);
            // one floor made the same as another on both, so that an edit of a typical's bays reaches a level linked to it
            List<StoredLevel> floors = first.levels().findByProject(p.id()).stream().filter(l -> !l.info().roof()).toList();
            first.typicals().link(Editor.DEMO, p.id(), first.projects().find(p.id()).version(), floors.get(1).id(), List.of(floors.get(2).id()));
            second.typicals().link(Editor.DEMO, p.id(), second.projects().find(p.id()).version(), floors.get(1).id(), List.of(floors.get(2).id()));
            List<StoredLevel> levels = first.levels().findByProject(p.id());
            Random rnd = new Random(20261204);
            for (int e = 0; e < 40; e++) {
                StoredLevel level = levels.get(rnd.nextInt(levels.size()));
                List<Bay> bays = kept.findByLevel(p.id(), level.id());
                if (bays.isEmpty()) continue;
                Bay picked = bays.get(rnd.nextInt(bays.size()));
                BayAssignment edit = edit(picked, rnd);
                Store fresh = Store.on(b.dataSource(), Derivation::derive, clock);
                List<Cell> cell = List.of(new Cell(picked.col(), picked.row()));
                // now and then a bay cleared (unframed), refused on a linked level; else the assignment, where a turned
                // bay the framing refuses is refused alike on the other database, and nothing is written
                BayEdit change = rnd.nextInt(10) == 0
                        ? (store, version) -> store.clear(Editor.DEMO, p.id(), version, level.id(), cell)
                        : (store, version) -> store.assign(Editor.DEMO, p.id(), version, level.id(), edit);
                try {
                    change.on(kept, first.projects().find(p.id()).version());
                } catch (InputError refused) {
                    assertThatThrownBy(() -> change.on(fresh.bays(), fresh.projects().find(p.id()).version()))
                            .isInstanceOf(InputError.class).hasMessage(refused.getMessage());
                    continue;
                }
                change.on(fresh.bays(), fresh.projects().find(p.id()).version());
                compare(pages, fresh, a, b, p.id(), e);
            }
            // all but the first write started from the marks the write before it left
            assertThat(writes.keptStarts()).isGreaterThanOrEqualTo(25);
        }
    }

    /** One edit of the bays, made the same way on either database's store. */
    private interface BayEdit {
        void on(BayStore store, long version);
    }

    /**
     * The rows alike; the marks a page labels each member with, the write's own against those assigned from the rows;
     * and the model the write left (the levels it did not write taken from the model before) against the model read whole.
     */
    private static void compare(ProjectVersions pages, Store fresh, Database a, Database b, long project, int e) throws SQLException {
        assertThat(rows(a, project)).as("edit %d", e).isEqualTo(rows(b, project));
        var shown = pages.state(project);
        var read = fresh.versions().state(project);
        assertThat(shown.computed().model().building()).as("edit %d: the building", e).isEqualTo(read.computed().model().building());
        assertThat(shown.computed().model().levels()).as("edit %d: the levels", e).isEqualTo(read.computed().model().levels());
        assertThat(shown.computed().model().unframed()).as("edit %d: the unframed levels", e).isEqualTo(read.computed().model().unframed());
        for (var m : read.computed().derived().members())
            assertThat(shown.marks().label(m.id())).as("edit %d, %s", e, m.id()).isEqualTo(read.marks().label(m.id()));
    }

    /**
     * The bay with its dead load moved by a step of 5 (often back to where it was), its beams turned, or made an opening
     * (its members gone); an opening is floored again.
     */
    private static BayAssignment edit(Bay x, Random rnd) {
        List<Cell> cell = List.of(new Cell(x.col(), x.row()));
        if (x.opening()) return new BayAssignment(cell, false, "office", 60, new Framing(Direction.X, 1), java.util.Map.of(), null);
        if (rnd.nextInt(6) == 0) return BayAssignment.opening(cell);
        Framing f = x.framing();
        if (rnd.nextInt(4) == 0 && f != null)
            f = new Framing(f.beams() == Direction.X ? Direction.Y : Direction.X, f.infillBeams());
        double dead = x.deadLoad() + 5 * (rnd.nextInt(3) - 1);
        return new BayAssignment(cell, false, x.occupancy(), dead, f, x.cantilevers(), x.cantileverOccupancy());
    }

    /** The project's marks and which member carries which, as rows of text. */
    private static List<String> rows(Database db, long projectId) throws SQLException {
        List<String> out = new ArrayList<>();
        try (Connection c = db.dataSource().getConnection(); Statement s = c.createStatement()) {
            try (ResultSet r = s.executeQuery("SELECT id, prefix, seq_no, mark_text, calc_sha256, origin_id, active FROM member_mark "
                    + "WHERE project_id = " + projectId + " ORDER BY id")) {
                while (r.next()) out.add("mark " + r.getLong(1) + " " + r.getString(2) + r.getInt(3) + " " + r.getString(4) + " "
                        + r.getString(5) + " from " + r.getObject(6) + " " + r.getBoolean(7));
            }
            try (ResultSet r = s.executeQuery("SELECT member_id, mark_id FROM member_mark_location WHERE project_id = " + projectId
                    + " ORDER BY member_id")) {
                while (r.next()) out.add(r.getString(1) + " " + r.getLong(2));
            }
        }
        return out;
    }
}
