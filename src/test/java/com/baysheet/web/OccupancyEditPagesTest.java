package com.baysheet.web;

import com.baysheet.project.FirmOccupancy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** The firm's own occupancies edited (the results of the projects that use one change) and deleted (refused while in use). */
class OccupancyEditPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    private static List<Map.Entry<String, String>> values(String name, String uniform) {
        return List.of(entry("name", name), entry("units", "US"), entry("uniform", uniform), entry("concentrated", "2000"),
                entry("contactSide", "30"), entry("rule", "HEAVY"));
    }

    @Test
    void anEditOfAnOccupancyInUseSaysSoAndChangesOnlyTheMembersThatCarryIt() {
        String page = server.get("/occupancies/mech-mezzanine/edit").body();
        assertThat(Html.text(page, "#in-use")).contains("24-031 Alder Street Commons", "changes the results");
        assertThat(Html.field(page, "uniform")).isEqualTo("125");
        Map<String, String> before = ProjectCopyPagesTest.records(server, server.alder());

        HttpResponse<String> bad = server.post("/occupancies/mech-mezzanine", values("Mechanical platform", "-5"));
        assertThat(bad.statusCode()).isEqualTo(422);
        assertThat(Html.all(bad.body(), "#error-uniform")).hasSize(1);
        assertThat(server.store.occupancies().find("mech-mezzanine").uniform()).isEqualTo(125.0);

        HttpResponse<String> r = server.post("/occupancies/mech-mezzanine", values("Mechanical platform, heavier units", "150"));
        assertThat(r.statusCode()).isEqualTo(303);
        FirmOccupancy now = server.store.occupancies().find("mech-mezzanine");
        assertThat(now.uniform()).isEqualTo(150.0);
        assertThat(now.name()).isEqualTo("Mechanical platform, heavier units");
        Map<String, String> after = ProjectCopyPagesTest.records(server, server.alder());
        assertThat(after.keySet()).isEqualTo(before.keySet());
        List<String> changed = before.keySet().stream().filter(k -> !before.get(k).equals(after.get(k))).toList();
        // only the roof's mezzanine cell carries the occupancy: its members change, and below the roof only the columns
        // that carry it down; no floor beam or girder
        assertThat(changed).isNotEmpty().anyMatch(k -> k.startsWith("Roof-bay"));
        assertThat(changed.stream().filter(k -> !k.startsWith("Roof-"))).allMatch(k -> k.matches(".*-c\\d+x\\d+"));
        assertThat(changed.size()).isLessThan(before.size());
    }

    @Test
    void aDeleteIsRefusedNamingTheProjectsWhileInUseAndAllowedWhenNot() {
        String page = server.get("/occupancies/mech-mezzanine/delete").body();
        assertThat(Html.text(page, "#in-use-refusal")).contains("24-031 Alder Street Commons");
        assertThat(Html.all(page, "form.danger")).isEmpty();
        HttpResponse<String> refused = server.post("/occupancies/mech-mezzanine/delete", List.of(entry("confirm", "yes")));
        assertThat(refused.statusCode()).isEqualTo(422);
        assertThat(Html.text(refused.body(), ".general-error")).contains("is used by 24-031 Alder Street Commons");
        assertThat(server.store.occupancies().find("mech-mezzanine")).isNotNull();

        List<Map.Entry<String, String>> added = new java.util.ArrayList<>(values("Archive stacks, trial", "150"));
        added.add(entry("id", "archive-trial"));
        assertThat(server.post("/occupancies", added).statusCode()).isEqualTo(303);
        assertThat(Html.text(server.get("/occupancies/archive-trial/delete").body(), "#what-goes")).contains("No project uses it");
        assertThat(server.post("/occupancies/archive-trial/delete", List.of()).statusCode()).isEqualTo(400);
        assertThat(server.store.occupancies().findAll()).extracting(FirmOccupancy::id).contains("archive-trial");
        HttpResponse<String> done = server.post("/occupancies/archive-trial/delete", List.of(entry("confirm", "yes")));
        assertThat(done.statusCode()).isEqualTo(303);
        assertThat(server.store.occupancies().findAll()).extracting(FirmOccupancy::id).doesNotContain("archive-trial");
        assertThat(server.get("/occupancies/archive-trial/edit").statusCode()).isEqualTo(404);
    }
}
