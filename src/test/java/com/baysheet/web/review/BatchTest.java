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
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/** Batch submit, approve and issue from the check queue, each sheet under the single actions' rules. */
class BatchTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static MarkSheets.MarkSheet sheet(int n) {
        var d = server.store.results().of(server.project()).derived();
        return server.store.marks().of(server.project(), d).all().get(n);
    }

    private static String project() { return "/review/projects/" + server.project(); }

    private static String path(MarkSheets.MarkSheet s) { return project() + "/marks/" + s.mark().id(); }

    private static void act(Client c, MarkSheets.MarkSheet s, String action) {
        String html = c.get(path(s)).body();
        assertThat(c.post(path(s) + "/" + action, List.of(Map.entry("version", version(html, "/" + action)))).statusCode()).isEqualTo(303);
    }

    /** The tick box values of these sheets as the queue (every sheet) shows them to this person. */
    private static List<Map.Entry<String, String>> ticks(Client c, MarkSheets.MarkSheet... sheets) {
        String html = c.get(project() + "/queue?show=all").body();
        List<Map.Entry<String, String>> out = new ArrayList<>();
        for (MarkSheets.MarkSheet s : sheets)
            out.add(Map.entry("sheet", Html.one(html, "table#queue tr[data-mark=" + s.mark().id() + "] input[name=sheet]").val()));
        return out;
    }

    private static SheetState state(MarkSheets.MarkSheet s) {
        return server.office.review().reviews().view(s.ref(server.project())).current().revision().state();
    }

    /** The batch result page the post redirected to: each sheet's outcome by mark id. */
    private static Map<Long, String> outcomes(Client c, HttpResponse<String> posted) {
        assertThat(posted.statusCode()).as(posted.body()).isEqualTo(303);
        String html = c.get(posted.headers().firstValue("Location").orElseThrow()).body();
        return Html.all(html, "table#batch-outcomes tbody tr").stream()
                .collect(Collectors.toMap(r -> Long.parseLong(r.attr("data-mark")), r -> r.selectFirst("td.outcome").text()));
    }

    private static long entries(String action, MarkSheets.MarkSheet s) {
        String subject = s.ref(server.project()).label();
        return server.office.review().audit().all().stream().filter(e -> e.action().equals(action) && e.subject().equals(subject)).count();
    }

    @Test
    void aBatchApproveApprovesTheValidSheetsAndSaysWhyTheOthersWereRefused() {
        Client eng = server.as("ena", Role.ENGINEER), chk = server.as("cyd", Role.CHECKER);
        MarkSheets.MarkSheet own = sheet(0), notSubmitted = sheet(1), one = sheet(2), two = sheet(3);
        var submitted = outcomes(eng, eng.post(project() + "/batch/submit", ticks(eng, one, two)));
        assertThat(submitted.values()).containsOnly("done: submitted for check");
        act(chk, own, "submit");
        long before = server.office.review().audit().count();

        var out = outcomes(chk, chk.post(project() + "/batch/approve", ticks(chk, own, notSubmitted, one, two)));
        assertThat(out).hasSize(4);
        assertThat(out.get(one.mark().id())).isEqualTo("done: approved");
        assertThat(out.get(two.mark().id())).isEqualTo("done: approved");
        assertThat(out.get(own.mark().id())).startsWith("refused: Cannot approve").contains("you prepared this sheet");
        assertThat(out.get(notSubmitted.mark().id())).startsWith("refused: Cannot approve").contains("being prepared");
        assertThat(state(one)).isEqualTo(SheetState.APPROVED);
        assertThat(state(two)).isEqualTo(SheetState.APPROVED);
        assertThat(state(own)).as("left as it was").isEqualTo(SheetState.SUBMITTED);
        assertThat(state(notSubmitted)).isEqualTo(SheetState.PREPARING);
        assertThat(entries("approve", one)).isEqualTo(1);
        assertThat(entries("approve", two)).isEqualTo(1);
        assertThat(entries("approve", own) + entries("approve", notSubmitted)).isZero();
        // the trail's newest entries first: what the batch added
        List<AuditEvent> added = server.office.review().audit().page((int) (server.office.review().audit().count() - before), 0);
        assertThat(added).extracting(AuditEvent::action).as("one entry per approved sheet, and the four-eyes refusal recorded")
                .containsExactlyInAnyOrder("approve", "approve", "review action refused");
    }

    @Test
    void aBatchIssueIsConfirmedFirstAndThePreparerNeverIssuesTheirOwn() {
        Client eng = server.as("eli", Role.ENGINEER), chk = server.as("cass", Role.CHECKER), other = server.as("otto", Role.CHECKER);
        MarkSheets.MarkSheet ready = sheet(4), hers = sheet(5), submittedOnly = sheet(6);
        act(eng, ready, "submit");
        act(chk, ready, "approve");
        act(chk, hers, "submit");
        act(other, hers, "approve");
        act(eng, submittedOnly, "submit");

        List<Map.Entry<String, String>> fields = new ArrayList<>(ticks(chk, ready, hers, submittedOnly));
        fields.add(Map.entry("description", "Issued for permit"));
        HttpResponse<String> bare = chk.post(project() + "/batch/issue", fields);
        assertThat(bare.statusCode()).as("not without the confirmation").isEqualTo(400);
        assertThat(Html.shown(bare.body())).contains("confirm");
        assertThat(state(ready)).isEqualTo(SheetState.APPROVED);

        HttpResponse<String> ask = chk.post(project() + "/batch/issue/ask", ticks(chk, ready, hers, submittedOnly));
        assertThat(ask.statusCode()).isEqualTo(303);
        String page = chk.get(ask.headers().firstValue("Location").orElseThrow()).body();
        assertThat(Html.all(page, "table#to-issue tbody tr").eachAttr("data-mark")).containsExactlyInAnyOrder(
                String.valueOf(ready.mark().id()), String.valueOf(hers.mark().id()), String.valueOf(submittedOnly.mark().id()));
        assertThat(Html.text(page, "#ready")).startsWith("1 of 3");
        assertThat(state(ready)).as("the confirmation page issues nothing").isEqualTo(SheetState.APPROVED);

        List<Map.Entry<String, String>> confirmed = new ArrayList<>();
        for (var in : Html.all(page, "form#confirm-issue input[type=hidden]")) confirmed.add(Map.entry(in.attr("name"), in.val()));
        confirmed.add(Map.entry("description", "Issued for permit"));
        var out = outcomes(chk, chk.post(project() + "/batch/issue", confirmed));
        assertThat(out.get(ready.mark().id())).isEqualTo("done: issued");
        assertThat(out.get(hers.mark().id())).contains("you prepared this sheet").contains("issued by someone other than its preparer");
        assertThat(out.get(submittedOnly.mark().id())).contains("only an approved sheet is issued");
        assertThat(state(ready)).isEqualTo(SheetState.ISSUED);
        assertThat(state(hers)).isEqualTo(SheetState.APPROVED);
        assertThat(state(submittedOnly)).isEqualTo(SheetState.SUBMITTED);
        assertThat(entries("issue", ready)).isEqualTo(1);
        assertThat(Pages.first(chk.get(path(ready)).body(), "(Issued for permit)")).isEqualTo("Issued for permit");
    }

    @Test
    void aBatchTakesAtMostFiveHundredSheets() {
        Client chk = server.as("cato", Role.CHECKER);
        List<Map.Entry<String, String>> many = new ArrayList<>();
        for (int i = 1; i <= 501; i++) many.add(Map.entry("sheet", i + ":0"));
        HttpResponse<String> r = chk.post(project() + "/batch/approve", many);
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(Html.shown(r.body())).contains("sheet").contains("at most 500").contains("limit sheet");
        String ids = java.util.stream.IntStream.rangeClosed(1, 501).mapToObj(String::valueOf).collect(Collectors.joining(","));
        assertThat(chk.get(project() + "/batch/issue?sheets=" + ids).statusCode()).isEqualTo(400);
        assertThat(chk.post(project() + "/batch/approve", List.of()).statusCode()).as("nothing ticked").isEqualTo(400);
    }

    @Test
    void anEngineerCannotBatchApproveEachSheetIsRefusedByTheRules() {
        Client eng = server.as("eva", Role.ENGINEER), chk = server.as("cleve", Role.CHECKER);
        MarkSheets.MarkSheet s = sheet(7);
        act(chk, s, "submit");
        var out = outcomes(eng, eng.post(project() + "/batch/approve", ticks(eng, s)));
        assertThat(out.get(s.mark().id())).isEqualTo("refused: Cannot approve: only a checker may do this");
        assertThat(state(s)).isEqualTo(SheetState.SUBMITTED);
        assertThat(server.as("admin", Role.ADMINISTRATOR).post(project() + "/batch/approve", ticks(eng, s)).statusCode())
                .as("the administrator does not take part in the check").isEqualTo(403);
    }
}
