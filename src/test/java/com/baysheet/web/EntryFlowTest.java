package com.baysheet.web;

import com.baysheet.project.StoredLevel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** A person enters a new project through the forms alone, from nothing to member calculations. */
class EntryFlowTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    static HttpResponse<String> saved(HttpResponse<String> r) {
        assertThat(r.statusCode()).as(r.body()).isEqualTo(303);
        return r;
    }

    @Test
    void aProjectWithGridLevelsAndBaysEnteredInFormsDerivesItsMembers() {
        String at = saved(server.post("/projects", List.of(entry("jobNumber", "25-410"), entry("name", "Tern Street Clinic"),
                entry("edition", "ASCE 7-16"), entry("units", "US")))).headers().firstValue("Location").orElseThrow();
        long p = Long.parseLong(at.substring(at.lastIndexOf('/') + 1));
        saved(server.post(at + "/grid", List.of(entry("version", "1"), entry("x.names", "1, 2, 3"), entry("x.spacings", "28, 32"),
                entry("y.names", "A B"), entry("y.spacings", "24"))));
        saved(server.post(at + "/levels", List.of(entry("version", "2"), entry("name", "Level 2"), entry("elevation", "13.5"))));
        saved(server.post(at + "/levels", List.of(entry("version", "3"), entry("name", "Roof"), entry("elevation", "27"),
                entry("roof", "on"), entry("roofSlope", "0.25"))));
        List<StoredLevel> levels = server.store.levels().findByProject(p);
        assertThat(levels).extracting(StoredLevel::name).containsExactly("Level 2", "Roof");
        String bays = at + "/levels/" + levels.get(0).id() + "/bays";
        saved(server.post(bays, List.of(entry("version", "4"), entry("cells", "0,0"), entry("cells", "1,0"), entry("action", "assign"),
                entry("occupancy", "hospital-patient"), entry("deadLoad", "70"), entry("beams", "Y"), entry("infillBeams", "3"),
                entry("cantilevers.south", "4.5"), entry("cantilevers.north", ""))));
        saved(server.post(at + "/levels/" + levels.get(1).id() + "/bays", List.of(entry("version", "5"), entry("cells", "0,0"),
                entry("cells", "1,0"), entry("action", "assign"), entry("occupancy", "roof-ordinary"), entry("deadLoad", "22"),
                entry("beams", "X"), entry("infillBeams", "4"))));

        assertThat(Html.shown(server.get(bays).body())).contains("Hospitals: patient rooms", "D 70.0 psf", "cantilever south");
        String levelsPage = server.get(at + "/levels").body();
        assertThat(Html.field(levelsPage, "x.spacings")).isEqualTo("28 32");
        assertThat(Html.shown(levelsPage)).contains("2 × 1 bays", "60.0 ft × 24.0 ft");
        String members = server.get(at + "/members?role=GIRDER").body();
        assertThat(Html.shown(members)).contains("Girder", "Level 2", "Roof", "for review by a licensed engineer");
        assertThat(server.store.results().of(p).derived().members()).isNotEmpty();
        String plan = server.get(at + "/plan?level=" + levels.get(0).id()).body();
        assertThat(Html.all(plan, "svg .cantilever")).isNotEmpty();
        assertThat(Html.texts(plan, "svg text")).contains("3");
    }
}
