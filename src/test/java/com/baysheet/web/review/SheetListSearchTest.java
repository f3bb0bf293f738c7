package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.MarkSheets;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The text search on the project's sheet list and on the check queue, alone and with the queue's filters. */
class SheetListSearchTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static List<MarkSheets.MarkSheet> marks() {
        var c = server.store.results().of(server.project());
        return server.store.marks().of(server.project(), c.derived()).all();
    }

    private static String list(String q) {
        return "/review/projects/" + server.project() + "?q=" + URLEncoder.encode(q, StandardCharsets.UTF_8);
    }

    private static List<String> listed(String html) {
        return Html.all(html, "table#sheets tbody tr").stream().map(r -> r.selectFirst("td").text()).toList();
    }

    @Test
    void aMarkIsFoundByItsMarkAndNoOtherSheetWithoutIt() {
        Client eng = server.as("sam", Role.ENGINEER);
        MarkSheets.MarkSheet g = marks().stream().filter(m -> m.text().startsWith("G") && !m.text().startsWith("GB")).findFirst().orElseThrow();
        List<String> found = listed(eng.get(list(g.text().toLowerCase())).body());
        assertThat(found).contains(g.text());
        List<String> expected = marks().stream().filter(m -> m.text().toLowerCase().contains(g.text().toLowerCase())
                || m.group().locations().stream().anyMatch(l -> l.toLowerCase().contains(g.text().toLowerCase()))
                || m.group().role().name().toLowerCase().contains(g.text().toLowerCase())).map(MarkSheets.MarkSheet::text).toList();
        assertThat(found).containsExactlyElementsOf(expected);
        assertThat(found.size()).isLessThan(marks().size());
    }

    @Test
    void wordsNarrowTheSearchOverLevelAndGridPlace() {
        Client eng = server.as("sue", Role.ENGINEER);
        MarkSheets.MarkSheet some = marks().get(marks().size() / 2);
        var member = some.group().first();
        // the level (a phrase in quotes) and the member's grid place as the sheet lists it ("Level 2: Girder A/1-2")
        String place = member.name().split(" ")[1];
        String typed = "\"" + member.level() + "\"  " + place;
        String html = eng.get(list(typed)).body();
        List<String> found = listed(html);
        assertThat(found).contains(some.text());
        for (Element row : Html.all(html, "table#sheets tbody tr")) {
            String text = row.selectFirst("td").text();
            var m = marks().stream().filter(x -> x.text().equals(text)).findFirst().orElseThrow();
            assertThat(m.group().locations()).as(text).anyMatch(l -> l.toLowerCase().contains(member.level().toLowerCase())
                    && l.toLowerCase().contains(place.toLowerCase()));
        }
        assertThat(found.size()).isLessThan(marks().size());
        assertThat(Html.one(html, "form#search input[name=q]").val()).isEqualTo(typed);
    }

    @Test
    void anEmptyResultSaysSo() {
        Client eng = server.as("sal", Role.ENGINEER);
        String html = eng.get(list("nowhere-at-all")).body();
        assertThat(listed(html)).isEmpty();
        assertThat(Html.text(html, "#no-match")).isEqualTo("No sheet matches “nowhere-at-all”.");
        assertThat(Html.all(eng.get(list("")).body(), "#no-match")).isEmpty();
        assertThat(listed(eng.get(list("")).body())).hasSize(marks().size());
    }

    @Test
    void theQueueSearchesTogetherWithItsFilters() {
        Client chk = server.as("cliff", Role.CHECKER);
        MarkSheets.MarkSheet c = marks().stream().filter(m -> m.text().startsWith("C") && m.stored()).findFirst().orElseThrow();
        String level = c.group().first().level();
        String base = "/review/projects/" + server.project() + "/queue?show=all&level=" + URLEncoder.encode(level, StandardCharsets.UTF_8);
        String html = chk.get(base + "&q=" + c.text()).body();
        List<String> found = Html.all(html, "table#queue tbody tr").stream().map(r -> r.select("td").get(1).text()).toList();
        assertThat(found).contains(c.text());
        for (Element row : Html.all(html, "table#queue tbody tr")) assertThat(row.select("td").get(2).text()).isEqualTo(level);
        assertThat(Html.one(html, "form.filters input[name=q]").val()).isEqualTo(c.text());

        String none = chk.get(base + "&role=INFILL_BEAM&q=" + c.text() + "x9").body();
        assertThat(Html.all(none, "table#queue tbody tr")).isEmpty();
        assertThat(Html.text(none, "#no-match")).isEqualTo("No sheet matches “" + c.text() + "x9” with these filters.");
    }

    @Test
    void anOverlongSearchIsRefusedNamingTheField() {
        Client eng = server.as("sid", Role.ENGINEER);
        var r = eng.get(list("x".repeat(101)));
        assertThat(r.statusCode()).isBetween(400, 499);
        assertThat(Html.shown(r.body())).contains("q").contains("at most 100 characters");
    }
}
