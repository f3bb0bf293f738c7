package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.DeletedItem;
import com.baysheet.store.Editor;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Bays left unframed from the bay editor are kept for 30 days: the administrator restores them into the same cells
 * with the same members and records; a restore is refused, saying why and storing nothing, where the cell holds a bay
 * again or the grid no longer has room for the bay (a line added through it).
 */
class ClearedBaysTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static StoredLevel level(long p, String name) {
        return server.store.levels().findByProject(p).stream().filter(l -> l.name().equals(name)).findFirst().orElseThrow();
    }

    private static HttpResponse<String> clear(Client eng, long p, StoredLevel l, List<String> cells) {
        List<Map.Entry<String, String>> f = new ArrayList<>(List.of(Map.entry("version", String.valueOf(server.store.projects().find(p).version())),
                Map.entry("action", "clear"), Map.entry("confirm", "yes")));
        cells.forEach(c -> f.add(Map.entry("cells", c)));
        return eng.post("/projects/" + p + "/levels/" + l.id() + "/bays", f);
    }

    private static DeletedItem kept(long p) {
        return server.store.deleted().list().stream().filter(i -> i.projectId() == p && i.kind().equals(DeletedItem.BAYS))
                .findFirst().orElseThrow();
    }

    @Test
    void clearedBaysAreRestoredWithTheSameMembersAndRecords() {
        Client eng = server.as("erin", Role.ENGINEER), admin = server.as("admin", Role.ADMINISTRATOR);
        long p = server.project();
        StoredLevel l = level(p, "Level 2");
        List<Bay> bays = server.store.bays().findByLevel(p, l.id());
        Map<String, String> before = records(p);

        HttpResponse<String> r = clear(eng, p, l, List.of("0,1", "1,1"));
        assertThat(r.statusCode()).as(r.body()).isEqualTo(303);
        String page = eng.get(r.headers().firstValue("Location").orElseThrow()).body();
        assertThat(Html.shown(page)).contains("kept for 30 days", "licensed engineer");
        assertThat(server.store.bays().findByLevel(p, l.id())).hasSize(bays.size() - 2);
        assertThat(records(p)).isNotEqualTo(before);

        DeletedItem item = kept(p);
        assertThat(item.label()).startsWith("Bays B-C/1-2, B-C/2-3 of Level 2, ");
        assertThat(item.members()).isPositive();
        assertThat(Html.text(admin.get("/admin/deleted").body(), "#item-" + item.id() + " .label")).isEqualTo(item.label());
        assertThat(eng.post("/admin/deleted/" + item.id() + "/restore", List.of()).statusCode()).isEqualTo(403);
        assertThat(admin.post("/admin/deleted/" + item.id() + "/restore", List.of()).statusCode()).isEqualTo(303);

        assertThat(server.store.bays().findByLevel(p, l.id())).isEqualTo(bays);
        assertThat(records(p)).as("the same members, ids and records").isEqualTo(before);
        assertThat(server.store.deleted().list()).noneMatch(i -> i.id() == item.id());
        assertThat(server.office.review().audit().page(5, 0)).anySatisfy(e -> assertThat(e.detail()).contains("bays restored: Bays B-C/1-2"));
    }

    @Test
    void leavingBaysUnframedIsConfirmedFirstAndTheConfirmationNamesTheBays() {
        Client eng = server.as("erin", Role.ENGINEER), admin = server.as("admin", Role.ADMINISTRATOR);
        long p = server.project();
        StoredLevel l = level(p, "Level 2");
        List<Bay> bays = server.store.bays().findByLevel(p, l.id());
        long version = server.store.projects().find(p).version();
        Grid grid = server.store.grids().find(p);

        List<Map.Entry<String, String>> f = new ArrayList<>(List.of(Map.entry("version", String.valueOf(version)),
                Map.entry("action", "clear"), Map.entry("cells", "0,1"), Map.entry("cells", "1,1"), Map.entry("occupancy", "office")));
        HttpResponse<String> asked = eng.post("/projects/" + p + "/levels/" + l.id() + "/bays", f);
        assertThat(asked.statusCode()).isEqualTo(200);
        assertThat(Html.texts(asked.body(), "#bays-to-clear tbody td:first-child"))
                .containsExactly(grid.bayName(0, 1), grid.bayName(1, 1));
        assertThat(Html.shown(asked.body())).contains("kept for 30 days", "licensed engineer");
        assertThat(server.store.bays().findByLevel(p, l.id())).as("nothing cleared yet").isEqualTo(bays);
        assertThat(server.store.projects().find(p).version()).isEqualTo(version);

        // the confirmation's own form, sent as it stands
        List<Map.Entry<String, String>> confirm = new ArrayList<>();
        for (var input : Html.all(asked.body(), "form.danger input[type=hidden]"))
            if (!input.attr("name").equals("_csrf")) confirm.add(Map.entry(input.attr("name"), input.attr("value")));
        assertThat(confirm).contains(Map.entry("confirm", "yes"), Map.entry("occupancy", "office"));
        HttpResponse<String> done = eng.post("/projects/" + p + "/levels/" + l.id() + "/bays", confirm);
        assertThat(done.statusCode()).as(done.body()).isEqualTo(303);
        assertThat(done.headers().firstValue("Location").orElseThrow()).contains("occupancy=office");
        assertThat(server.store.bays().findByLevel(p, l.id())).hasSize(bays.size() - 2);

        DeletedItem item = kept(p);
        assertThat(admin.post("/admin/deleted/" + item.id() + "/restore", List.of()).statusCode()).isEqualTo(303);
        assertThat(server.store.bays().findByLevel(p, l.id())).isEqualTo(bays);
    }

    @Test
    void aRestoreIsRefusedWhereTheCellHoldsABayAgainOrTheGridHasNoRoomForIt() {
        Client eng = server.as("erin", Role.ENGINEER), admin = server.as("admin", Role.ADMINISTRATOR);
        long p = server.project();
        StoredLevel l = level(p, "Level 2");
        Bay was = server.store.bays().findByLevel(p, l.id()).stream().filter(b -> b.col() == 2 && b.row() == 1).findFirst().orElseThrow();
        assertThat(clear(eng, p, l, List.of("2,1")).statusCode()).isEqualTo(303);
        DeletedItem item = kept(p);

        // the cell framed again: refused, nothing stored, still kept
        server.store.bays().assign(Editor.DEMO, p, server.store.projects().find(p).version(), l.id(),
                new com.baysheet.project.BayAssignment(List.of(new com.baysheet.project.Cell(2, 1)), false, was.occupancy(),
                        was.deadLoad() + 5, was.framing(), Map.of()));
        long version = server.store.projects().find(p).version();
        HttpResponse<String> r = admin.post("/admin/deleted/" + item.id() + "/restore", List.of());
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), ".form-errors")).contains("cannot be restored", "holds a bay again");
        assertThat(server.store.projects().find(p).version()).isEqualTo(version);

        // unframed again, but a line added through the bay: no room for it in the grid
        assertThat(clear(eng, p, l, List.of("2,1")).statusCode()).isEqualTo(303);
        Grid g = server.store.grids().find(p);
        List<String> names = new ArrayList<>(g.x().names());
        List<Double> spacings = new ArrayList<>(g.x().spacings());
        names.add(3, "3.5");
        double split = spacings.remove(2);
        spacings.add(2, split / 2);
        spacings.add(3, split / 2);
        server.store.grids().save(Editor.DEMO, p, server.store.projects().find(p).version(), new Grid(new GridAxis("x", names, spacings), g.y()));
        version = server.store.projects().find(p).version();
        r = admin.post("/admin/deleted/" + item.id() + "/restore", List.of());
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), ".form-errors")).contains("cannot be restored", "no room for bay " + item.label().substring(4, 11));
        assertThat(server.store.projects().find(p).version()).isEqualTo(version);
        assertThat(Html.one(r.body(), "#item-" + item.id())).as("still kept").isNotNull();
    }

    /** Every member's and take-down's record by id, as the model derives them now. */
    private static Map<String, String> records(long p) {
        var d = server.store.results().of(p).derived();
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : d.members()) out.put(m.id(), RecordJson.write(m.result().record()) + " | " + m.name() + " " + m.areas());
        for (TakeDown t : d.takeDowns()) out.put("takedown " + t.id(), RecordJson.write(t.record()));
        return out;
    }
}
