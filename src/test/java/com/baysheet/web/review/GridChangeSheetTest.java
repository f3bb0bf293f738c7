package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.SheetRef;
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

/**
 * Grid lines inserted and removed on the demo through the levels page: sheets stay with their members, a
 * member the new line creates starts with no history, and a removal that would merge unlike bays is refused
 * naming them by grid lines.
 */
class GridChangeSheetTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void aLineInsertedAndRemovedLeavesOtherMembersAndTheirSheetsAsTheyWere() {
        Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER);
        long p = server.project();
        DerivedMember far = server.member();
        DerivedMember edge = member("Column A/5 below Roof");
        issue(eng, chk, path(far.id()));
        issue(eng, chk, path(edge.id()));
        Map<String, String> before = records();

        // line 4A splits the bays between lines 4 and 5 on every level
        assertThat(saveGrid(eng, "1 2 3 4 4A 5", "30 30 30 12 18").statusCode()).isEqualTo(303);
        Map<String, String> inserted = records();
        assertThat(inserted.get(far.id())).isEqualTo(before.get(far.id()));
        assertThat(state(eng.get(path(far.id())).body())).isEqualTo("issued");
        // the column on line 5 keeps its id and its sheet: its bay is half as wide, so the issued sheet is superseded
        assertThat(member("Column A/5 below Roof").id()).isEqualTo(edge.id());
        String edgeSheet = eng.get(path(edge.id())).body();
        assertThat(state(edgeSheet)).isEqualTo("being prepared");
        assertThat(Html.shown(edgeSheet)).contains("superseded");
        // members on the new line are new: no sheet history, whatever stood at their place in the list before
        DerivedMember onNewLine = member("Column A/4A below Roof");
        assertThat(before).doesNotContainKey(onNewLine.id());
        for (String id : inserted.keySet())
            if (!before.containsKey(id))
                assertThat(server.office.review().reviews().view(new SheetRef(p, id)).history()).as(id).isEmpty();

        assertThat(saveGrid(eng, "1 2 3 4 5", "30 30 30 30").statusCode()).isEqualTo(303);
        assertThat(records()).isEqualTo(before);
        assertThat(state(eng.get(path(far.id())).body())).isEqualTo("issued");
    }

    @Test
    void removingALineBetweenUnlikeBaysIsRefusedOnThePageNamingTheBaysByGridLines() {
        Client eng = server.as("erin", Role.ENGINEER);
        Map<String, String> before = records();
        HttpResponse<String> r = saveGrid(eng, "1 2 3 5", "30 30 60");
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.shown(r.body())).contains("grid line 4 cannot be removed", "on Level 1 B-C/3-4 and B-C/4-5 (occupancy retail-first / stairs)",
                "Give each pair the same assignment").doesNotContain("bays[");
        assertThat(records()).isEqualTo(before);
    }

    private static HttpResponse<String> saveGrid(Client c, String xNames, String xSpacings) {
        long p = server.project();
        return c.post("/projects/" + p + "/grid", List.of(Map.entry("version", String.valueOf(server.store.projects().find(p).version())),
                Map.entry("x.names", xNames), Map.entry("x.spacings", xSpacings), Map.entry("y.names", "A B C D"),
                Map.entry("y.spacings", "28 10 28")));
    }

    private static void issue(Client eng, Client chk, String sheet) {
        String html = eng.get(sheet).body();
        assertThat(eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")))).statusCode()).isEqualTo(303);
        assertThat(state(eng.get(sheet).body())).isEqualTo("issued");
    }

    private static String path(String member) { return "/review/projects/" + server.project() + "/members/" + member; }

    private static DerivedMember member(String name) {
        return server.store.results().of(server.project()).derived().members().stream().filter(m -> m.name().equals(name))
                .findFirst().orElseThrow(() -> new AssertionError("no member " + name));
    }

    private static Map<String, String> records() {
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : server.store.results().of(server.project()).derived().members())
            out.put(m.id(), RecordJson.write(m.result().record()));
        return out;
    }
}
