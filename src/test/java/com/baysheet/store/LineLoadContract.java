package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.LineLoadEntry;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.project.StoredLineLoad;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * Line loads in the store, on each database: stored by stable grid line ids, mapped into the building by
 * position, and kept from being dropped by a grid or bay change. Run by every {@link StoreContract}.
 */
interface LineLoadContract {
    Store store();

    /** Level 2 on the starting grid (x 1 2 3, y A B C, 30 ft bays) with the south-west bay 1-2/A-B framed only. */
    private Project oneBay() {
        Store s = store();
        Project p = s.projects().create(Editor.DEMO, StoreContract.info("LL-1"));
        StoredLevel l = s.levels().add(Editor.DEMO, p.id(), p.version(), new LevelInfo("Level 2", 12, false, Double.NaN));
        s.bays().assign(Editor.DEMO, p.id(), p.version() + 1, l.id(), new BayAssignment(List.of(new Cell(0, 0)), false, "office", 60,
                new Framing(Direction.Y, 2), Map.of()));
        return s.projects().find(p.id());
    }

    private long levelOf(Project p) { return store().levels().findByProject(p.id()).get(0).id(); }

    private static LineLoadEntry cladding(String line, String from, String to, String label) {
        return new LineLoadEntry(null, line, from, to, label, Double.NaN, 15, 12, 0, null, false);
    }

    @Test
    default void aCladdingLoadRoundTripsByItsLineNamesAndLandsOnTheBuilding() {
        Project p = oneBay();
        // bounds given north to south: stored south to north
        StoredLineLoad saved = store().lineLoads().add(Editor.DEMO, p.id(), p.version(), levelOf(p), cladding("1", "B", "A", "west cladding"));
        // 15 psf × 12 ft = 180 plf
        assertThat(saved.dead()).isEqualTo(180.0);
        assertThat(saved.deadPressure()).isEqualTo(15.0);
        assertThat(saved.height()).isEqualTo(12.0);
        assertThat(saved.segment()).isEqualTo("1, A-B");
        assertThat(store().lineLoads().findByLevel(p.id(), levelOf(p))).containsExactly(saved);
        assertThat(store().projects().find(p.id()).version()).isEqualTo(p.version() + 1);
        Results.Computed r = store().results().of(p.id());
        assertThat(r.model().building().lineLoads()).containsExactly(
                new GridLineLoad("Level 2", true, 0, 0, 1, "west cladding", 180, 0, null, false));
        assertThat(r.derived().members()).anySatisfy(m ->
                assertThat(com.baysheet.engine.record.RecordJson.write(m.result().record())).contains("west cladding"));

        store().lineLoads().delete(Editor.DEMO, p.id(), p.version() + 1, levelOf(p), saved.id());
        assertThat(store().lineLoads().findByLevel(p.id(), levelOf(p))).isEmpty();
        assertThat(store().results().of(p.id()).model().building().lineLoads()).isEmpty();
    }

    @Test
    default void aLoadFollowsItsLinesThroughRenamesAndRefusesTheRemovalOfOne() {
        Project p = oneBay();
        Store s = store();
        s.bays().assign(Editor.DEMO, p.id(), p.version(), levelOf(p), new BayAssignment(List.of(new Cell(0, 0), new Cell(1, 0),
                new Cell(0, 1), new Cell(1, 1)), false, "office", 60, new Framing(Direction.Y, 2), Map.of()));
        s.lineLoads().add(Editor.DEMO, p.id(), p.version() + 1, levelOf(p), new LineLoadEntry(null, "B", "1", "3", "wall", 400,
                Double.NaN, Double.NaN, 0, null, true));
        long v = p.version() + 2;
        Grid renamed = new Grid(new GridAxis("x", List.of("4", "5", "6"), List.of(30.0, 30.0)),
                new GridAxis("y", List.of("A", "M", "C"), List.of(30.0, 30.0)));
        s.grids().save(Editor.DEMO, p.id(), v, renamed);
        assertThat(s.lineLoads().findByLevel(p.id(), levelOf(p))).singleElement()
                .satisfies(l -> assertThat(l.segment()).isEqualTo("M, 4-6"));
        Grid withoutM = new Grid(renamed.x(), new GridAxis("y", List.of("A", "C"), List.of(60.0)));
        assertThatThrownBy(() -> s.grids().save(Editor.DEMO, p.id(), v + 1, withoutM)).isInstanceOfSatisfying(InputError.class, e -> {
            assertThat(e.field()).isEqualTo("grid.y.names");
            assertThat(e.problem()).contains("grid line M", "line load \"wall\" on Level 2", "runs along it");
        });
        Grid withoutSix = new Grid(new GridAxis("x", List.of("4", "5"), List.of(30.0)), renamed.y());
        assertThatThrownBy(() -> s.grids().save(Editor.DEMO, p.id(), v + 1, withoutSix)).isInstanceOfSatisfying(InputError.class, e ->
                assertThat(e.problem()).contains("grid line 6", "ends at it"));
        assertThat(s.grids().find(p.id()).y().names()).containsExactly("A", "M", "C");
        assertThat(s.projects().find(p.id()).version()).isEqualTo(v + 1);
        // a line inside the load's span may go: the bays either side agree, and the load still runs 4 to 6
        s.grids().save(Editor.DEMO, p.id(), v + 1, new Grid(new GridAxis("x", List.of("4", "6"), List.of(60.0)), renamed.y()));
        assertThat(s.lineLoads().findByLevel(p.id(), levelOf(p))).singleElement()
                .satisfies(l -> assertThat(l.segment()).isEqualTo("M, 4-6"));
        assertThat(s.results().of(p.id()).model().building().lineLoads()).singleElement()
                .satisfies(l -> assertThat(List.of(l.line(), l.from(), l.to())).containsExactly(1, 0, 1));
    }

