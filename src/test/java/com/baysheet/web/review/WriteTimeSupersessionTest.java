package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.SheetState;
import com.baysheet.store.Editor;
import com.baysheet.store.Sql;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.sql.PreparedStatement;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.state;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Supersession and the audit entry happen at the write, in the change's own transaction: a change through the
 * store alone, with no request and no filter, supersedes the issued sheet it alters and records who did what;
 * a GET of the sheet page shows the state and writes nothing.
 */
class WriteTimeSupersessionTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void aBayChangeThroughTheStoreSupersedesTheIssuedSheetAndIsAuditedWithItsAuthor() {
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER);
        issue(eng, chk);
        long before = server.office.review().audit().count();

        server.heavierFloor(5);

        // seen through the store, without opening the sheet page
        assertThat(server.office.review().reviews().view(server.ref()).current().revision().state()).isEqualTo(SheetState.PREPARING);
        assertThat(server.office.review().reviews().view(server.ref()).history()).extracting(r -> r.revision().state())
                .endsWith(SheetState.SUPERSEDED, SheetState.PREPARING);
        List<AuditEvent> after = server.office.review().audit().page(1000, 0);
        assertThat(after.size()).isGreaterThan((int) before);
        assertThat(after).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("supersede");
            assertThat(e.subject()).isEqualTo(server.ref().label());
            assertThat(e.actorUsername()).isEqualTo(Editor.DEMO.username());
        });
        assertThat(after).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("edit");
            assertThat(e.actorUsername()).isEqualTo(Editor.DEMO.username());
            assertThat(e.detail()).contains("bays assigned on " + server.member().level(), "; was: ", "model version ",
                    "superseded: " + server.ref().label());
        });
    }

    @Test
    void aBayChangeFromTheBrowserNamesTheLoggedInUserAndTheCellsByGridLines() {
        Client eng = server.as("erin", Role.ENGINEER);
        // the other demo project, so that the sheet the other tests issue stays as it is
        long p = server.demo.get(server.demo.size() - 1).id();
        assertThat(p).isNotEqualTo(server.project());
        var level = server.store.levels().findByProject(p).get(0);
        var bay = server.store.bays().findByLevel(p, level.id()).stream().filter(b -> !b.opening()).findFirst().orElseThrow();
        var grid = server.store.grids().find(p);
        String cell = grid.x().name(bay.col()) + "-" + grid.x().name(bay.col() + 1) + "/" + grid.y().name(bay.row()) + "-" + grid.y().name(bay.row() + 1);
        var r = eng.post("/projects/" + p + "/levels/" + level.id() + "/bays", List.of(
                Map.entry("version", String.valueOf(server.store.projects().find(p).version())),
                Map.entry("cells", bay.col() + "," + bay.row()), Map.entry("action", "opening")));
        assertThat(r.statusCode()).isEqualTo(303);
        AuditEvent last = server.office.review().audit().page(1, 0).get(0);
        assertThat(last.actorUsername()).isEqualTo("erin");
        assertThat(last.action()).isEqualTo("edit");
        assertThat(last.detail()).startsWith("bays assigned on " + level.name() + ": " + cell + ": opening; was: " + cell + " " + bay.occupancy());
    }

    @Test
    void aGetOfAnIssuedSheetWhoseInputsChangedOutOfBandWritesNothing() {
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER);
        issue(eng, chk);
        // a change the store's write path never saw (a hand edit, a restore): the page must not repair it by writing
        new Sql(server.db.dataSource()).tx(c -> {
            try (PreparedStatement ps = c.prepareStatement("UPDATE bay SET dead_load = dead_load + 7 WHERE is_opening = FALSE")) {
                return ps.executeUpdate();
            }
        });
        long audit = server.office.review().audit().count();
        var view = server.office.review().reviews().view(server.ref());

        assertThat(state(eng.get(server.sheetPath()).body())).isEqualTo("issued");

        assertThat(server.office.review().audit().count()).isEqualTo(audit);
        var again = server.office.review().reviews().view(server.ref());
        assertThat(again.current().version()).isEqualTo(view.current().version());
        assertThat(again.history()).hasSameSizeAs(view.history());
        assertThat(again.current().revision().state()).isEqualTo(SheetState.ISSUED);
    }

    /** Brings the member's sheet to issued (the tests share one server, in no set order). */
    @Test
    void aChangeOfTheFirmsSelfWeightsSupersedesTheIssuedSheetsItAltersAtTheSave() {
        // the firm's self weights enter every project's calculation (docs/engine.md, Self weight): the save itself
        // must supersede what they change, since no GET does any more
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER), admin = server.as("admin", Role.ADMINISTRATOR);
        issue(eng, chk);
        String page = admin.get("/admin/firm").body();
        var r = admin.post("/admin/firm", List.of(Map.entry("firmName", "Tidewater Structural"), Map.entry("logoText", ""),
                Map.entry("defaultEdition", "ASCE 7-16"), Map.entry("infillBeamWeight", "35"), Map.entry("gridBeamWeight", "40"),
                Map.entry("girderWeight", "55"), Map.entry("columnWeight", "50"), Map.entry("version", version(page, "/admin/firm"))));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(server.office.review().reviews().view(server.ref()).history()).extracting(x -> x.revision().state())
                .endsWith(SheetState.SUPERSEDED, SheetState.PREPARING);
        assertThat(server.office.review().audit().page(1000, 0)).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("supersede");
            assertThat(e.actorUsername()).isEqualTo("admin");
        });
    }

    private static void issue(Client eng, Client chk) {
        if (server.office.review().reviews().view(server.ref()).current().revision().state() == SheetState.ISSUED) return;
        String sheet = server.sheetPath();
        String html = eng.get(sheet).body();
        assertThat(eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")))).statusCode()).isEqualTo(303);
        assertThat(state(eng.get(sheet).body())).isEqualTo("issued");
    }
}
