package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.Project;
import com.baysheet.review.store.TestClock;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * Deleted levels and projects kept on each database: a level comes back with its own row id (so its members keep
 * their ids and records), linked again to its typical where that is still there; a level deleted before the grid
 * changed is refused; a project comes back as it was; what was deleted more than 30 days ago (by the store's clock)
 * is purged when the list is read.
 */
interface DeletedItemContract {
    Store store();

    Database database();

    /** Levels 2, 3 (the same as Level 2) and 4 on the starting grid, Level 2 and Level 4 framed all over. */
    private Project building(Store s, String job) {
        Project p = s.projects().create(Editor.DEMO, StoreContract.info(job));
        for (int i = 2; i <= 4; i++)
            s.levels().add(Editor.DEMO, p.id(), v(s, p), new LevelInfo("Level " + i, 12 * (i - 1), false, Double.NaN));
        BayAssignment all = new BayAssignment(List.of(new Cell(0, 0), new Cell(1, 0), new Cell(0, 1), new Cell(1, 1)), false,
                "office", 60, new Framing(Direction.Y, 2), Map.of());
        s.bays().assign(Editor.DEMO, p.id(), v(s, p), id(s, p, "Level 2"), all);
        s.bays().assign(Editor.DEMO, p.id(), v(s, p), id(s, p, "Level 4"), all);
        s.typicals().link(Editor.DEMO, p.id(), v(s, p), id(s, p, "Level 2"), List.of(id(s, p, "Level 3")));
        return s.projects().find(p.id());
    }

    private static long v(Store s, Project p) { return s.projects().find(p.id()).version(); }

    private static long id(Store s, Project p, String level) {
        return s.levels().findByProject(p.id()).stream().filter(l -> l.name().equals(level)).findFirst().orElseThrow().id();
    }

    private static Map<String, String> records(Store s, Project p) {
        var d = s.results().of(p.id()).derived();
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : d.members()) out.put(m.id(), RecordJson.write(m.result().record()) + " | " + m.name());
        for (TakeDown t : d.takeDowns()) out.put("takedown " + t.id(), RecordJson.write(t.record()));
        return out;
    }

    private static DeletedItem only(Store s, Project p) {
        return s.deleted().list().stream().filter(i -> i.projectId() == p.id()).findFirst().orElseThrow();
    }

    @Test
    default void aDeletedLinkedLevelComesBackLinkedWithTheSameMembers() {
        Store s = store();
        Project p = building(s, "DL-1");
        Map<String, String> before = records(s, p);
        long l3 = id(s, p, "Level 3");
        s.levels().delete(Editor.DEMO, p.id(), v(s, p), l3);
        assertThat(records(s, p)).isNotEqualTo(before);
        DeletedItem item = only(s, p);
        assertThat(item.kind()).isEqualTo(DeletedItem.LEVEL);
        assertThat(item.label()).isEqualTo("Level 3 of DL-1 Test block DL-1");
        assertThat(item.members()).isPositive();

        s.deleted().restore(Editor.DEMO, item.id());
        assertThat(s.levels().find(p.id(), l3).typicalOf()).isEqualTo(id(s, p, "Level 2"));
        assertThat(records(s, p)).isEqualTo(before);
        assertThat(s.deleted().list()).noneMatch(i -> i.id() == item.id());
    }

    @Test
    default void aDeletedTypicalComesBackWithItsBaysAndTheCopiesItLeftStayCopies() {
        Store s = store();
        Project p = building(s, "DL-2");
        Map<String, String> before = records(s, p);
        long l2 = id(s, p, "Level 2");
        s.levels().delete(Editor.DEMO, p.id(), v(s, p), l2);
        assertThat(s.levels().find(p.id(), id(s, p, "Level 3")).linked()).as("released to a copy").isFalse();
        s.deleted().restore(Editor.DEMO, only(s, p).id());
        assertThat(s.levels().find(p.id(), l2).linked()).isFalse();
        assertThat(records(s, p)).isEqualTo(before);
    }

    @Test
    default void aLevelDeletedBeforeTheGridChangedIsNotRestored() {
        Store s = store();
        Project p = building(s, "DL-3");
        s.levels().delete(Editor.DEMO, p.id(), v(s, p), id(s, p, "Level 4"));
        Grid g = s.grids().find(p.id());
        s.grids().save(Editor.DEMO, p.id(), v(s, p), new Grid(g.x(), new GridAxis("y", List.of("A", "B", "C", "D"), List.of(30.0, 30.0, 30.0))));
        long version = v(s, p);
        DeletedItem item = only(s, p);
        assertThatThrownBy(() -> s.deleted().restore(Editor.DEMO, item.id())).isInstanceOf(InputError.class)
                .hasMessageContaining("cannot be restored: the grid has changed");
        assertThat(v(s, p)).as("nothing saved").isEqualTo(version);
        assertThat(s.deleted().list()).anyMatch(i -> i.id() == item.id());
    }

    @Test
    default void aDeletedProjectComesBackAsItWas() {
        Store s = store();
        Project p = building(s, "DL-4");
        String file = s.exports().of(p.id()).toString();
        s.projects().delete(Editor.DEMO, p.id(), v(s, p));
        assertThatThrownBy(() -> s.projects().find(p.id())).isInstanceOf(NotFound.class);
        s.deleted().restore(Editor.DEMO, only(s, p).id());
        Project back = s.projects().findAll().stream().filter(x -> x.info().jobNumber().equals("DL-4")).findFirst().orElseThrow();
        assertThat(s.exports().of(back.id()).toString()).isEqualTo(file);
    }

    @Test
    default void whatWasDeletedMoreThanThirtyDaysAgoIsPurgedWhenTheListIsRead() {
        TestClock clock = new TestClock(Instant.now());
        Store s = Store.on(database().dataSource(), Derivation::derive, clock);
        Project p = building(s, "DL-5");
        s.levels().delete(Editor.DEMO, p.id(), v(s, p), id(s, p, "Level 4"));
        DeletedItem item = only(s, p);
        clock.advance(DeletedItems.KEPT.minus(Duration.ofMinutes(1)));
        assertThat(s.deleted().list()).as("kept for 30 days").anyMatch(i -> i.id() == item.id());
        clock.advance(Duration.ofMinutes(2));
        assertThat(s.deleted().list()).noneMatch(i -> i.id() == item.id());
        assertThatThrownBy(() -> s.deleted().restore(Editor.DEMO, item.id())).isInstanceOf(NotFound.class);
    }
}
