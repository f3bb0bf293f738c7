package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.SheetState;
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

/** The preparer takes a submitted sheet back to being prepared, before any checker has acted on it; nobody else does. */
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
}
