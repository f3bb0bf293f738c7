package com.baysheet.store;

import com.baysheet.project.StoredLevel;
import com.baysheet.project.Project;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.Cell;
import com.baysheet.project.BayAssignment;
import com.baysheet.engine.InputError;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberRole;
import com.baysheet.framing.TakeDown;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * Typical levels on each database: a linked level's members follow every edit of its typical, unlinking leaves an
 * independent copy, copying gives bays once, and the links that make no sense are refused with nothing stored.
 */
interface TypicalLevelContract {
    Store store();

    Database database();

    /** Levels 2, 3 and 4 (12 ft apart) on the starting grid; Level 2 framed all over with offices at 60 psf dead. */
    private Project building() {
        Store s = store();
        Project p = s.projects().create(Editor.DEMO, StoreContract.info("TY-1"));
        for (int i = 2; i <= 4; i++)
            s.levels().add(Editor.DEMO, p.id(), version(p), new LevelInfo("Level " + i, 12 * (i - 1), false, Double.NaN));
        s.bays().assign(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), bays(60));
        return s.projects().find(p.id());
    }

    private static BayAssignment bays(double dead) {
        return new BayAssignment(List.of(new Cell(0, 0), new Cell(1, 0), new Cell(0, 1), new Cell(1, 1)), false, "office", dead,
                new Framing(Direction.Y, 2), Map.of());
    }

    private long version(Project p) { return store().projects().find(p.id()).version(); }

    private long id(Project p, String level) {
        return store().levels().findByProject(p.id()).stream().filter(l -> l.name().equals(level)).findFirst().orElseThrow().id();
    }

    /** A level's beams and girders by their id without the level key, with the dead load at their left end. */
    private Map<String, Double> deadByPlace(Project p, String level) {
        Map<String, Double> out = new TreeMap<>();
        for (DerivedMember m : store().results().of(p.id()).derived().onLevel(level))
            if (m.role() != MemberRole.COLUMN) out.put(m.id().substring(m.id().indexOf('-')), m.result().left().dead());
        return out;
    }

    @Test
    default void editingTheTypicalChangesEveryLinkedLevelsMembers() {
        Project p = building();
        store().typicals().link(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), List.of(id(p, "Level 3"), id(p, "Level 4")));
        assertThat(store().bays().findByLevel(p.id(), id(p, "Level 3"))).isEqualTo(store().bays().findByLevel(p.id(), id(p, "Level 2")));
        Map<String, Double> typical = deadByPlace(p, "Level 2");
        assertThat(typical).isNotEmpty();
        assertThat(deadByPlace(p, "Level 3")).isEqualTo(typical);
        assertThat(deadByPlace(p, "Level 4")).isEqualTo(typical);

        store().bays().assign(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), bays(90));
        Map<String, Double> edited = deadByPlace(p, "Level 2");
        // dead load per length grows with the bays' dead load (90/60) on every beam and girder
        typical.forEach((place, dead) -> assertThat(edited.get(place)).isGreaterThan(dead));
        assertThat(deadByPlace(p, "Level 3")).isEqualTo(edited);
        assertThat(deadByPlace(p, "Level 4")).isEqualTo(edited);
        // each linked level keeps its own members at its own elevation
        assertThat(store().results().of(p.id()).derived().onLevel("Level 4")).allSatisfy(m -> assertThat(m.id()).startsWith("L" + id(p, "Level 4") + "-"));
    }

    @Test
    default void everyLinkChangeIsAuditedWithWhatTheLevelHeldBefore() {
        Project p = building();
        store().typicals().link(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), List.of(id(p, "Level 3")));
        store().bays().assign(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), bays(70));
        store().typicals().unlink(Editor.DEMO, p.id(), version(p), id(p, "Level 3"));
        var trail = new com.baysheet.store.review.AuditTrail(new Sql(database().dataSource())).page(3, 0);
        assertThat(trail.get(2).detail()).contains("levels made the same as Level 2: Level 3 (was: 0 bays of its own)");
        assertThat(trail.get(1).detail()).contains("bays assigned on Level 2", "; also on Level 3 (the same as it)");
        assertThat(trail.get(0).detail()).contains("Level 3 unlinked from its typical Level 2");
    }

    @Test
    default void aLinkedLevelRefusesBayEditsOfItsOwn() {
        Project p = building();
        store().typicals().link(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), List.of(id(p, "Level 3")));
        long before = version(p);
        assertThatThrownBy(() -> store().bays().assign(Editor.DEMO, p.id(), before, id(p, "Level 3"), bays(80)))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.getMessage()).contains("typicalOf").contains("Level 2"));
        assertThat(version(p)).isEqualTo(before);
    }

    @Test
    default void anUnlinkedLevelIsAnIndependentCopyThatLaterEditsOfTheTypicalLeave() {
        Project p = building();
        store().typicals().link(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), List.of(id(p, "Level 3")));
        Map<String, Double> atLink = deadByPlace(p, "Level 3");
        store().typicals().unlink(Editor.DEMO, p.id(), version(p), id(p, "Level 3"));
        assertThat(store().levels().find(p.id(), id(p, "Level 3")).linked()).isFalse();
        assertThat(deadByPlace(p, "Level 3")).isEqualTo(atLink);

        store().bays().assign(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), bays(90));
        assertThat(deadByPlace(p, "Level 3")).isEqualTo(atLink);
        assertThat(deadByPlace(p, "Level 2")).isNotEqualTo(atLink);
        // and it may now be changed on its own
        store().bays().assign(Editor.DEMO, p.id(), version(p), id(p, "Level 3"), bays(40));
        deadByPlace(p, "Level 3").forEach((place, dead) -> assertThat(dead).isLessThan(atLink.get(place)));
    }

    @Test
    default void aCopyHasTheBaysOnceAndIsThenChangedFreely() {
        Project p = building();
        store().typicals().copy(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), List.of(id(p, "Level 3")));
        assertThat(store().levels().find(p.id(), id(p, "Level 3")).linked()).isFalse();
        assertThat(store().bays().findByLevel(p.id(), id(p, "Level 3"))).isEqualTo(store().bays().findByLevel(p.id(), id(p, "Level 2")));
        store().bays().assign(Editor.DEMO, p.id(), version(p), id(p, "Level 3"), bays(40));
        assertThat(store().bays().findByLevel(p.id(), id(p, "Level 2"))).allSatisfy(b -> assertThat(b.deadLoad()).isEqualTo(60.0));
        assertThat(store().bays().findByLevel(p.id(), id(p, "Level 3"))).allSatisfy(b -> assertThat(b.deadLoad()).isEqualTo(40.0));
    }

    @Test
    default void repeatingATypicalAddsLinkedLevelsAboveIt() {
        Project p = store().projects().create(Editor.DEMO, StoreContract.info("TY-2"));
        store().levels().add(Editor.DEMO, p.id(), version(p), new LevelInfo("Level 2", 14, false, Double.NaN));
        store().bays().assign(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), bays(60));
        List<StoredLevel> added = store().typicals().repeat(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), 3, 12.5);
        assertThat(added).extracting(StoredLevel::name).containsExactly("Level 3", "Level 4", "Level 5");
        assertThat(store().levels().findByProject(p.id())).extracting(l -> l.info().elevation()).containsExactly(14.0, 26.5, 39.0, 51.5);
        assertThat(store().levels().findByProject(p.id())).filteredOn(StoredLevel::linked).hasSize(3)
                .allSatisfy(l -> assertThat(l.typicalOf()).isEqualTo(id(p, "Level 2")));
        assertThat(deadByPlace(p, "Level 5")).isEqualTo(deadByPlace(p, "Level 2"));
    }

    @Test
    default void theTakeDownSumsEveryLinkedLevel() {
        Project p = building();
        store().typicals().link(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), List.of(id(p, "Level 3"), id(p, "Level 4")));
        var derived = store().results().of(p.id()).derived();
        // the interior column at B/2 carries a full 30 × 30 ft bay on each of the three levels
        TakeDown t = derived.takeDowns().stream().filter(d -> d.gridPoint().equals("B/2")).findFirst().orElseThrow();
        assertThat(t.rows()).hasSize(3);
        assertThat(t.rows()).allSatisfy(r -> assertThat(r.areaAtLevel()).isCloseTo(900.0, within(1e-9)));
        TakeDown.Row bottom = t.rows().get(t.rows().size() - 1);
        assertThat(bottom.level()).isEqualTo("Level 2");
        assertThat(bottom.cumulativeArea()).isCloseTo(2700.0, within(1e-9));
        double deadSum = t.rows().stream().mapToDouble(TakeDown.Row::deadAtLevel).sum();
        assertThat(bottom.dead()).isCloseTo(deadSum, within(1e-6 * deadSum));
        // each level adds the same dead load: its bays are the typical's
        assertThat(t.rows()).allSatisfy(r -> assertThat(r.deadAtLevel()).isCloseTo(t.rows().get(0).deadAtLevel(), within(1e-9)));
    }

    @Test
    default void linkingToItselfACycleAnotherProjectOrAnotherKindIsRefusedAndNothingStored() {
        Project p = building();
        long l2 = id(p, "Level 2"), l3 = id(p, "Level 3"), l4 = id(p, "Level 4");
        refused(p, () -> store().typicals().link(Editor.DEMO, p.id(), version(p), l2, List.of(l2)), "itself");

        store().typicals().link(Editor.DEMO, p.id(), version(p), l2, List.of(l3));
        // Level 2 → Level 3 would close the loop Level 3 → Level 2
        refused(p, () -> store().typicals().link(Editor.DEMO, p.id(), version(p), l3, List.of(l2)), "same as Level 2");
        // a typical cannot itself follow another level, so no chain (nor cycle) can form
        refused(p, () -> store().typicals().link(Editor.DEMO, p.id(), version(p), l4, List.of(l2)), "typical of Level 3");

        Project other = store().projects().create(Editor.DEMO, StoreContract.info("TY-9"));
        store().grids().save(Editor.DEMO, other.id(), version(other), new com.baysheet.framing.model.Grid(
                new com.baysheet.framing.model.GridAxis("x", List.of("1", "2"), List.of(25.0)),
                new com.baysheet.framing.model.GridAxis("y", List.of("A", "B"), List.of(25.0))));
        StoredLevel foreign = store().levels().add(Editor.DEMO, other.id(), version(other), new LevelInfo("Level 2", 12, false, Double.NaN));
        refused(p, () -> store().typicals().link(Editor.DEMO, p.id(), version(p), foreign.id(), List.of(l4)), "another grid");

        store().levels().add(Editor.DEMO, p.id(), version(p), new LevelInfo("Roof", 60, true, 0.25));
        refused(p, () -> store().typicals().link(Editor.DEMO, p.id(), version(p), l2, List.of(id(p, "Roof"))), "own kind");
        assertThat(store().levels().find(p.id(), l4).linked()).isFalse();
    }

    @Test
    default void deletingATypicalLeavesItsLevelsAsIndependentCopies() {
        Project p = building();
        store().typicals().link(Editor.DEMO, p.id(), version(p), id(p, "Level 2"), List.of(id(p, "Level 3")));
        Map<String, Double> atLink = deadByPlace(p, "Level 3");
        store().levels().delete(Editor.DEMO, p.id(), version(p), id(p, "Level 2"));
        assertThat(store().levels().find(p.id(), id(p, "Level 3")).linked()).isFalse();
        assertThat(deadByPlace(p, "Level 3")).isEqualTo(atLink);
        // a project with linked levels deletes whole
        store().typicals().link(Editor.DEMO, p.id(), version(p), id(p, "Level 3"), List.of(id(p, "Level 4")));
        store().projects().delete(Editor.DEMO, p.id(), version(p));
        assertThat(store().projects().findAll()).extracting(Project::id).doesNotContain(p.id());
    }

    private void refused(Project p, Runnable change, String says) {
        long before = version(p);
        assertThatThrownBy(change::run).isInstanceOfSatisfying(InputError.class, e -> assertThat(e.getMessage()).contains(says));
        assertThat(version(p)).isEqualTo(before);
    }
}
