package com.baysheet.web;

import com.baysheet.engine.units.UnitSystem;
import com.baysheet.store.Editor;
import com.baysheet.project.Project;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.StoredLevel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** The grid and levels from a table: read as the forms read lengths, applied in one change, every refusal at once. */
class LayoutCsvTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    static final String TABLE = """
            # Test block: grid west to east and south to north, then the levels
            kind,name,spacing,elevation,roof,roof_slope,same_as
            x,1,30'-6",,,,
            x,2,"25' 6 1/2\"\"\",,,,
            x,3,,,,,
            y,A,28,,,,
            y,B,28,,,,
            y,C,,,,,
            level,Level 2,,14'-0",,,
            level,Level 3,,27,no,,Level 2
            level,Roof,,40,yes,1/4,
            """;

    @Test
    void aTableSetsTheGridAndAddsTheLevelsWithTheirTypicals() {
        LayoutCsv t = LayoutCsv.read(TABLE, UnitSystem.US);
        assertThat(t.refusals()).isEmpty();
        assertThat(t.grid().x().names()).containsExactly("1", "2", "3");
        // 25' 6 1/2" = 25 + 6.5/12 ft
        assertThat(t.grid().x().spacings()).containsExactly(30.5, 25 + 6.5 / 12);
        assertThat(t.levels()).extracting(r -> r.level().name()).containsExactly("Level 2", "Level 3", "Roof");
        assertThat(t.levels().get(2).level().roofSlope()).isEqualTo(0.25);

        Project p = server.store.projects().create(Editor.DEMO, new ProjectInfo("CSV-1", "Table block", "", "", "ASCE 7-16",
                UnitSystem.US, false, false));
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/levels/csv",
                List.of(entry("version", String.valueOf(server.version(p.id()))), entry("csvText", TABLE)));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(server.store.grids().find(p.id()).y().spacings()).containsExactly(28.0, 28.0);
        List<StoredLevel> levels = server.store.levels().findByProject(p.id());
        assertThat(levels).extracting(StoredLevel::name).containsExactly("Level 2", "Level 3", "Roof");
        assertThat(levels.get(1).typicalOf()).isEqualTo(levels.get(0).id());
        assertThat(server.version(p.id())).isEqualTo(p.version() + 1);
    }

    @Test
    void everyRefusalOfATableIsShownAtOnceWithNothingStored() {
        String bad = """
                kind,name,spacing,elevation
                x,1,thirty
                x,2,
                y,A,10
                level,Level 2,,high
                slab,S1
                """;
        LayoutCsv t = LayoutCsv.read(bad, UnitSystem.US);
        assertThat(t.refusals()).hasSize(4);
        assertThat(String.join("\n", t.refusals())).contains("row 2", "row 5 (Level 2)", "row 6: kind must be x, y or level",
                "grid lines along y");
        assertThat(LayoutCsv.read("kind,name,colour\n", UnitSystem.US).refusals()).singleElement().asString().contains("unknown column");

        Project p = server.store.projects().create(Editor.DEMO, new ProjectInfo("CSV-2", "Table block", "", "", "ASCE 7-16",
                UnitSystem.US, false, false));
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/levels/csv",
                List.of(entry("version", String.valueOf(p.version())), entry("csvText", bad)));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("Nothing was saved", "row 6: kind must be x, y or level");
        assertThat(server.version(p.id())).isEqualTo(p.version());
        assertThat(server.post("/projects/" + p.id() + "/levels/csv", List.of()).statusCode()).isEqualTo(422);
    }
}