    @Test
    default void loadsThatCannotStandAreRefusedNamingTheFieldAndNothingIsStored() {
        Project p = oneBay();
        long level = levelOf(p), v = p.version();
        Map<String, LineLoadEntry> refused = Map.of(
                "line", cladding("9", "A", "B", "x"),
                "from", cladding("1", "Q", "B", "x"),
                "to", cladding("A", "1", "7", "x"),
                "liveOccupancy", new LineLoadEntry(null, "1", "A", "B", "x", 100, Double.NaN, Double.NaN, 50, "no-such-use", false));
        for (var e : refused.entrySet())
            assertThatThrownBy(() -> store().lineLoads().add(Editor.DEMO, p.id(), v, level, e.getValue()))
                    .as(e.getKey()).isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo(e.getKey()));
        // an id longer than its column: refused as unknown before the insert, never a database fault
        assertThatThrownBy(() -> store().lineLoads().add(Editor.DEMO, p.id(), v, level, new LineLoadEntry(null, "1", "A", "B", "x", 100,
                Double.NaN, Double.NaN, 50, "u".repeat(200), false)))
                .isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo("liveOccupancy"));
        // line 3 from A to B: the bay 2-3/A-B is not framed, so no member lies beneath
        assertThatThrownBy(() -> store().lineLoads().add(Editor.DEMO, p.id(), v, level, cladding("3", "A", "B", "east")))
                .isInstanceOfSatisfying(InputError.class, err -> {
                    assertThat(err.field()).isEqualTo("line");
                    assertThat(err.problem()).contains("no member at Level 2 along 3/A-B");
                });
        // line 1 from A to C: its second segment, A-B... B-C, has no bay beside it
        assertThatThrownBy(() -> store().lineLoads().add(Editor.DEMO, p.id(), v, level, cladding("1", "A", "C", "west")))
                .isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo("line"));
        assertThat(store().lineLoads().findByLevel(p.id(), level)).isEmpty();
        assertThat(store().projects().find(p.id()).version()).isEqualTo(v);

        store().lineLoads().add(Editor.DEMO, p.id(), v, level, cladding("1", "A", "B", "west"));
        assertThatThrownBy(() -> store().lineLoads().add(Editor.DEMO, p.id(), v + 1, level, cladding("A", "1", "2", "WEST")))
                .isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo("label"));
        assertThatThrownBy(() -> store().lineLoads().add(Editor.DEMO, p.id(), v, level, cladding("A", "1", "2", "south")))
                .isInstanceOf(StaleVersion.class);
        assertThat(store().lineLoads().findByLevel(p.id(), level)).hasSize(1);
    }

    @Test
    default void theBaysBeneathALoadCannotBeClearedFromUnderIt() {
        Project p = oneBay();
        long level = levelOf(p);
        store().lineLoads().add(Editor.DEMO, p.id(), p.version(), level, cladding("1", "A", "B", "west"));
        assertThatThrownBy(() -> store().bays().clear(Editor.DEMO, p.id(), p.version() + 1, level, List.of(new Cell(0, 0))))
                .isInstanceOf(InputError.class).hasMessageContaining("west");
        assertThat(store().bays().findByLevel(p.id(), level)).hasSize(1);
        assertThatThrownBy(() -> store().lineLoads().delete(Editor.DEMO, p.id(), p.version() + 1, level, 999_999))
                .isInstanceOf(NotFound.class);
    }
}
