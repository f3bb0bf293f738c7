package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.SheetState;
import com.baysheet.store.review.StoredRevision;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.state;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * The preparer takes a submitted sheet back to being prepared, before any checker has acted on it; nobody else does.
 * A next revision taken back leaves the issued one in force.
 */
class TakeBackTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static MarkSheets.MarkSheet sheet(int i) {
        var c = server.store.results().of(server.project());
        return server.store.marks().of(server.project(), c.derived()).all().stream().filter(MarkSheets.MarkSheet::stored).toList().get(i);
    }

    private static String path(MarkSheets.MarkSheet s) { return "/review/projects/" + server.project() + "/marks/" + s.mark().id(); }

    private static HttpResponse<String> act(Client c, MarkSheets.MarkSheet s, String action) {
        String html = c.get(path(s)).body();
        return c.post(path(s) + "/" + action, List.of(Map.entry("version", version(html, "/" + action))));
    }

    /** A take-back post at the version the page shows, whether or not the page offers the button. */
    private static HttpResponse<String> takeBack(Client c, MarkSheets.MarkSheet s) {
        String html = c.get(path(s)).body();
        String v = String.valueOf(server.office.review().reviews().view(s.ref(server.project())).current().version());
        assertThat(Html.all(html, "form#take-back")).as("the button is not offered").isEmpty();
        return c.post(path(s) + "/take-back", List.of(Map.entry("version", v)));
    }

    private static SheetState stateOf(MarkSheets.MarkSheet s) {
        return server.office.review().reviews().view(s.ref(server.project())).current().revision().state();
    }

    private static List<AuditEvent> entries(String action, MarkSheets.MarkSheet s) {
        String subject = s.ref(server.project()).label();
        return server.office.review().audit().all().stream().filter(e -> e.action().equals(action) && e.subject().equals(subject)).toList();
    }

    @Test
    void thePreparerTakesASubmittedSheetBackAndMaySubmitItAgain() {
        Client eng = server.as("tina", Role.ENGINEER);
        MarkSheets.MarkSheet s = sheet(0);
        assertThat(act(eng, s, "submit").statusCode()).isEqualTo(303);
        String html = eng.get(path(s)).body();
        assertThat(state(html)).isEqualTo("submitted for check");
        assertThat(Html.one(html, "form#take-back button").text()).isEqualTo("Take back to preparing");

        assertThat(act(eng, s, "take-back").statusCode()).isEqualTo(303);
        html = eng.get(path(s)).body();
        assertThat(state(html)).isEqualTo("being prepared");
        assertThat(stateOf(s)).isEqualTo(SheetState.PREPARING);
        assertThat(Html.all(html, "form#take-back")).isEmpty();
        List<AuditEvent> taken = entries("take back", s);
        assertThat(taken).hasSize(1);
        assertThat(taken.get(0).actorUsername()).isEqualTo("tina");
        assertThat(taken.get(0).detail()).isEqualTo("revision 1 now being prepared");

        assertThat(act(eng, s, "submit").statusCode()).as("submitted again from the same revision").isEqualTo(303);
        assertThat(stateOf(s)).isEqualTo(SheetState.SUBMITTED);
        assertThat(server.office.review().reviews().view(s.ref(server.project())).history()).hasSize(1);
    }

    @Test
    void aCheckerCannotTakeBackSomeoneElsesSheetNorThePreparerOnceACheckerMarkedItUp() {
        Client eng = server.as("theo", Role.ENGINEER), chk = server.as("cora", Role.CHECKER);
        MarkSheets.MarkSheet s = sheet(1);
        assertThat(act(eng, s, "submit").statusCode()).isEqualTo(303);
        long refusalsBefore = server.office.review().audit().all().stream().filter(e -> e.action().equals("review action refused")).count();

        HttpResponse<String> refused = takeBack(chk, s);
        assertThat(refused.statusCode()).isEqualTo(403);
        assertThat(Html.shown(refused.body())).contains("Cannot take back: only its preparer (");
        assertThat(stateOf(s)).isEqualTo(SheetState.SUBMITTED);
        assertThat(server.office.review().audit().all().stream().filter(e -> e.action().equals("review action refused")).count())
                .as("a refusal for the person's rights is audited").isEqualTo(refusalsBefore + 1);

        String html = chk.get(path(s)).body();
        String step = Html.one(html, "option[value^=step:]").val();
        assertThat(chk.post(path(s) + "/markups", List.of(Map.entry("target", step), Map.entry("text", "Check the span"))).statusCode())
                .isEqualTo(303);
        refused = takeBack(eng, s);
        assertThat(refused.statusCode()).isEqualTo(409);
        assertThat(Html.shown(refused.body())).contains("a checker has begun: 1 markup(s) are on it");
        assertThat(stateOf(s)).isEqualTo(SheetState.SUBMITTED);
        assertThat(entries("take back", s)).isEmpty();
    }

    @Test
    void anApprovedSheetIsNotTakenBack() {
        Client eng = server.as("tara", Role.ENGINEER), chk = server.as("cass", Role.CHECKER);
        MarkSheets.MarkSheet s = sheet(2);
        assertThat(act(eng, s, "submit").statusCode()).isEqualTo(303);
        assertThat(act(chk, s, "approve").statusCode()).isEqualTo(303);

        HttpResponse<String> refused = takeBack(eng, s);
        assertThat(refused.statusCode()).isEqualTo(409);
        assertThat(Html.shown(refused.body())).contains("Cannot take back: the sheet is approved; only a sheet submitted for check");
        assertThat(stateOf(s)).isEqualTo(SheetState.APPROVED);
        assertThat(entries("take back", s)).isEmpty();
    }

    @Test
    void aNextRevisionTakenBackLeavesTheIssuedRevisionInForceAndLeavesTheCheckersQueue() {
        Client eng = server.as("tomas", Role.ENGINEER), chk = server.as("celia", Role.CHECKER);
        MarkSheets.MarkSheet s = lastOnTheChangedLevel();
        Pages.submitApproveIssue(eng, chk, path(s), "First issue");
        StoredRevision issued = server.office.review().reviews().view(s.ref(server.project())).current();
        assertThat(issued.revision().state()).isEqualTo(SheetState.ISSUED);
        byte[] pdf = eng.getBytes("/review/revisions/" + issued.id() + "/issued.pdf").body();

        server.heavierFloor(5); // the member changes: the next submission opens revision 1
        int waiting = toCheck(chk);
        assertThat(act(eng, s, "submit").statusCode()).isEqualTo(303);
        String html = eng.get(path(s)).body();
        assertThat(state(html)).isEqualTo("submitted for check");
        assertThat(Html.texts(html, "#revisions td:eq(0)")).containsExactly("0", "1");
        assertThat(toCheck(chk)).as("the next revision awaits the checker").isEqualTo(waiting + 1);

        assertThat(act(eng, s, "take-back").statusCode()).isEqualTo(303);

        html = eng.get(path(s)).body();
        assertThat(state(html)).as("back in the preparer's hands").isEqualTo("being prepared");
        assertThat(Html.all(html, "form[action$=/submit]")).as("the preparer may submit it again").hasSize(1);
        assertThat(Html.all(html, "form#take-back")).isEmpty();
        assertThat(Html.texts(html, "#revisions tr")).containsExactly("0 issued " + issued.revision().issue().on() + " First issue issued PDF",
                "1 being prepared");
        assertThat(Html.all(html, "a[href=/review/revisions/" + issued.id() + "/issued.pdf]")).as("its issued copy still offered")
                .isNotEmpty();
        var view = server.office.review().reviews().view(s.ref(server.project()));
        assertThat(view.history()).extracting(r -> r.revision().state()).containsExactly(SheetState.ISSUED, SheetState.PREPARING);
        assertThat(server.office.review().reviews().standing(issued).inForce()).map(StoredRevision::id)
                .as("revision 0 is still the one in force").hasValue(issued.id());
        assertThat(Html.one(eng.upload("/verify", "pdf", "rev0.pdf", pdf).body(), "section#verdict h2").text())
                .isEqualTo("Matches an issued revision, signed by this office");
        assertThat(toCheck(chk)).as("no longer in the checker's queue").isEqualTo(waiting);
        String mine = eng.get(queue() + "?level=" + java.net.URLEncoder.encode(s.group().first().level(), java.nio.charset.StandardCharsets.UTF_8)).body();
        assertThat(Html.text(mine, "table#queue tr[data-mark=" + s.mark().id() + "] td.waiting")).isEqualTo("not yet submitted");
        assertThat(entries("take back", s)).singleElement().satisfies(e -> {
            assertThat(e.actorUsername()).isEqualTo("tomas");
            assertThat(e.detail()).endsWith(" now being prepared");
        });
    }

    /** The last stored sheet on the level {@link ReviewServer#heavierFloor} changes, far from the ones the other tests use. */
    private static MarkSheets.MarkSheet lastOnTheChangedLevel() {
        var c = server.store.results().of(server.project());
        List<MarkSheets.MarkSheet> on = server.store.marks().of(server.project(), c.derived()).all().stream()
                .filter(MarkSheets.MarkSheet::stored).filter(m -> m.group().first().level().equals(server.member().level())).toList();
        assertThat(on.size()).isGreaterThan(3);
        return on.get(on.size() - 1);
    }

    private static String queue() { return "/review/projects/" + server.project() + "/queue"; }

    /** How many sheets the checker's queue says await their check. */
    private static int toCheck(Client chk) {
        return Integer.parseInt(Html.text(chk.get(queue()).body(), "#waiting-counts li[data-waiting=TO_CHECK] strong"));
    }
}
