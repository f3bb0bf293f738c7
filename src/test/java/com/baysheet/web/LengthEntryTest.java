package com.baysheet.web;

import com.baysheet.framing.model.Grid;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Lengths typed as engineers write them, over real HTTP: a grid given in feet and inches is stored in ft
 * and shown back, and a form with several bad fields shows every refusal at once with the text as typed.
 */
class LengthEntryTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static long project;

    @BeforeAll
    static void start() {
        project = server.alder().id();
    }

    @Test
    void aGridInFeetAndInchesIsStoredInFeetAndShownBack() {
        Grid before = server.store.grids().find(project);
        String x = String.join(" ", before.x().names()), y = String.join(" ", before.y().names());
        String xs = "25'-6\"" + " 30".repeat(before.x().names().size() - 2);
        String ys = spacings(before.y().names().size() - 1);
        HttpResponse<String> r = server.post("/projects/" + project + "/grid", List.of(entry("version", String.valueOf(server.version(project))),
                entry("x.names", x), entry("x.spacings", xs), entry("y.names", y), entry("y.spacings", ys)));
        assertThat(r.statusCode()).isEqualTo(303);
        Grid after = server.store.grids().find(project);
        assertThat(after.x().spacings().get(0)).isEqualTo(25.5);
        assertThat(after.y().spacings().get(0)).isEqualTo(28 + 6.5 / 12);
        assertThat(server.get("/projects/" + project + "/levels").body()).contains("value=\"25.5 30");
    }

    /** 28'-6 1/2", then 10' spacings, for a y axis of n spacings. */
    private static String spacings(int n) {
        return "28'-6 1/2\"" + " 10'".repeat(n - 1);
    }

    @Test
    void threeBadFieldsOfALevelAreRefusedTogetherWithTheTextKept() {
        long version = server.version(project);
        HttpResponse<String> r = server.post("/projects/" + project + "/levels", List.of(entry("version", String.valueOf(version)),
                entry("name", ""), entry("elevation", "-12-6"), entry("roof", "on"), entry("roofSlope", "6:0")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("id=\"error-name\"", "id=\"error-elevation\"", "id=\"error-roofSlope\"")
                .contains("value=\"-12-6\"", "value=\"6:0\"")
                .contains(ResultPagesTest.html("write -12'-6\""))
                .doesNotContain("Exception");
        assertThat(server.version(project)).isEqualTo(version);
    }

    @Test
    void aRefusedFormShowsWhatTheGoodFieldsWereReadAs() {
        HttpResponse<String> r = server.post("/projects/" + project + "/levels", List.of(entry("version", String.valueOf(server.version(project))),
                entry("name", ""), entry("elevation", "-12'-6\""), entry("roof", "on"), entry("roofSlope", "6:12")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("id=\"error-name\"", "id=\"reading-elevation\"", "= -12.5 ft", "= 6 in/ft")
                .contains("value=\"" + ResultPagesTest.html("-12'-6\"") + "\"");
    }

    @Test
    void threeBadGridFieldsAreRefusedTogether() {
        long version = server.version(project);
        HttpResponse<String> r = server.post("/projects/" + project + "/grid", List.of(entry("version", String.valueOf(version)),
                entry("x.names", "1 1 2"), entry("x.spacings", "25'-13\" 30"), entry("y.names", "A B"), entry("y.spacings", "-10")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("id=\"error-x.names\"", "id=\"error-x.spacings\"", "id=\"error-y.spacings\"")
                .contains("value=\"1 1 2\"", "value=\"" + ResultPagesTest.html("25'-13\" 30") + "\"", "value=\"-10\"");
        assertThat(server.version(project)).isEqualTo(version);
    }

    @Test
    void aCantileverInFeetAndInchesIsStoredInFeet() {
        long level = server.store.levels().findByProject(project).get(1).id();
        HttpResponse<String> r = server.post("/projects/" + project + "/levels/" + level + "/bays", List.of(
                entry("version", String.valueOf(server.version(project))), entry("cells", "0,0"), entry("action", "assign"),
                entry("occupancy", "office"), entry("deadLoad", "65"), entry("beams", "Y"), entry("infillBeams", "2"),
                entry("cantilevers.north", ""), entry("cantilevers.south", "4'-6\""), entry("cantilevers.east", ""),
                entry("cantilevers.west", ""), entry("cantileverOccupancy", "")));
        assertThat(r.statusCode()).isEqualTo(303);
        var bay = server.store.bays().findByLevel(project, level).stream()
                .filter(b -> b.col() == 0 && b.row() == 0).findFirst().orElseThrow();
        assertThat(bay.cantilevers()).containsValue(4.5);
        assertThat(Map.copyOf(bay.cantilevers())).hasSize(1);
    }
}
