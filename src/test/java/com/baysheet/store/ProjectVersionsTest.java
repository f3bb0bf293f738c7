package com.baysheet.store;

import com.baysheet.auth.Role;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.project.Firm;
import com.baysheet.project.FirmOccupancy;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.Project;
import com.baysheet.review.Actor;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.Caller;
import com.baysheet.store.review.FirmStore;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.time.Clock;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Every change a result page shows moves the project's versions; reading moves nothing; the state read is exactly of them. */
class ProjectVersionsTest {
    static Database db;
    static Store store;
    static long project;

    @BeforeAll
    static void open() {
        db = Database.open(TestDatabases.h2());
        store = Store.on(db.dataSource(), Derivation::derive, Clock.systemUTC());
        project = Demo.loadIfEmpty(store).get(0).id();
    }

    @AfterAll
    static void close() { db.close(); }

    @Test
    void readingMovesNothingAndTheStateReadIsExactlyOfTheVersionsAsTheyStand() {
        ProjectVersions.Version v = store.versions().of(project);
        assertThat(store.versions().of(project)).isEqualTo(v);
        ProjectVersions.State s = store.versions().state(project);
        assertThat(s.version()).isEqualTo(v);
        assertThat(s.marks().all()).isNotEmpty();
    }

    @Test
    void aModelEditMovesTheModelVersion() {
        ProjectVersions.Version v = store.versions().of(project);
        Project p = store.projects().find(project);
        store.projects().update(Editor.DEMO, project, p.version(), p.info());
        ProjectVersions.Version w = store.versions().of(project);
        assertThat(w.model()).isGreaterThan(v.model());
        assertThat(w).isEqualTo(new ProjectVersions.Version(project, w.model(), v.catalogue(), v.firm(), v.marks()));
    }

    @Test
    void aFirmOccupancyMovesTheCatalogueVersion() {
        ProjectVersions.Version v = store.versions().of(project);
        store.occupancies().add(Editor.DEMO, new FirmOccupancy("kept-room", "Kept room", UnitSystem.US, 40, 0, 30, ReductionRule.ORDINARY, false));
        ProjectVersions.Version w = store.versions().of(project);
        assertThat(w).isEqualTo(new ProjectVersions.Version(project, v.model(), v.catalogue() + 1, v.firm(), v.marks()));
    }

    @Test
    void theFirmsSettingsMoveTheFirmVersion() {
        ProjectVersions.Version v = store.versions().of(project);
        FirmStore firms = new FirmStore(new Sql(db.dataSource()));
        Firm f = firms.get();
        firms.update(new Firm(f.name(), f.logoText(), f.defaultEdition(), f.infillBeamWeight(), f.gridBeamWeight(), f.girderWeight() + 10,
                f.columnWeight(), f.version()), AuditEvent.of(null, "test", "firm settings", "firm", "", ""));
        assertThat(store.versions().of(project)).isEqualTo(new ProjectVersions.Version(project, v.model(), v.catalogue(), v.firm() + 1, v.marks()));
    }

    @Test
    void aMarkRenameMovesTheMarksVersionAndNoOtherAndRenamingBackMovesItAgain() {
        ProjectVersions.Version v = store.versions().of(project);
        var mark = store.versions().state(project).marks().all().get(0).mark();
        Caller who = new Caller(new Actor(1, "TT", Role.ENGINEER), "tess", "127.0.0.1");
        store.marks().rename(project, mark.id(), "ZQ9", who);
        ProjectVersions.Version w = store.versions().of(project);
        assertThat(w.marks()).isNotEqualTo(v.marks());
        assertThat(w).isEqualTo(new ProjectVersions.Version(project, v.model(), v.catalogue(), v.firm(), w.marks()));
        assertThat(store.versions().state(project).marks().byId(mark.id()).orElseThrow().text()).isEqualTo("ZQ9");
        store.marks().rename(project, mark.id(), mark.text(), who);
        ProjectVersions.Version back = store.versions().of(project);
        assertThat(back.marks()).isGreaterThan(w.marks());
        assertThat(back).isEqualTo(new ProjectVersions.Version(project, v.model(), v.catalogue(), v.firm(), back.marks()));
    }

    @Test
    void theMarksABayEditGaveItsBuildingAreThoseAReadAssignsAndARenameAfterItIsShown() {
        var level = store.levels().findByProject(project).stream().filter(l -> l.typicalOf() == null).findFirst().orElseThrow();
        var bay = store.bays().findByLevel(project, level.id()).stream().filter(b -> !b.opening()).findFirst().orElseThrow();
        store.bays().assign(Editor.DEMO, project, store.projects().find(project).version(), level.id(), new BayAssignment(
                List.of(new Cell(bay.col(), bay.row())), false, bay.occupancy(), bay.deadLoad() + 5, bay.framing(), bay.cantilevers(),
                bay.cantileverOccupancy()));
        ProjectVersions.State s = store.versions().state(project);
        assertThat(s.version()).isNotNull();
        assertThat(s.marks().all()).isEqualTo(store.marks().of(project, s.computed().derived()).all());
        var mark = s.marks().all().get(0).mark();
        Caller who = new Caller(new Actor(1, "TT", Role.ENGINEER), "tess", "127.0.0.1");
        store.marks().rename(project, mark.id(), "ZQ8", who);
        assertThat(store.versions().state(project).marks().byId(mark.id()).orElseThrow().text()).isEqualTo("ZQ8");
        store.marks().rename(project, mark.id(), mark.text(), who);
    }

    @Test
    void anUnknownProjectIsNotFound() {
        assertThatThrownBy(() -> store.versions().of(987_654)).isInstanceOf(NotFound.class);
    }
}
