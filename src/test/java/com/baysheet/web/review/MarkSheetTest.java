package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.MarkSheets;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.state;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/** A typical member's sheet under its mark: its locations, renaming, the four-eyes rule and the issue's description. */
class MarkSheetTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void theDemosMembersAreFewerSheetsThanMembersAndEachSheetListsItsLocations() {
        var d = server.store.results().of(server.project()).derived();
        MarkSheets marks = server.store.marks().of(server.project(), d);
        assertThat(marks.all()).allSatisfy(s -> assertThat(s.stored()).as("stored by the demo's model writes").isTrue());
        assertThat(marks.all().size()).isLessThan(d.members().size());
        assertThat(marks.all().stream().mapToInt(s -> s.group().members().size()).sum()).isEqualTo(d.members().size());
        Client eng = server.as("ivy", Role.ENGINEER);
        MarkSheets.MarkSheet typical = marks.all().stream().filter(s -> s.group().members().size() > 1).findFirst().orElseThrow();
        String html = eng.get("/review/projects/" + server.project() + "/marks/" + typical.mark().id()).body();
        for (String location : typical.group().locations())
            assertThat(html).contains(location.replace("&", "&amp;"));
        assertThat(html).doesNotContain(typical.group().first().id() + "<");
        // the member's page names its mark, and its old sheet address leads to the mark's
        String member = eng.get("/projects/" + server.project() + "/members/" + typical.group().first().id()).body();
        assertThat(Html.text(member, "#mark > a, #mark > span")).isEqualTo(typical.text());
        assertThat(eng.get("/review/projects/" + server.project() + "/members/" + typical.group().first().id()).statusCode()).isEqualTo(303);
        assertThat(Html.texts(eng.get("/projects/" + server.project() + "/members?group=mark").body(), ".mark")).contains(typical.text());
    }

    @Test
    void aMarkIsRenamedButNeverToAnotherMarksText() {
        var d = server.store.results().of(server.project()).derived();
        List<MarkSheets.MarkSheet> all = server.store.marks().of(server.project(), d).all();
        MarkSheets.MarkSheet one = all.get(0), other = all.get(1);
        String path = "/review/projects/" + server.project() + "/marks/" + one.mark().id();
        Client eng = server.as("jon", Role.ENGINEER);
        var refused = eng.post(path + "/rename", List.of(Map.entry("mark", other.text().toLowerCase())));
        assertThat(refused.statusCode()).isEqualTo(400);
        assertThat(Html.shown(refused.body())).contains("taken");
        assertThat(eng.post(path + "/rename", List.of(Map.entry("mark", "bad mark!"))).statusCode()).isEqualTo(400);
        assertThat(eng.post(path + "/rename", List.of(Map.entry("mark", "TB1"))).statusCode()).isEqualTo(303);
        assertThat(Html.text(eng.get(path).body(), "span#mark")).isEqualTo("TB1");
        assertThat(server.store.marks().of(server.project(), d).byId(one.mark().id()).orElseThrow().text()).isEqualTo("TB1");
    }

    @Test
    void theFourEyesRuleHoldsAndAnIssueSaysWhatItChanges() {
        var d = server.store.results().of(server.project()).derived();
        MarkSheets.MarkSheet s = server.store.marks().of(server.project(), d).all().get(2);
        String path = "/review/projects/" + server.project() + "/marks/" + s.mark().id();
        Client chk = server.as("kim", Role.CHECKER), other = server.as("lou", Role.CHECKER);
        String html = chk.get(path).body();
        assertThat(chk.post(path + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        html = chk.get(path).body();
        assertThat(html).as("no approve button for the sheet's own preparer").doesNotContain("/approve\"");
        html = other.get(path).body();
        assertThat(chk.post(path + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode())
                .as("a checker never approves a mark sheet they prepared").isEqualTo(403);
        assertThat(other.post(path + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = other.get(path).body();
        var bare = other.post(path + "/issue", List.of(Map.entry("version", version(html, "/issue")), Map.entry("description", " ")));
        assertThat(bare.statusCode()).as("an issue without a description is refused").isEqualTo(400);
        assertThat(bare.body()).contains("description");
        assertThat(state(other.get(path).body())).isEqualTo("approved");
        assertThat(other.post(path + "/issue", List.of(Map.entry("version", version(html, "/issue")),
                Map.entry("description", "Issued for permit"))).statusCode()).isEqualTo(303);
        html = other.get(path).body();
        assertThat(state(html)).isEqualTo("issued");
        assertThat(Html.shown(html)).contains("Issued for permit");
        assertThat(Html.all(html, "#changed-since-issue")).isEmpty();
    }
}
