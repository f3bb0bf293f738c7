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
        DerivedMember far = server.member();
        DerivedMember edge = member("Column A/5 below Roof");
        String farSheet = markPath(far.id()), edgeSheet = markPath(edge.id());
        issue(eng, chk, farSheet);
        issue(eng, chk, edgeSheet);
        Map<String, String> before = records();
        Map<String, String> marksBefore = marks();

        // line 4A splits the bays between lines 4 and 5 on every level
        assertThat(saveGrid(eng, "1 2 3 4 4A 5", "30 30 30 12 18").statusCode()).isEqualTo(303);
        Map<String, String> inserted = records();
        assertThat(inserted.get(far.id())).isEqualTo(before.get(far.id()));
        assertThat(state(eng.get(farSheet).body())).isEqualTo("issued");
        // the column on line 5 keeps its id; its bay is narrower, so its mark's issued sheet is changed since issue
        // (and stays the issued revision until the next is issued)
        assertThat(member("Column A/5 below Roof").id()).isEqualTo(edge.id());
        String edgeHtml = eng.get(edgeSheet).body();
        assertThat(state(edgeHtml)).isEqualTo("issued");
        assertThat(Html.all(edgeHtml, "#changed-since-issue")).isNotEmpty();
        // members on the new line are new: no sheet history, whatever stood at their place in the list before
        DerivedMember onNewLine = member("Column A/4A below Roof");
        assertThat(before).doesNotContainKey(onNewLine.id());
        for (String id : inserted.keySet())
            if (!before.containsKey(id))
                assertThat(server.office.review().reviews().view(new SheetRef(server.project(), id)).history()).as(id).isEmpty();

        assertThat(saveGrid(eng, "1 2 3 4 5", "30 30 30 30").statusCode()).isEqualTo(303);
        assertThat(records()).isEqualTo(before);
        assertThat(marks()).as("every member finds its mark again: marks never renumber").isEqualTo(marksBefore);
        for (String sheet : List.of(farSheet, edgeSheet)) {
            String html = eng.get(sheet).body();
            assertThat(state(html)).isEqualTo("issued");
            assertThat(html).as(sheet).doesNotContain("id=\"changed-since-issue\"");
        }
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
        Pages.submitApproveIssue(eng, chk, sheet, "First issue");
        assertThat(state(eng.get(sheet).body())).isEqualTo("issued");
    }

    /** The sheet of the mark the member carries now. */
    private static String markPath(String member) {
        var d = server.store.results().of(server.project()).derived();
        long id = server.store.marks().of(server.project(), d).ofMember(member).orElseThrow().mark().id();
        return "/review/projects/" + server.project() + "/marks/" + id;
    }

    /** Each member's mark. */
    private static Map<String, String> marks() {
        var d = server.store.results().of(server.project()).derived();
        var marks = server.store.marks().of(server.project(), d);
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : d.members()) out.put(m.id(), marks.label(m.id()));
        return out;
    }

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
