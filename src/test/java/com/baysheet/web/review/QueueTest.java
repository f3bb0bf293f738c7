package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.MarkSheets;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/** The check queue: each person sees what waits for them, filtered, with counts per state. */
class QueueTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static List<MarkSheets.MarkSheet> sheets() {
        var d = server.store.results().of(server.project()).derived();
        return server.store.marks().of(server.project(), d).all();
    }

    private static String queue() { return "/review/projects/" + server.project() + "/queue"; }

    private static String path(MarkSheets.MarkSheet s) { return "/review/projects/" + server.project() + "/marks/" + s.mark().id(); }

    private static void submit(Client c, MarkSheets.MarkSheet s) {
        String html = c.get(path(s)).body();
        assertThat(c.post(path(s) + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
    }

    /** The marks the queue lists, as their ids. */
    private static Set<Long> listed(String html) {
        return Html.all(html, "table#queue tbody tr").stream().map(r -> Long.parseLong(r.attr("data-mark"))).collect(Collectors.toSet());
    }

    private static long id(MarkSheets.MarkSheet s) { return s.mark().id(); }

    @Test
    void eachPersonSeesWhatWaitsForThemAndACheckerExactlyTheSheetsOthersSubmitted() {
        Client eng = server.as("ned", Role.ENGINEER), cleo = server.as("cleo", Role.CHECKER), dora = server.as("dora", Role.CHECKER);
        List<MarkSheets.MarkSheet> all = sheets();
        MarkSheets.MarkSheet a = all.get(0), b = all.get(1), own = all.get(2), untouched = all.get(3);
        submit(eng, a);
        submit(eng, b);
        submit(cleo, own);

        String html = cleo.get(queue()).body();
        assertThat(listed(html)).as("submitted by others, awaiting this checker").containsExactlyInAnyOrder(id(a), id(b));
        assertThat(Html.texts(html, "table#queue td.waiting")).containsOnly("awaiting your check");
        assertThat(Html.text(html, "#waiting-counts li[data-waiting=TO_CHECK] strong")).isEqualTo("2");
        assertThat(Html.text(html, "#state-counts td[data-state=SUBMITTED]")).isEqualTo("2");
        assertThat(listed(dora.get(queue()).body())).as("another checker also sees the one cleo prepared")
                .containsExactlyInAnyOrder(id(a), id(b), id(own));

        // the person's own queue across the office counts the same, and the header leads to it
        String office = cleo.get("/review/queue").body();
        assertThat(Html.text(office, "tr[data-project=" + server.project() + "] td[data-waiting=TO_CHECK]")).isEqualTo("2");
        assertThat(Html.all(html, "nav.global a[href=/review/queue]")).isNotEmpty();

        String mine = eng.get(queue()).body();
        assertThat(listed(mine)).as("the engineer's queue: what nobody has submitted yet").contains(id(untouched))
                .doesNotContain(id(a), id(b), id(own));
        assertThat(Html.all(mine, "button[formaction$=/batch/approve]")).as("no approve offered to an engineer").isEmpty();

        // every sheet, filtered by state and by preparer
        String submitted = eng.get(queue() + "?show=all&state=SUBMITTED").body();
        assertThat(listed(submitted)).containsExactlyInAnyOrder(id(a), id(b), id(own));
        assertThat(listed(eng.get(queue() + "?show=all&preparer=" + cleo.user.initials()).body())).containsExactly(id(own));
        String level = a.group().first().level();
        assertThat(Html.texts(eng.get(queue() + "?show=all&level=" + java.net.URLEncoder.encode(level, java.nio.charset.StandardCharsets.UTF_8)).body(),
                "table#queue tbody tr td:eq(2)")).isNotEmpty().containsOnly(level);
        assertThat(eng.get(queue() + "?state=LOST").statusCode()).as("an unknown state is named").isEqualTo(400);
    }

    @Test
    void aSheetReturnedWithMarkupsWaitsForItsPreparerAndTheCheckerResolvesAMarkupThatNeedsNoChange() {
        Client eng = server.as("olga", Role.ENGINEER), chk = server.as("piet", Role.CHECKER);
        MarkSheets.MarkSheet s = sheets().get(5);
        submit(eng, s);
        chk.post(path(s) + "/markups", List.of(Map.entry("target", "sheet"), Map.entry("text", "Is the span right?")));
        String html = chk.get(path(s)).body();
        assertThat(chk.post(path(s) + "/return", List.of(Map.entry("version", version(html, "/return")))).statusCode()).isEqualTo(303);

        String mine = eng.get(queue()).body();
        assertThat(Html.text(mine, "table#queue tr[data-mark=" + id(s) + "] td.waiting")).isEqualTo("returned to you with markups");
        assertThat(listed(server.as("quin", Role.ENGINEER).get(queue()).body())).as("not another engineer's").doesNotContain(id(s));

        // the span is right: the checker resolves the markup on the returned sheet, and the model is not touched
        long modelVersion = server.store.projects().find(server.project()).version();
        html = chk.get(path(s)).body();
        String markup = Html.one(html, "[id^=markup-]").id().substring("markup-".length());
        assertThat(chk.post(path(s) + "/markups/" + markup + "/resolve",
                List.of(Map.entry("version", version(html, "/markups/" + markup + "/resolve")))).statusCode()).isEqualTo(303);
        html = eng.get(path(s)).body();
        assertThat(Html.text(html, "#markup-" + markup + " .markup-state")).isEqualTo("(resolved)");
        assertThat(server.store.projects().find(server.project()).version()).isEqualTo(modelVersion);
        assertThat(eng.post(path(s) + "/resubmit", List.of(Map.entry("version", version(html, "/resubmit")))).statusCode()).isEqualTo(303);
        assertThat(Pages.state(chk.get(path(s)).body())).isEqualTo("resubmitted");
    }

    @Test
    void theHomePageCountsWhatWaitsForEachPersonAsTheirQueuesDo() {
        Client eng = server.as("rhea", Role.ENGINEER), chk = server.as("saul", Role.CHECKER), admin = server.as("admin", Role.ADMINISTRATOR);
        MarkSheets.MarkSheet s = sheets().get(7);
        String before = Html.text(chk.get(queue()).body(), "#waiting-counts li[data-waiting=TO_CHECK] strong");
        submit(eng, s);

        String home = chk.get("/projects").body();
        String queue = chk.get(queue()).body();
        String toCheck = Html.text(queue, "#waiting-counts li[data-waiting=TO_CHECK] strong");
        assertThat(Integer.parseInt(toCheck)).isEqualTo(Integer.parseInt(before) + 1);
        var row = Html.all(home, "table.list tbody tr").stream()
                .filter(r -> r.selectFirst("td.waiting a[href=/review/projects/" + server.project() + "/queue]") != null).toList();
        assertThat(row).as("the project's line leads to its queue").hasSize(1);
        int total = Html.all(queue, "#waiting-counts li strong").stream().mapToInt(e -> Integer.parseInt(e.text())).sum();
        assertThat(row.get(0).selectFirst("td.waiting").text()).isEqualTo(String.valueOf(total));
        // the office-wide sums: every project's queue, this one's among them
        String office = chk.get("/review/queue").body();
        int everywhere = Html.texts(office, "td[data-waiting=TO_CHECK]").stream().mapToInt(Integer::parseInt).sum();
        assertThat(Html.text(home, "#waiting li[data-waiting=TO_CHECK] strong")).isEqualTo(String.valueOf(everywhere));
        assertThat(everywhere).isGreaterThanOrEqualTo(Integer.parseInt(toCheck));

        assertThat(Html.all(eng.get("/projects").body(), "#waiting li[data-waiting=TO_CHECK]"))
                .as("an engineer checks nothing").isEmpty();
        String adminHome = admin.get("/projects").body();
        assertThat(Html.all(adminHome, "#waiting")).as("the administrator neither prepares nor checks").isEmpty();
        assertThat(Html.all(adminHome, "td.waiting")).isEmpty();
    }
}
