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
 * As drawings do it: an issued revision stays current until the next one is issued. A change through the store
 * alone, with no request and no filter, leaves the issued sheet it alters issued (changed since issue, never
 * superseded by the write) and its audit entry names that sheet and who did it; the bay form counts the issued
 * sheets a change would alter before anything is saved; a GET of the sheet page shows the state and writes nothing.
 */
class ChangedSinceIssueTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void aBayChangeThroughTheStoreLeavesTheSheetIssuedAndChangedSinceIssueAndIsAuditedWithItsAuthor() {
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER);
        issue(eng, chk);
        var ref = server.ref();
        String mark = server.mark().text();
        var states = server.office.review().reviews().view(ref).history().stream().map(r -> r.revision().state()).toList();
        long before = server.office.review().audit().count();

        server.heavierFloor(5);

        // seen through the store, without opening the sheet page: still issued, no revision opened by the write
        var view = server.office.review().reviews().view(ref);
        assertThat(view.current().revision().state()).isEqualTo(SheetState.ISSUED);
        assertThat(view.history()).extracting(r -> r.revision().state()).as("the write opens no revision and supersedes none")
                .containsExactlyElementsOf(states);
        List<AuditEvent> after = server.office.review().audit().page(1000, 0);
        assertThat(after.size()).isGreaterThan((int) before);
        assertThat(after).noneSatisfy(e -> assertThat(e.action()).isEqualTo("supersede"));
        assertThat(after).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("edit");
            assertThat(e.actorUsername()).isEqualTo(Editor.DEMO.username());
            assertThat(e.detail()).contains("bays assigned on " + server.member().level(), "; was: ", "model version ",
                    "changed since issue: ").contains(mark);
        });
        String html = eng.get("/review/projects/" + server.project() + "/marks/" + ref.subject().substring("mark-".length())).body();
        assertThat(state(html)).isEqualTo("issued");
        assertThat(html).contains("id=\"changed-since-issue\"");
    }

    @Test
    void theBayFormCountsTheIssuedSheetsAChangeTouchesAndSavesNothing() {
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER);
        issue(eng, chk);
        long p = server.project();
        String mark = server.mark().text();
        var level = server.store.levels().findByProject(p).stream().filter(x -> x.info().name().equals(server.member().level()))
                .findFirst().orElseThrow();
        var bay = server.member().bays().get(0);
        var b = server.store.bays().findByLevel(p, level.id()).stream().filter(x -> !x.opening()).filter(x ->
                server.store.grids().find(p).bayName(x.col(), x.row()).equals(bay)).findFirst().orElseThrow();
        long version = server.store.projects().find(p).version();
        String bays = "/projects/" + p + "/levels/" + level.id() + "/bays";
        var r = eng.post(bays, List.of(Map.entry("version", String.valueOf(version)), Map.entry("cells", b.col() + "," + b.row()),
                Map.entry("action", "count"), Map.entry("occupancy", b.occupancy()), Map.entry("deadLoad", String.valueOf(b.deadLoad() + 9)),
                Map.entry("beams", b.framing().beams().name()), Map.entry("infillBeams", String.valueOf(b.framing().infillBeams()))));
        assertThat(r.statusCode()).isEqualTo(200);
        String said = com.baysheet.web.Html.text(r.body(), "#touched");
        assertThat(said).contains("Applying this changes ").contains(mark).contains("Nothing is saved yet");
        assertThat(server.store.projects().find(p).version()).as("nothing saved").isEqualTo(version);
        assertThat(server.store.bays().findByLevel(p, level.id())).contains(b);
        // the same bay as it is: no issued sheet changes
        var same = eng.post(bays, List.of(Map.entry("version", String.valueOf(version)), Map.entry("cells", b.col() + "," + b.row()),
                Map.entry("action", "count"), Map.entry("occupancy", b.occupancy()), Map.entry("deadLoad", String.valueOf(b.deadLoad())),
                Map.entry("beams", b.framing().beams().name()), Map.entry("infillBeams", String.valueOf(b.framing().infillBeams()))));
        if (b.cantilevers().isEmpty() && b.cantileverOccupancy() == null)
            assertThat(com.baysheet.web.Html.text(same.body(), "#touched")).contains("changes no issued sheet");
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

    @Test
    void aChangeOfTheFirmsSelfWeightsLeavesTheIssuedSheetsIssuedAndNamesThoseItChanged() {
        // the firm's self weights enter every project's calculation (docs/engine.md, Self weight): the save itself
        // names what they change, since no GET writes
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER), admin = server.as("admin", Role.ADMINISTRATOR);
        issue(eng, chk);
        var ref = server.ref();
        String page = admin.get("/admin/firm").body();
        var r = admin.post("/admin/firm", List.of(Map.entry("firmName", "Tidewater Structural"), Map.entry("logoText", ""),
                Map.entry("defaultEdition", "ASCE 7-16"), Map.entry("infillBeamWeight", "35"), Map.entry("gridBeamWeight", "40"),
                Map.entry("girderWeight", "55"), Map.entry("columnWeight", "50"), Map.entry("version", version(page, "/admin/firm"))));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(server.office.review().reviews().view(ref).current().revision().state()).isEqualTo(SheetState.ISSUED);
        assertThat(server.office.review().audit().page(1000, 0)).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("edit");
            assertThat(e.detail()).contains("changed since issue");
            assertThat(e.actorUsername()).isEqualTo("admin");
        });
    }

    /** Brings the member's mark sheet to issued (the tests share one server, in no set order). */
    private static void issue(Client eng, Client chk) {
        var now = server.office.review().reviews().view(server.ref()).current().revision();
        if (now.state() == SheetState.ISSUED && !now.outdatedBy(com.baysheet.review.CalcFingerprint.of(server.mark().record()))) return;
        String sheet = server.sheetPath();
        Pages.submitApproveIssue(eng, chk, sheet, "First issue");
        assertThat(state(eng.get(sheet).body())).isEqualTo("issued");
    }
}
