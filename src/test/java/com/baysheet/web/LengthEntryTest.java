package com.baysheet.web;

import com.baysheet.framing.model.Grid;
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
    static long project() { return server.alderId(); }

    @Test
    void aGridInFeetAndInchesIsStoredInFeetAndShownBack() {
        Grid before = server.store.grids().find(project());
        String x = String.join(" ", before.x().names()), y = String.join(" ", before.y().names());
        String xs = "25'-6\"" + " 30".repeat(before.x().names().size() - 2);
        String ys = spacings(before.y().names().size() - 1);
        HttpResponse<String> r = server.post("/projects/" + project() + "/grid", server.versioned(project(),
                entry("x.names", x), entry("x.spacings", xs), entry("y.names", y), entry("y.spacings", ys)));
        assertThat(r.statusCode()).isEqualTo(303);
        Grid after = server.store.grids().find(project());
        assertThat(after.x().spacings().get(0)).isEqualTo(25.5);
        assertThat(after.y().spacings().get(0)).isEqualTo(28 + 6.5 / 12);
        assertThat(Html.field(server.get("/projects/" + project() + "/levels").body(), "x.spacings")).startsWith("25.5 30");
    }

    /** 28'-6 1/2", then 10' spacings, for a y axis of n spacings. */
    private static String spacings(int n) {
        return "28'-6 1/2\"" + " 10'".repeat(n - 1);
    }

    @Test
    void threeBadFieldsOfALevelAreRefusedTogetherWithTheTextKept() {
        long version = server.version(project());
        HttpResponse<String> r = server.post("/projects/" + project() + "/levels", List.of(entry("version", String.valueOf(version)),
                entry("name", ""), entry("elevation", "-12-6"), entry("roof", "on"), entry("roofSlope", "6:0")));
        assertThat(r.statusCode()).isEqualTo(422);
        for (String f : List.of("name", "elevation", "roofSlope")) assertThat(Html.text(r.body(), "#error-" + f)).as(f).isNotBlank();
        assertThat(Html.field(r.body(), "elevation")).isEqualTo("-12-6");
        assertThat(Html.field(r.body(), "roofSlope")).isEqualTo("6:0");
        assertThat(Html.text(r.body(), "#error-elevation")).contains("write -12'-6\"");
        assertThat(r.body()).doesNotContain("Exception");
        assertThat(server.version(project())).isEqualTo(version);
    }

    @Test
    void aRefusedFormShowsWhatTheGoodFieldsWereReadAs() {
        HttpResponse<String> r = server.post("/projects/" + project() + "/levels", server.versioned(project(),
                entry("name", ""), entry("elevation", "-12'-6\""), entry("roof", "on"), entry("roofSlope", "6:12")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-name")).isNotBlank();
        assertThat(Html.text(r.body(), "#reading-elevation")).contains("= -12.5 ft");
        assertThat(Html.shown(r.body())).contains("= 6 in/ft");
        assertThat(Html.field(r.body(), "elevation")).isEqualTo("-12'-6\"");
    }

    @Test
    void threeBadGridFieldsAreRefusedTogether() {
        long version = server.version(project());
        HttpResponse<String> r = server.post("/projects/" + project() + "/grid", List.of(entry("version", String.valueOf(version)),
                entry("x.names", "1 1 2"), entry("x.spacings", "25'-13\" 30"), entry("y.names", "A B"), entry("y.spacings", "-10")));
        assertThat(r.statusCode()).isEqualTo(422);
        for (String f : List.of("x.names", "x.spacings", "y.spacings"))
            assertThat(Html.one(r.body(), "[id=\"error-" + f + "\"]").text()).as(f).isNotBlank();
        assertThat(Html.field(r.body(), "x.names")).isEqualTo("1 1 2");
        assertThat(Html.field(r.body(), "x.spacings")).isEqualTo("25'-13\" 30");
        assertThat(Html.field(r.body(), "y.spacings")).isEqualTo("-10");
        assertThat(server.version(project())).isEqualTo(version);
    }

    @Test
    void aCantileverInFeetAndInchesIsStoredInFeet() {
        long level = server.store.levels().findByProject(project()).get(1).id();
        HttpResponse<String> r = server.post("/projects/" + project() + "/levels/" + level + "/bays", server.versioned(project(), entry("cells", "0,0"), entry("action", "assign"),
                entry("occupancy", "office"), entry("deadLoad", "65"), entry("beams", "Y"), entry("infillBeams", "2"),
                entry("cantilevers.north", ""), entry("cantilevers.south", "4'-6\""), entry("cantilevers.east", ""),
                entry("cantilevers.west", ""), entry("cantileverOccupancy", "")));
        assertThat(r.statusCode()).isEqualTo(303);
        var bay = server.store.bays().findByLevel(project(), level).stream()
                .filter(b -> b.col() == 0 && b.row() == 0).findFirst().orElseThrow();
        assertThat(bay.cantilevers()).containsValue(4.5);
        assertThat(Map.copyOf(bay.cantilevers())).hasSize(1);
    }
}
