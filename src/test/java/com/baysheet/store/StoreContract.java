package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Side;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.FirmOccupancy;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.Project;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.StoredLevel;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.review.AuditTrail;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The store's behaviour, run against each database with the real migrations. */
abstract class StoreContract implements LineLoadContract, FloorMethodContract, TypicalLevelContract, ModelFileContract,
        DeletedItemContract, DeletedPartsContract {
    protected Database db;
    protected Store store;

    @Override
    public Store store() { return store; }

    @Override
    public Database database() { return db; }

    /** A URL of an empty database for one test. */
    protected abstract String freshUrl();

    @BeforeEach
    void open() {
        db = Database.open(freshUrl());
        store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
    }

    @AfterEach
    void close() {
        db.close();
    }

    static ProjectInfo info(String job) {
        return new ProjectInfo(job, "Test block " + job, "1 Test Way", "Test client", "ASCE 7-16", UnitSystem.US, false, false);
    }

    static BayAssignment office(Cell... cells) {
        return new BayAssignment(List.of(cells), false, "office", 60, new Framing(Direction.Y, 2), Map.of());
    }

    Project projectWithLevel() {
        Project p = store.projects().create(Editor.DEMO, info("T-1"));
        store.levels().add(Editor.DEMO, p.id(), p.version(), new LevelInfo("Level 2", 12, false, Double.NaN));
        return store.projects().find(p.id());
    }

    long level(Project p) {
        return store.levels().findByProject(p.id()).get(0).id();
    }

    @Test
    void createdProjectHasItsInfoVersionOneAndAStartingGrid() {
        Project p = store.projects().create(Editor.DEMO, info("24-100"));
        assertThat(store.projects().find(p.id())).isEqualTo(p);
        assertThat(p.version()).isEqualTo(1);
        Grid g = store.grids().find(p.id());
        assertThat(g.x().names()).containsExactly("1", "2", "3");
        assertThat(g.y().spacings()).containsExactly(30.0, 30.0);
    }

    @Test
    void theUpliftOptionIsStoredOffByDefaultAndChangedWithTheSettings() {
        Project p = store.projects().create(Editor.DEMO, info("24-101"));
        assertThat(store.projects().find(p.id()).info().upliftReducedDead()).isFalse();
        ProjectInfo on = new ProjectInfo(p.info().jobNumber(), p.info().name(), p.info().address(), p.info().client(),
                p.info().edition(), p.info().units(), false, false, true);
        Project saved = store.projects().update(Editor.DEMO, p.id(), p.version(), on);
        assertThat(store.projects().find(p.id()).info().upliftReducedDead()).isTrue();
        assertThat(saved.info().options().upliftReducedDead()).isTrue();
    }

    @Test
    void jobNumberIsUniqueAcrossProjects() {
        store.projects().create(Editor.DEMO, info("24-100"));
        assertThatThrownBy(() -> store.projects().create(Editor.DEMO, info("24-100")))
                .isInstanceOfSatisfying(Duplicate.class, e -> assertThat(e.field()).isEqualTo("jobNumber"));
        assertThat(store.projects().findAll()).hasSize(1);
    }

    @Test
    void concurrentCreatesOfOneJobNumberLeaveOneProjectAndRefuseTheRestAsDuplicates() throws Exception {
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(6);
        java.util.List<java.util.concurrent.Future<String>> answers = new java.util.ArrayList<>();
        for (int i = 0; i < 6; i++)
            answers.add(pool.submit(() -> {
                try {
                    store.projects().create(Editor.DEMO, info("24-200"));
                    return "created";
                } catch (Duplicate e) {
                    return e.field();
                }
            }));
        java.util.List<String> got = new java.util.ArrayList<>();
        for (var a : answers) got.add(a.get());
        pool.shutdown();
        assertThat(got).containsOnly("created", "jobNumber").filteredOn("created"::equals).hasSize(1);
        assertThat(store.projects().findAll()).hasSize(1);
    }

    @Test
    void aChangeBasedOnAnOldVersionIsRefusedAndNothingIsOverwritten() {
        Project p = store.projects().create(Editor.DEMO, info("24-100"));
        store.projects().update(Editor.DEMO, p.id(), p.version(), info("24-101"));
        assertThatThrownBy(() -> store.projects().update(Editor.DEMO, p.id(), p.version(), info("24-999")))
                .isInstanceOfSatisfying(StaleVersion.class, e -> {
                    assertThat(e.given()).isEqualTo(1);
                    assertThat(e.current()).isEqualTo(2);
                });
        assertThatThrownBy(() -> store.levels().add(Editor.DEMO, p.id(), p.version(), new LevelInfo("L", 1, false, Double.NaN)))
                .isInstanceOf(StaleVersion.class);
        assertThat(store.projects().find(p.id()).info().jobNumber()).isEqualTo("24-101");
        assertThat(store.levels().findByProject(p.id())).isEmpty();
    }

    @Test
    void levelsComeLowestFirstAndShareNeitherNameNorElevation() {
        Project p = store.projects().create(Editor.DEMO, info("24-100"));
        store.levels().add(Editor.DEMO, p.id(), 1, new LevelInfo("Roof", 30, true, 0.25));
        store.levels().add(Editor.DEMO, p.id(), 2, new LevelInfo("Level 2", 12, false, Double.NaN));
        assertThat(store.levels().findByProject(p.id())).extracting(StoredLevel::name).containsExactly("Level 2", "Roof");
        assertThatThrownBy(() -> store.levels().add(Editor.DEMO, p.id(), 3, new LevelInfo("Mezzanine", 12, false, Double.NaN)))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).isEqualTo("elevation"));
        assertThat(store.levels().findByProject(p.id()).get(1).info().roofSlope()).isEqualTo(0.25);
    }

    @Test
    void baysRoundTripWithFramingCantileversAndOpenings() {
        Project p = projectWithLevel();
        long l = level(p);
        store.bays().assign(Editor.DEMO, p.id(), p.version(), l, new BayAssignment(List.of(new Cell(0, 1), new Cell(1, 1)), false,
                "office", 62.5, new Framing(Direction.X, 3), Map.of(Side.NORTH, 5.5)));
        store.bays().assign(Editor.DEMO, p.id(), p.version() + 1, l, BayAssignment.opening(List.of(new Cell(0, 0))));
        List<Bay> bays = store.bays().findByLevel(p.id(), l);
        assertThat(bays).hasSize(3);
        assertThat(bays.get(0).opening()).isTrue();
        Bay b = bays.get(1);
        assertThat(b.deadLoad()).isEqualTo(62.5);
        assertThat(b.framing()).isEqualTo(new Framing(Direction.X, 3));
        assertThat(b.cantilevers()).isEqualTo(Map.of(Side.NORTH, 5.5));
        store.bays().clear(Editor.DEMO, p.id(), p.version() + 2, l, List.of(new Cell(0, 0)));
        assertThat(store.bays().findByLevel(p.id(), l)).hasSize(2);
    }

    @Test
    void cantileverOccupancyRoundTripsAndNullMeansTheBalconyOfTheBay() {
        Project p = projectWithLevel();
        long l = level(p);
        store.bays().assign(Editor.DEMO, p.id(), p.version(), l, new BayAssignment(List.of(new Cell(0, 0)), false, "office", 60,
                new Framing(Direction.Y, 2), Map.of(Side.SOUTH, 6.0), "retail-upper"));
        store.bays().assign(Editor.DEMO, p.id(), p.version() + 1, l, new BayAssignment(List.of(new Cell(1, 0)), false, "office", 60,
                new Framing(Direction.Y, 2), Map.of(Side.SOUTH, 6.0)));
        List<Bay> bays = store.bays().findByLevel(p.id(), l);
        assertThat(bays).extracting(Bay::cantileverOccupancy).containsExactly("retail-upper", null);
        var members = store.results().of(p.id()).derived().members();
        // 6 ft × 30 ft slab on each bay: the given occupancy on one, the balcony serving offices on the other
        assertThat(members.stream().mapToDouble(m -> m.areas().getOrDefault("retail-upper", 0.0)).sum()).isGreaterThan(0);
        assertThat(members.stream().filter(m -> m.role() == com.baysheet.framing.MemberRole.COLUMN)
                .mapToDouble(m -> m.areas().getOrDefault("balcony:office", 0.0)).sum()).isCloseTo(180.0, org.assertj.core.api.Assertions.within(1e-9));
    }

    @Test
    void aBayStoredBeforeCantileverOccupanciesReadsAsTheDefault() throws java.sql.SQLException {
        Project p = projectWithLevel();
        long l = level(p);
        // a row as written before V103: no cantilever_occupancy column in the INSERT (keyed, since V106, by the
        // ids of the bay's south-west grid lines)
        String line = "(SELECT line_id FROM grid_line WHERE project_id = ? AND axis = ? AND seq = 0)";
        try (var c = db.dataSource().getConnection(); var ps = c.prepareStatement("INSERT INTO bay (level_id, x_line, y_line, "
                + "is_opening, occupancy, dead_load, beam_direction, infill_beams, cantilever_south) VALUES (?, " + line + ", " + line
                + ", FALSE, 'office', 60, 'Y', 2, 6)")) {
            ps.setLong(1, l);
            ps.setLong(2, p.id());
            ps.setString(3, "x");
            ps.setLong(4, p.id());
            ps.setString(5, "y");
            ps.executeUpdate();
        }
        Bay b = store.bays().findByLevel(p.id(), l).get(0);
        assertThat(b.cantileverOccupancy()).isNull();
        assertThat(b.cantileverUse(store.occupancies().catalogue())).isEqualTo("balcony:office");
    }

    @Test
    void theBalconyOfAFirmRowWithTheLongestIdIsStored() {
        Project p = projectWithLevel();
        long l = level(p);
        String id = "r".repeat(60);
        store.occupancies().add(Editor.DEMO, new FirmOccupancy(id, "Long room", UnitSystem.US, 40, 0, 30, ReductionRule.ORDINARY, false));
        store.bays().assign(Editor.DEMO, p.id(), p.version(), l, new BayAssignment(List.of(new Cell(0, 0)), false, "office", 60,
                new Framing(Direction.Y, 2), Map.of(Side.SOUTH, 6.0), "balcony:" + id));
        assertThat(store.bays().findByLevel(p.id(), l).get(0).cantileverOccupancy()).isEqualTo("balcony:" + id);
    }

    @Test
    void anUnknownCantileverOccupancyIsRefusedNamingTheFieldAndNothingIsStored() {
        Project p = projectWithLevel();
        long l = level(p);
        BayAssignment bad = new BayAssignment(List.of(new Cell(0, 0)), false, "office", 60, new Framing(Direction.Y, 2),
                Map.of(Side.SOUTH, 6.0), "ballroom");
        assertThatThrownBy(() -> store.bays().assign(Editor.DEMO, p.id(), p.version(), l, bad))
                .isInstanceOfSatisfying(InputError.class, e -> {
                    assertThat(e.field()).isEqualTo("cantileverOccupancy");
                    assertThat(e.getMessage()).contains("ballroom");
                });
        assertThat(store.bays().findByLevel(p.id(), l)).isEmpty();
        assertThat(store.projects().find(p.id()).version()).isEqualTo(p.version());
    }

    @Test
    void aModelTheDerivationRefusesIsRolledBack() {
        Project p = projectWithLevel();
        long l = level(p);
        store.bays().assign(Editor.DEMO, p.id(), p.version(), l, office(new Cell(0, 0), new Cell(0, 1)));
        // a cantilever on the north side of (0,0) would project over bay (0,1)
        BayAssignment over = new BayAssignment(List.of(new Cell(0, 0)), false, "office", 60,
                new Framing(Direction.Y, 2), Map.of(Side.NORTH, 4.0));
        assertThatThrownBy(() -> store.bays().assign(Editor.DEMO, p.id(), p.version() + 1, l, over))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).contains("cantilevers.north"));
        assertThat(store.bays().findByLevel(p.id(), l)).allSatisfy(b -> assertThat(b.cantilevers()).isEmpty());
        assertThat(store.projects().find(p.id()).version()).isEqualTo(p.version() + 1);
    }

    @Test
    void baysOutsideTheGridAndGridsThatWouldStrandBaysAreRefused() {
        Project p = projectWithLevel();
        long l = level(p);
        assertThatThrownBy(() -> store.bays().assign(Editor.DEMO, p.id(), p.version(), l, office(new Cell(2, 0))))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).isEqualTo("cells"));
        store.bays().assign(Editor.DEMO, p.id(), p.version(), l, office(new Cell(1, 1)));
        Grid smaller = new Grid(new GridAxis("x", List.of("1", "2"), List.of(30.0)), new GridAxis("y", List.of("A", "B", "C"), List.of(30.0, 30.0)));
        assertThatThrownBy(() -> store.grids().save(Editor.DEMO, p.id(), p.version() + 1, smaller)).isInstanceOf(InputError.class);
        assertThat(store.grids().find(p.id()).x().lines()).isEqualTo(3);
    }

    @Test
    void unknownOccupancyIsRefusedUntilTheFirmAddsIt() {
        Project p = projectWithLevel();
        long l = level(p);
        BayAssignment lab = new BayAssignment(List.of(new Cell(0, 0)), false, "print-room", 50, new Framing(Direction.Y, 1), Map.of());
        assertThatThrownBy(() -> store.bays().assign(Editor.DEMO, p.id(), p.version(), l, lab))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).isEqualTo("occupancy"));
        store.occupancies().add(Editor.DEMO, new FirmOccupancy("print-room", "Print room", UnitSystem.US, 150, 0, 30, ReductionRule.HEAVY, false));
        store.bays().assign(Editor.DEMO, p.id(), p.version(), l, lab);
        assertThat(store.results().of(p.id()).derived().members()).isNotEmpty();
        assertThatThrownBy(() -> store.occupancies().add(Editor.DEMO, new FirmOccupancy("office", "Mine", UnitSystem.US, 50, 0, 30, ReductionRule.ORDINARY, false)))
                .isInstanceOf(InputError.class);
    }

    @Test
    void resultsAreCachedPerVersionAndRecomputedAfterAChange() {
        Project p = projectWithLevel();
        long l = level(p);
        store.bays().assign(Editor.DEMO, p.id(), p.version(), l, office(new Cell(0, 0)));
        Results.Computed first = store.results().of(p.id());
        assertThat(store.results().of(p.id())).isSameAs(first);
        store.bays().assign(Editor.DEMO, p.id(), p.version() + 1, l, office(new Cell(0, 0), new Cell(1, 0)));
        Results.Computed second = store.results().of(p.id());
        assertThat(second).isNotSameAs(first);
        assertThat(second.derived().members().size()).isGreaterThan(first.derived().members().size());
        store.occupancies().add(Editor.DEMO, new FirmOccupancy("loft", "Loft", UnitSystem.US, 50, 0, 30, ReductionRule.ORDINARY, false));
        assertThat(store.results().of(p.id())).isNotSameAs(second);
    }

    @Test
    void levelsWithoutAFloorAreLeftOutOfTheDerivation() {
        Project p = projectWithLevel();
        Results.Computed r = store.results().of(p.id());
        assertThat(r.model().unframed()).containsExactly("Level 2");
        assertThat(r.derived().members()).isEmpty();
    }

    @Test
    void unknownIdsAreNotFound() {
        Project p = projectWithLevel();
        Project other = store.projects().create(Editor.DEMO, info("T-2"));
        assertThatThrownBy(() -> store.projects().find(9999)).isInstanceOf(NotFound.class);
        assertThatThrownBy(() -> store.levels().find(other.id(), level(p))).isInstanceOf(NotFound.class);
        assertThatThrownBy(() -> store.results().of(9999)).isInstanceOf(NotFound.class);
    }

    @Test
    void unitSystemIsFixedOnceTheProjectHasLevels() {
        Project p = projectWithLevel();
        ProjectInfo si = new ProjectInfo("T-1", "x", "", "", "ASCE 7-16", UnitSystem.SI, false, false);
        assertThatThrownBy(() -> store.projects().update(Editor.DEMO, p.id(), p.version(), si))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).isEqualTo("units"));
    }

    @Test
    void demoLoadsBothProjectsOnceWithMembersAndTakeDowns() {
        List<Project> demo = Demo.loadIfEmpty(store);
        assertThat(demo).extracting(d -> d.info().name()).containsExactly("Alder Street Commons", "Millrace Park-and-Ride Deck");
        Results.Computed r = store.results().of(demo.get(0).id());
        assertThat(r.model().levels()).hasSize(4);
        assertThat(r.derived().members()).hasSizeGreaterThan(100);
        assertThat(r.derived().takeDowns()).hasSize(20);
        assertThat(store.results().of(demo.get(1).id()).project().info().units()).isEqualTo(UnitSystem.SI);
        assertThat(Demo.loadIfEmpty(store)).isEmpty();
        assertThat(store.projects().findAll()).hasSize(2);
    }

    // Grid lines keep stable ids: bays and member ids follow the lines, not their positions.

    private static Grid grid(String xNames, List<Double> xSpacings) {
        return new Grid(new GridAxis("x", List.of(xNames.split(" ")), xSpacings), new GridAxis("y", List.of("A", "B", "C"), List.of(30.0, 30.0)));
    }

    private Map<String, String> records(Project p) {
        Map<String, String> out = new java.util.TreeMap<>();
        for (var m : store.results().of(p.id()).derived().members())
            out.put(m.id(), com.baysheet.engine.record.RecordJson.write(m.result().record()));
        return out;
    }

    /** Level 2: office 1-2 (cantilever south), office 2-3 (cantilevers south and east), both in row A-B. */
    private Project twoOfficeBays() {
        Project p = projectWithLevel();
        store.bays().assign(Editor.DEMO, p.id(), p.version(), level(p), new BayAssignment(List.of(new Cell(0, 0), new Cell(1, 0)), false,
                "office", 60, new Framing(Direction.Y, 2), Map.of(Side.SOUTH, 4.0)));
        store.bays().assign(Editor.DEMO, p.id(), p.version() + 1, level(p), new BayAssignment(List.of(new Cell(1, 0)), false,
                "office", 60, new Framing(Direction.Y, 2), Map.of(Side.SOUTH, 4.0, Side.EAST, 3.0)));
        return store.projects().find(p.id());
    }

    @Test
    void insertingALineSplitsTheBaysItCrossesAndLeavesEveryOtherMemberAsItWas() {
        Project p = twoOfficeBays();
        Map<String, String> before = records(p);
        var untouched = store.results().of(p.id()).derived().members().stream()
                .filter(m -> !m.bays().contains("A-B/2-3")).map(m -> m.id()).toList();
        store.grids().save(Editor.DEMO, p.id(), p.version(), grid("1 2 2A 3", List.of(30.0, 12.0, 18.0)));
        List<Bay> bays = store.bays().findByLevel(p.id(), level(p));
        assertThat(bays).extracting(Bay::col).containsExactly(0, 1, 2);
        assertThat(bays).allSatisfy(b -> assertThat(b.occupancy()).isEqualTo("office"));
        // the half 2-2A faces 2A-3 to the east now: its east cantilever went to the half still at the edge
        assertThat(bays.get(1).cantilevers()).isEqualTo(Map.of(Side.SOUTH, 4.0));
        assertThat(bays.get(2).cantilevers()).isEqualTo(Map.of(Side.SOUTH, 4.0, Side.EAST, 3.0));
        Map<String, String> after = records(p);
        assertThat(untouched).isNotEmpty();
        for (String id : untouched) assertThat(after.get(id)).as(id).isEqualTo(before.get(id));
        assertThat(after.keySet()).containsAll(before.keySet());
    }

    @Test
    void removingTheInsertedLineMergesTheHalvesBackAndEverythingIsAsBefore() {
        Project p = twoOfficeBays();
        List<Bay> bays = store.bays().findByLevel(p.id(), level(p));
        Map<String, String> before = records(p);
        store.grids().save(Editor.DEMO, p.id(), p.version(), grid("1 2 2A 3", List.of(30.0, 12.0, 18.0)));
        store.grids().save(Editor.DEMO, p.id(), p.version() + 1, grid("1 2 3", List.of(30.0, 30.0)));
        assertThat(store.bays().findByLevel(p.id(), level(p))).isEqualTo(bays);
        assertThat(records(p)).isEqualTo(before);
    }

    @Test
    void aLineInsertedAgainIsANewLineWhoseMembersAreNew() {
        Project p = twoOfficeBays();
        store.grids().save(Editor.DEMO, p.id(), p.version(), grid("1 2 2A 3", List.of(30.0, 12.0, 18.0)));
        int first = store.grids().find(p.id()).x().id(2);
        store.grids().save(Editor.DEMO, p.id(), p.version() + 1, grid("1 2 3", List.of(30.0, 30.0)));
        store.grids().save(Editor.DEMO, p.id(), p.version() + 2, grid("1 2 2A 3", List.of(30.0, 12.0, 18.0)));
        int second = store.grids().find(p.id()).x().id(2);
        assertThat(second).isNotEqualTo(first);
        assertThat(store.results().of(p.id()).derived().members()).extracting(m -> m.id())
                .noneMatch(id -> id.matches("L\\d+-[chv]" + first + "x\\d+") || id.matches("L\\d+-bay" + first + "x\\d+-b\\d+"));
    }

    @Test
    void renamingLinesKeepsEveryMemberId() {
        Project p = twoOfficeBays();
        Map<String, String> before = records(p);
        store.grids().save(Editor.DEMO, p.id(), p.version(), grid("4 5 6", List.of(30.0, 30.0)));
        assertThat(records(p).keySet()).isEqualTo(before.keySet());
        assertThat(store.results().of(p.id()).derived().members()).anySatisfy(m -> assertThat(m.name()).contains("4-5"));
    }

    @Test
    void removingALineBetweenBaysThatDifferIsRefusedNamingThemByGridLines() {
        Project p = twoOfficeBays();
        store.bays().assign(Editor.DEMO, p.id(), p.version(), level(p), new BayAssignment(List.of(new Cell(1, 0)), false,
                "office", 80, new Framing(Direction.Y, 2), Map.of(Side.SOUTH, 4.0)));
        long v = p.version() + 1;
        List<Bay> bays = store.bays().findByLevel(p.id(), level(p));
        assertThatThrownBy(() -> store.grids().save(Editor.DEMO, p.id(), v, grid("1 3", List.of(60.0))))
                .isInstanceOfSatisfying(InputError.class, e -> {
                    assertThat(e.field()).isEqualTo("grid.x.names");
                    assertThat(e.problem()).contains("grid line 2", "on Level 2 A-B/1-2 and A-B/2-3", "dead load 60 / 80")
                            .doesNotContain("[");
                });
        assertThatThrownBy(() -> store.grids().save(Editor.DEMO, p.id(), v, grid("1 2", List.of(30.0))))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.problem()).contains("grid line 3", "edge", "A-B/2-3"));
        assertThat(store.bays().findByLevel(p.id(), level(p))).isEqualTo(bays);
        assertThat(store.projects().find(p.id()).version()).isEqualTo(v);
    }

    @Test
    void aModelChangeIsAuditedInItsOwnTransactionWithTheEditorAndWhatChanged() {
        Project p = projectWithLevel();
        long level = level(p);
        Editor who = new Editor(7L, "erin", "10.0.0.9");
        store.bays().assign(who, p.id(), p.version(), level, office(new Cell(0, 0)));
        AuditEvent e = new AuditTrail(new Sql(db.dataSource())).page(1, 0).get(0);
        assertThat(e.actorId()).isEqualTo(7L);
        assertThat(e.actorUsername()).isEqualTo("erin");
        assertThat(e.address()).isEqualTo("10.0.0.9");
        assertThat(e.subject()).isEqualTo("project T-1");
        assertThat(e.detail()).startsWith("bays assigned on Level 2: 1-2/A-B: office, dead 60, beams Y + 2; was: 1-2/A-B unframed; "
                + "model version " + p.version() + " → " + (p.version() + 1) + "; changed: ").contains("building.levels[0]");
    }

    @Test
    void aModelChangesAuditEntryGivesTheOldAndNewValues() {
        Project p = projectWithLevel();
        long level = level(p);
        StoredLevel l = store.levels().findByProject(p.id()).get(0);
        store.levels().update(Editor.DEMO, p.id(), p.version(), level, new LevelInfo("Second floor", l.info().elevation(),
                false, Double.NaN, l.info().surface()));
        AuditEvent e = new AuditTrail(new Sql(db.dataSource())).page(1, 0).get(0);
        assertThat(e.detail()).contains("\"Level 2\" → \"Second floor\"").doesNotContain("version: ");
    }

    @Test
    void aChangeWhoseAuditEntryCannotBeWrittenLeavesTheModelAsItWas() {
        Project p = projectWithLevel();
        long level = level(p);
        Sql sql = new Sql(db.dataSource());
        sql.tx(c -> c.createStatement().executeUpdate("ALTER TABLE audit_event RENAME TO audit_event_away"));
        try {
            assertThatThrownBy(() -> store.bays().assign(Editor.DEMO, p.id(), p.version(), level, office(new Cell(0, 0))))
                    .isInstanceOf(StoreFailure.class);
        } finally {
            sql.tx(c -> c.createStatement().executeUpdate("ALTER TABLE audit_event_away RENAME TO audit_event"));
        }
        assertThat(store.bays().findByLevel(p.id(), level)).isEmpty();
        assertThat(store.projects().find(p.id()).version()).isEqualTo(p.version());
    }
}
