package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetState;
import com.baysheet.store.DeletedItem;
import com.baysheet.store.NotFound;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static com.baysheet.web.review.Pages.state;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * Deletes that can be undone: every delete goes through its confirmation page (a post without confirm=yes is
 * refused, naming the field, and changes nothing); a deleted level is kept and restored by the administrator with
 * the same members and records, its issued sheet withdrawn and kept, and still withdrawn after the restore; a project
 * that issued a sheet cannot be deleted; one that did not is deleted and restored; nobody but the administrator sees
 * or restores the kept items.
 */
class DeletesTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void aDeleteWithoutItsConfirmationIsRefusedNamingTheFieldAndChangesNothing() {
        Client eng = server.as("erin", Role.ENGINEER);
        long p = server.project();
        StoredLevel l = server.store.levels().findByProject(p).get(0);
        long before = server.store.projects().find(p).version();
        for (String path : List.of("/projects/" + p + "/levels/" + l.id() + "/delete", "/projects/" + p + "/delete")) {
            HttpResponse<String> r = eng.post(path, List.of(Map.entry("version", String.valueOf(before))));
            assertThat(r.statusCode()).as(path).isEqualTo(400);
            assertThat(Html.shown(r.body())).contains("confirm").contains("must be yes");
            HttpResponse<String> no = eng.post(path, List.of(Map.entry("version", String.valueOf(before)), Map.entry("confirm", "no")));
            assertThat(no.statusCode()).isEqualTo(400);
        }
        assertThat(server.store.projects().find(p).version()).as("nothing saved").isEqualTo(before);
        assertThat(server.store.levels().find(p, l.id())).isEqualTo(l);
        assertThat(server.store.deleted().list()).noneMatch(i -> i.projectId() == p && i.kind().equals(DeletedItem.LEVEL));
    }

    @Test
    void aDeletedLevelIsRestoredWithTheSameMembersAndItsIssuedSheetStaysWithdrawn() {
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER), admin = server.as("admin", Role.ADMINISTRATOR);
        long p = server.project();
        issue(eng, chk);
        SheetRef issued = server.ref();
        String sheet = server.sheetPath();
        String levelName = server.member().level();
        StoredLevel level = server.store.levels().findByProject(p).stream().filter(x -> x.name().equals(levelName)).findFirst().orElseThrow();
        Map<String, String> before = records(p);
        int members = (int) server.store.results().of(p).derived().members().stream().filter(m -> m.level().equals(levelName)).count();

        // the confirmation page says what goes, in the user's words, and that the issued sheet is withdrawn
        String confirm = "/projects/" + p + "/levels/" + level.id() + "/delete";
        String page = eng.get(confirm).body();
        assertThat(Html.text(page, "#members")).startsWith(members + " members");
        assertThat(Html.text(page, "#issued")).contains(server.mark().text()).contains("withdrawn and kept");
        assertThat(Html.all(page, "script:not([src])")).as("no inline script").isEmpty();
        assertThat(Html.one(page, "form[action$=/delete] input[name=confirm]").val()).isEqualTo("yes");
        assertThat(page).contains("licensed engineer");

        HttpResponse<String> done = eng.post(confirm, List.of(Map.entry("version", version(page, "/delete")), Map.entry("confirm", "yes")));
        assertThat(done.statusCode()).isEqualTo(303);
        assertThatThrownBy(() -> server.store.levels().find(p, level.id())).isInstanceOf(NotFound.class);
        assertThat(server.store.results().of(p).derived().onLevel(levelName)).isEmpty();
        // the issued sheet is kept, withdrawn: its revision is still the issued one, no longer in force
        var view = server.office.review().reviews().view(issued);
        assertThat(view.current().revision().state()).isEqualTo(SheetState.ISSUED);
        assertThat(view.withdrawn()).isTrue();
        assertThat(Html.one(eng.get(sheet).body(), "#withdrawn")).isNotNull();

        // the administrator's list shows it, in the user's words, and restores it
        String list = admin.get("/admin/deleted").body();
        var item = server.store.deleted().list().stream().filter(i -> i.kind().equals(DeletedItem.LEVEL) && i.projectId() == p)
                .findFirst().orElseThrow();
        assertThat(Html.text(list, "#item-" + item.id() + " .label")).startsWith(levelName + " of ");
        assertThat(item.members()).isEqualTo(members);
        HttpResponse<String> restored = admin.post("/admin/deleted/" + item.id() + "/restore", List.of());
        assertThat(restored.statusCode()).isEqualTo(303);
        assertThat(server.store.deleted().list()).noneMatch(i -> i.id() == item.id());

        assertThat(records(p)).as("the same members, ids and records").isEqualTo(before);
        assertThat(server.store.levels().find(p, level.id()).info()).isEqualTo(level.info());
        // the restored member's mark does not make the old issued sheet current again
        assertThat(server.office.review().reviews().view(issued).withdrawn()).isTrue();
        String html = eng.get(sheet).body();
        assertThat(Html.one(html, "#withdrawn")).isNotNull();
        assertThat(Html.all(html, "#changed-since-issue")).isEmpty();
        assertThat(state(html)).isEqualTo("issued");
        assertThat(server.office.review().audit().page(50, 0)).anySatisfy(e -> assertThat(e.detail()).contains("level restored: " + levelName));

        // its calculation is unchanged, yet the withdrawn issue no longer stands: the next revision is submitted
        int issuedNumber = server.office.review().reviews().view(issued).current().revision().number();
        assertThat(eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        var next = server.office.review().reviews().view(issued).current().revision();
        assertThat(next.number()).isEqualTo(issuedNumber + 1);
        assertThat(next.state()).isEqualTo(SheetState.SUBMITTED);
    }

    @Test
    void aLevelWhoseNameIsTakenAgainIsNotRestoredAndTheListSaysWhy() {
        Client eng = server.as("erin", Role.ENGINEER), admin = server.as("admin", Role.ADMINISTRATOR);
        Project deck = deck();
        StoredLevel l = server.store.levels().findByProject(deck.id()).get(0);
        String confirm = "/projects/" + deck.id() + "/levels/" + l.id() + "/delete";
        assertThat(eng.post(confirm, List.of(Map.entry("version", version(eng.get(confirm).body(), "/delete")),
                Map.entry("confirm", "yes"))).statusCode()).isEqualTo(303);
        server.store.levels().add(com.baysheet.store.Editor.DEMO, deck.id(), server.store.projects().find(deck.id()).version(), l.info());
        var item = server.store.deleted().list().stream().filter(i -> i.projectId() == deck.id()).findFirst().orElseThrow();
        long version = server.store.projects().find(deck.id()).version();
        HttpResponse<String> r = admin.post("/admin/deleted/" + item.id() + "/restore", List.of());
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), ".form-errors")).contains("cannot be restored").contains("already the name");
        assertThat(server.store.projects().find(deck.id()).version()).as("nothing saved").isEqualTo(version);
        assertThat(Html.one(r.body(), "#item-" + item.id())).as("still kept").isNotNull();
    }

    @Test
    void aProjectThatIssuedASheetCannotBeDeleted() {
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER);
        issue(eng, chk);
        long p = server.project();
        String page = eng.get("/projects/" + p + "/delete").body();
        assertThat(Html.text(page, "#issued-refusal")).contains("cannot be deleted").contains("issued sheets");
        assertThat(Html.all(page, "form[action$=/delete]")).isEmpty();
        HttpResponse<String> r = eng.post("/projects/" + p + "/delete", List.of(
                Map.entry("version", String.valueOf(server.store.projects().find(p).version())), Map.entry("confirm", "yes")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), ".form-errors")).contains("cannot be deleted: it has issued sheets");
        assertThat(server.store.projects().find(p).id()).isEqualTo(p);
    }

    @Test
    void aProjectWithNoIssuedSheetIsDeletedAndRestoredByTheAdministratorAlone() {
        Client eng = server.as("erin", Role.ENGINEER), admin = server.as("admin", Role.ADMINISTRATOR);
        Project deck = deck();
        int levels = server.store.levels().findByProject(deck.id()).size();
        String file = server.store.exports().of(deck.id()).toString();
        String confirm = "/projects/" + deck.id() + "/delete";
        String page = eng.get(confirm).body();
        assertThat(Html.text(page, "#what-goes")).contains(levels + (levels == 1 ? " level and " : " levels and "))
                .contains(server.store.results().of(deck.id()).derived().members().size() + " members");
        assertThat(eng.post(confirm, List.of(Map.entry("version", version(page, "/delete")), Map.entry("confirm", "yes"))).statusCode())
                .isEqualTo(303);
        assertThatThrownBy(() -> server.store.projects().find(deck.id())).isInstanceOf(NotFound.class);

        // only the administrator sees and restores what was deleted
        assertThat(eng.get("/admin/deleted").statusCode()).isEqualTo(403);
        var item = server.store.deleted().list().stream().filter(i -> i.kind().equals(DeletedItem.PROJECT)).findFirst().orElseThrow();
        assertThat(eng.post("/admin/deleted/" + item.id() + "/restore", List.of()).statusCode()).isEqualTo(403);
        assertThat(Html.text(admin.get("/admin/deleted").body(), "#item-" + item.id() + " .label"))
                .isEqualTo(deck.info().jobNumber() + " " + deck.info().name());

        assertThat(admin.post("/admin/deleted/" + item.id() + "/restore", List.of()).statusCode()).isEqualTo(303);
        Project back = server.store.projects().findAll().stream().filter(x -> x.info().jobNumber().equals(deck.info().jobNumber()))
                .findFirst().orElseThrow();
        assertThat(back.info()).isEqualTo(deck.info());
        assertThat(server.store.exports().of(back.id()).toString()).as("the same model, grid line ids and all").isEqualTo(file);
    }

    /** The demo's second project, which issues nothing here, as it stands now (deleted and restored, its id changes). */
    private static Project deck() {
        String job = server.demo.get(1).info().jobNumber();
        return server.store.projects().findAll().stream().filter(x -> x.info().jobNumber().equals(job)).findFirst().orElseThrow();
    }

    /** Every member's and take-down's record by id, as the model derives them now. */
    private static Map<String, String> records(long p) {
        var d = server.store.results().of(p).derived();
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : d.members()) out.put(m.id(), RecordJson.write(m.result().record()) + " | " + m.name() + " " + m.areas());
        for (TakeDown t : d.takeDowns()) out.put("takedown " + t.id(), RecordJson.write(t.record()));
        return out;
    }

    private static void issue(Client eng, Client chk) {
        // once issued (whatever came after: withdrawn, a next revision submitted), the project has an issued revision
        if (server.office.review().reviews().view(server.ref()).history().stream()
                .anyMatch(r -> r.revision().state() == SheetState.ISSUED || r.revision().state() == SheetState.SUPERSEDED)) return;
        String sheet = server.sheetPath();
        Pages.submitApproveIssue(eng, chk, sheet, "First issue");
        assertThat(state(eng.get(sheet).body())).isEqualTo("issued");
    }
}
