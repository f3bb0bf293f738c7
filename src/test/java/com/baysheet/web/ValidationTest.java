package com.baysheet.web;

import com.baysheet.project.StoredLevel;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every numeric field of every form, given values it must refuse: the page answers 422 with the error
 * beside that field, the value as typed is shown again, and nothing is saved (the version is unchanged).
 */
class ValidationTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static long project;
    static long level;

    @BeforeAll
    static void start() {
        project = server.alder().id();
        StoredLevel l2 = server.store.levels().findByProject(project).stream().filter(l -> l.name().equals("Level 2")).findFirst().orElseThrow();
        level = l2.id();
    }

    /** A form, its valid values, the numeric field under test and a value it must refuse. */
    static Stream<Arguments> refusals() {
        Map<String, String> grid = Map.of("x.names", "1 2 3 4 5", "x.spacings", "30 30 30 30", "y.names", "A B C D", "y.spacings", "28 10 28");
        Map<String, String> lvl = Map.of("name", "Level 9", "elevation", "90", "roof", "on", "roofSlope", "0.25");
        Map<String, String> bay = Map.of("action", "assign", "occupancy", "office", "deadLoad", "65", "beams", "Y", "infillBeams", "2",
                "cantilevers.north", "", "cantilevers.south", "", "cantilevers.east", "", "cantilevers.west", "");
        Map<String, String> occ = Map.of("id", "test-room", "name", "Test room", "units", "US", "uniform", "50",
                "concentrated", "0", "contactSide", "30", "rule", "ORDINARY");
        List<Arguments> out = new ArrayList<>();
        String g = "/projects/{p}/grid", l = "/projects/{p}/levels", b = "/projects/{p}/levels/{l}/bays";
        for (String bad : List.of("abc", "-30", "0", "", "NaN")) out.add(Arguments.of(g, grid, "x.spacings", "30 " + bad + " 30 30"));
        for (String bad : List.of("ten", "-10", "0", "1e999")) out.add(Arguments.of(g, grid, "y.spacings", "28 " + bad + " 28"));
        for (String bad : List.of("abc", "", "NaN", "Infinity", "0x10")) out.add(Arguments.of(l, lvl, "elevation", bad));
        for (String bad : List.of("steep", "", "-0.5", "1000")) out.add(Arguments.of(l, lvl, "roofSlope", bad));
        for (String bad : List.of("heavy", "", "-5", "1e999")) out.add(Arguments.of(b, bay, "deadLoad", bad));
        for (String bad : List.of("two", "", "-1", "21", "2.5")) out.add(Arguments.of(b, bay, "infillBeams", bad));
        for (String side : List.of("north", "south", "east", "west"))
            for (String bad : List.of("far", "-6", "0")) out.add(Arguments.of(b, bay, "cantilevers." + side, bad));
        for (String bad : List.of("lots", "", "-50", "0")) out.add(Arguments.of("/occupancies", occ, "uniform", bad));
        for (String bad : List.of("some", "", "-1")) out.add(Arguments.of("/occupancies", occ, "concentrated", bad));
        for (String bad : List.of("wide", "", "-30", "0")) out.add(Arguments.of("/occupancies", occ, "contactSide", bad));
        return out.stream();
    }

    @ParameterizedTest(name = "{2} = \"{3}\" on {0}")
    @MethodSource("refusals")
    void aRefusedNumberIsShownBesideItsFieldAndNothingIsSaved(String path, Map<String, String> valid, String field, String bad) {
        long version = server.version(project);
        int firm = server.store.occupancies().findAll().size();
        List<Map.Entry<String, String>> form = new ArrayList<>();
        form.add(entry("version", String.valueOf(version)));
        form.add(entry("cells", "0,0"));
        form.add(entry("cells", "1,0"));
        valid.forEach((k, v) -> form.add(entry(k, k.equals(field) ? bad : v)));
        HttpResponse<String> r = server.post(path.replace("{p}", String.valueOf(project)).replace("{l}", String.valueOf(level)), form);
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.one(r.body(), "[id=\"error-" + field + "\"]").text()).isNotBlank();
        assertThat(Html.shown(r.body())).contains("Nothing was saved");
        assertThat(r.body()).doesNotContain("Exception");
        if (!bad.isEmpty()) assertThat(Html.all(r.body(), "input").eachAttr("value")).anyMatch(v -> v.startsWith(bad));
        assertThat(server.version(project)).isEqualTo(version);
        assertThat(server.store.occupancies().findAll()).hasSize(firm);
    }
}
