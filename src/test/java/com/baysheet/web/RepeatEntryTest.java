package com.baysheet.web;

import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.Project;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Editor;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * "And N more like it above": typical levels from the add-a-level form and from the table's repeat column, linked to
 * the level they repeat and a storey height apart; every refusal names its field and stores nothing.
 */
class RepeatEntryTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    private static Project project(String job) {
        return server.store.projects().create(Editor.DEMO, new ProjectInfo(job, "Repeat block", "", "", "ASCE 7-16",
                UnitSystem.US, false, false));
    }

    private static HttpResponse<String> addLevel(Project p, String name, String elevation, String repeat, String height) {
        List<Map.Entry<String, String>> f = new ArrayList<>(List.of(entry("version", String.valueOf(server.version(p.id()))),
                entry("name", name), entry("elevation", elevation), entry("repeat", repeat), entry("repeatHeight", height)));
        return server.post("/projects/" + p.id() + "/levels", f);
    }

    @Test
    void theAddALevelFormAddsTheLevelAndItsTypicalsAboveInOneChange() {
        Project p = project("REP-1");
        assertThat(addLevel(p, "Level 2", "14", "3", "13'-6\"").statusCode()).isEqualTo(303);
        List<StoredLevel> levels = server.store.levels().findByProject(p.id());
        assertThat(levels).extracting(StoredLevel::name).containsExactly("Level 2", "Level 3", "Level 4", "Level 5");
        assertThat(levels).extracting(l -> l.info().elevation()).containsExactly(14.0, 27.5, 41.0, 54.5);
        long typical = levels.get(0).id();
        assertThat(levels.subList(1, 4)).allMatch(l -> l.linked() && l.typicalOf() == typical);
        assertThat(levels.get(0).linked()).isFalse();
        assertThat(server.version(p.id())).isEqualTo(p.version() + 1);
        // blank adds the one level
        assertThat(addLevel(p, "Roof", "70", "", "").statusCode()).isEqualTo(303);
        assertThat(server.store.levels().findByProject(p.id())).hasSize(5);
    }

    @Test
    void everyRefusalOfTheRepeatNamesItsFieldAndStoresNothing() {
        Project p = project("REP-2");
        assertThat(addLevel(p, "Level 7", "90", "", "").statusCode()).isEqualTo(303);
        long before = server.version(p.id());
        record Case(String repeat, String height, String field, String says) {}
        for (Case c : List.of(new Case("x", "13", "repeat", "whole number"), new Case("-2", "13", "repeat", "1 or more"),
                new Case("3", "", "repeatHeight", "required"), new Case("3", "-13", "repeatHeight", ""),
                new Case("201", "13", "repeat", "limit levels"), new Case("199", "13", "repeat", "limit levels"),
                new Case("3", "13", "repeat", "Level 7"), new Case("3", "38", "repeatHeight", "Level 7"),
                new Case("2", "6000", "repeatHeight", "limit elevation"))) {
            HttpResponse<String> r = addLevel(p, "Level 4", "14", c.repeat, c.height);
            assertThat(r.statusCode()).as(c.toString()).isEqualTo(422);
            assertThat(Html.text(r.body(), "#error-" + c.field)).as(c.toString()).isNotBlank().contains(c.says);
            assertThat(server.version(p.id())).as(c.toString()).isEqualTo(before);
        }
        assertThat(server.store.levels().findByProject(p.id())).hasSize(1);
    }

    @Test
    void theTablesRepeatColumnAddsTypicalLevelsAboveItsRow() {
        Project p = project("REP-3");
        String table = "kind,name,spacing,elevation,roof,roof_slope,same_as,repeat,storey_height\n"
                + "x,1,30,,,,,,\nx,2,,,,,,,\ny,A,25,,,,,,\ny,B,,,,,,,\n"
                + "level,Level 2,,14,,,,8,13\nlevel,Roof,,131,yes,1/4,,,\n";
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/levels/csv",
                List.of(entry("version", String.valueOf(p.version())), entry("csvText", table)));
        assertThat(r.statusCode()).isEqualTo(303);
        List<StoredLevel> levels = server.store.levels().findByProject(p.id());
        assertThat(levels).hasSize(10);
        assertThat(levels.get(8).name()).isEqualTo("Level 10");
        assertThat(levels.get(8).info().elevation()).isEqualTo(118.0);
        assertThat(levels.subList(1, 9)).allMatch(l -> l.typicalOf() != null && l.typicalOf() == levels.get(0).id());
        assertThat(server.version(p.id())).isEqualTo(p.version() + 1);
    }

    @Test
    void aBadRepeatInTheTableIsRefusedNamingItsRow() {
        String head = "kind,name,spacing,elevation,roof,roof_slope,same_as,repeat,storey_height\n";
        assertThat(LayoutCsv.read(head + "level,Level 2,,14,,,,two,13\n", UnitSystem.US).refusals()).singleElement().asString()
                .contains("row 2 (Level 2)", "repeat", "whole number");
        assertThat(LayoutCsv.read(head + "level,Level 2,,14,,,,3,\n", UnitSystem.US).refusals()).singleElement().asString()
                .contains("row 2 (Level 2)", "storey_height");
        assertThat(LayoutCsv.read(head + "level,Level 2,,14,,,,,13\n", UnitSystem.US).refusals()).singleElement().asString()
                .contains("storey_height", "without a repeat count");
        assertThat(LayoutCsv.read(head + "level,Level 3,,27,,,Level 2,3,13\n", UnitSystem.US).refusals()).singleElement().asString()
                .contains("cannot go with same_as");
        // a repeated level whose name another row of the table has: refused whole, nothing stored
        Project p = project("REP-4");
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/levels/csv", List.of(entry("version", String.valueOf(p.version())),
                entry("csvText", head + "level,Level 2,,14,,,,3,13\nlevel,Level 4,,100,,,,,\n")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("would add Level 4");
        assertThat(server.store.levels().findByProject(p.id())).isEmpty();
    }
}
