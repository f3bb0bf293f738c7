package com.baysheet.web;

import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberRole;
import com.baysheet.project.Project;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The project's snow inputs on the settings form and the API, and the snow they put on roof members. */
class SnowPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    static List<Map.Entry<String, String>> settings(Project p, Map<String, String> snow) {
        var i = p.info();
        List<Map.Entry<String, String>> f = new ArrayList<>(List.of(entry("version", String.valueOf(server.version(p.id()))),
                entry("jobNumber", i.jobNumber()), entry("name", i.name()), entry("address", i.address()), entry("client", i.client()),
                entry("edition", i.edition()), entry("units", i.units().name()), entry("partitionAllowance", "on")));
        Map<String, String> all = new java.util.LinkedHashMap<>(Map.of("groundSnow", "30", "snowTerrain", "C", "snowExposure", "PARTIALLY",
                "exposureFactor", "", "thermalCondition", "HEATED", "thermalFactor", "", "riskCategory", "II"));
        all.putAll(snow);
        all.forEach((k, v) -> f.add(entry(k, v)));
        return f;
    }

    @Test
    void theDemoSnowSiteLoadsTheRoofMembersWithTheMinimumCase() {
        // demo: p_g = 25 psf, C_e = C_t = I_s = 1.0: p_f = 0.7 × 25 = 17.5 psf; 7.3.4, p_g > 20: p_m = 20 psf governs
        Project alder = server.alder();
        assertThat(alder.info().snow()).isNotNull();
        var derived = server.store.results().of(alder.id()).derived();
        DerivedMember beam = derived.members().stream().filter(m -> m.level().equals("Roof") && m.role() == MemberRole.INFILL_BEAM)
                .findFirst().orElseThrow();
        var rec = beam.result().record();
        assertThat(rec.step("S_u").result()).isCloseTo(20, within(1e-9));
        // S.RA = 20 psf × tributary width × span / 2
        assertThat(rec.result("S.RA")).isCloseTo(20 * beam.tributaryWidth() * beam.span() / 2, within(1e-6));
        String page = server.get("/projects/" + alder.id() + "/members/" + beam.id()).body();
        assertThat(Html.shown(page)).contains("minimum p_m governs", "R_A.S", "snow load, not reduced");
        assertThat(page).doesNotContain("Exception");
        String overview = server.get("/projects/" + alder.id()).body();
        assertThat(Html.shown(overview)).contains("p_g = 25");
    }

    @ParameterizedTest(name = "groundSnow = \"{0}\"")
    @ValueSource(strings = {"-5", "NaN", "1e999", "deep"})
    void aBadGroundSnowLoadIsRefusedBesideItsFieldAndNothingIsSaved(String bad) {
        Project p = server.deck();
        long v = server.version(p.id());
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/settings", settings(p, Map.of("groundSnow", bad)));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-groundSnow")).isNotBlank();
        assertThat(Html.shown(r.body())).contains("Nothing was saved");
        assertThat(r.body()).doesNotContain("Exception");
        assertThat(server.version(p.id())).isEqualTo(v);
    }

    @Test
    void snowOnAnAsce722ProjectIsRefusedOnTheGroundSnowLoad() {
        Project p = server.deck();
        long v = server.version(p.id());
        var form = settings(p, Map.of());
        form.replaceAll(e -> e.getKey().equals("edition") ? entry("edition", "ASCE 7-22") : e);
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/settings", form);
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-groundSnow")).isNotBlank();
        assertThat(Html.shown(r.body())).contains("ASCE 7-22");
        assertThat(server.version(p.id())).isEqualTo(v);
    }

    @Test
    void aShelteredRoofAboveTheTreeLineIsRefusedOnTheExposure() {
        Project p = server.deck();
        long v = server.version(p.id());
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/settings",
                settings(p, Map.of("snowTerrain", "ABOVE_TREE_LINE", "snowExposure", "SHELTERED")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-snowExposure")).isNotBlank();
        assertThat(server.version(p.id())).isEqualTo(v);
    }

    @Test
    void theApiTakesAndGivesTheSnowFields() throws Exception {
        ObjectMapper om = new ObjectMapper();
        HttpResponse<String> created = server.json("POST", "/api/projects", "{\"jobNumber\": \"25-410\", \"name\": \"Snow Shed\", \"units\": \"US\","
                + " \"groundSnow\": 40, \"exposureFactor\": 1.1, \"thermalCondition\": \"UNHEATED\", \"riskCategory\": \"III\"}");
        assertThat(created.statusCode()).isEqualTo(201);
        JsonNode info = om.readTree(created.body()).get("info");
        assertThat(info.get("groundSnow").asDouble()).isEqualTo(40.0);
        assertThat(info.get("exposureFactor").asDouble()).isEqualTo(1.1);
        assertThat(info.get("thermalCondition").asText()).isEqualTo("UNHEATED");
        assertThat(info.has("snowTerrain")).isFalse();
        assertThat(info.has("snow")).as("the engine site is not written as such").isFalse();
        HttpResponse<String> bad = server.json("POST", "/api/projects", "{\"jobNumber\": \"25-411\", \"name\": \"Snow Shed 2\", \"units\": \"US\","
                + " \"groundSnow\": -1, \"snowTerrain\": \"C\", \"snowExposure\": \"FULLY\", \"thermalCondition\": \"HEATED\", \"riskCategory\": \"II\"}");
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(om.readTree(bad.body()).get("field").asText()).isEqualTo("groundSnow");
        HttpResponse<String> v22 = server.json("POST", "/api/projects", "{\"jobNumber\": \"25-412\", \"name\": \"Snow Shed 3\", \"units\": \"US\","
                + " \"edition\": \"ASCE 7-22\", \"groundSnow\": 30, \"snowTerrain\": \"C\", \"snowExposure\": \"FULLY\", \"thermalCondition\": \"HEATED\","
                + " \"riskCategory\": \"II\"}");
        assertThat(v22.statusCode()).isEqualTo(400);
        assertThat(om.readTree(v22.body()).get("field").asText()).isEqualTo("groundSnow");
        assertThat(server.store.projects().findAll()).noneMatch(p -> p.info().jobNumber().equals("25-411") || p.info().jobNumber().equals("25-412"));
    }

    @Test
    void aSnowSiteWithNoRoofLevelIsSavedAndThePageSaysSo() {
        Project p = server.deck();
        boolean anyRoof = server.store.levels().findByProject(p.id()).stream().anyMatch(l -> l.info().roof());
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/settings", settings(p, Map.of()));
        assertThat(r.statusCode()).isIn(302, 303, 200);
        assertThat(server.store.projects().find(p.id()).info().snow().groundLoad()).isEqualTo(30.0);
        String page = server.get("/projects/" + p.id()).body();
        if (!anyRoof) assertThat(Html.shown(page)).contains("no level is a roof");
        else assertThat(page).doesNotContain("no level is a roof");
    }

    @Test
    void aRoofLevelKeepsItsShapeSurfaceAndEaveToRidge() {
        Project p = server.deck();
        long v = server.version(p.id());
        List<Map.Entry<String, String>> bad = List.of(entry("version", String.valueOf(v)), entry("name", "Canopy"), entry("elevation", "31"),
                entry("roof", "on"), entry("roofSlope", "20"), entry("roofShape", "HIP_OR_GABLE"), entry("slippery", "on"), entry("eaveToRidge", "-3"));
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/levels", bad);
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-eaveToRidge")).isNotBlank();
        assertThat(server.version(p.id())).isEqualTo(v);
        List<Map.Entry<String, String>> good = new ArrayList<>(bad);
        good.set(7, entry("eaveToRidge", "4.5"));
        assertThat(server.post("/projects/" + p.id() + "/levels", good).statusCode()).isIn(302, 303);
        var level = server.store.levels().findByProject(p.id()).stream().filter(l -> l.name().equals("Canopy")).findFirst().orElseThrow();
        assertThat(level.info().surface()).isEqualTo(new com.baysheet.framing.model.RoofSurface(
                com.baysheet.engine.snow.SnowRoof.Shape.HIP_OR_GABLE, true, 4.5));
        String edit = server.get("/projects/" + p.id() + "/levels/" + level.id() + "/edit").body();
        assertThat(Html.field(edit, "eaveToRidge")).isEqualTo("4.5");
        assertThat(Html.one(edit, "select[name=roofShape] option[selected]").val()).isEqualTo("HIP_OR_GABLE");
    }

    @Test
    void aSlopedRoofNeedingWForRainOnSnowIsRefusedWhenSavedWithoutIt() {
        // ASCE 7-16 7.10: p_g = 15 psf (0 < p_g ≤ 20) on a 6 in/ft roof (26.6°): rain-on-snow depends on W, so W is required
        Project p = server.store.projects().create(com.baysheet.store.Editor.DEMO, new com.baysheet.project.ProjectInfo("25-420", "Rain Shed", "", "", "ASCE 7-16",
                com.baysheet.engine.units.UnitSystem.US, false, false, false, null));
        long v = server.version(p.id());
        List<Map.Entry<String, String>> level = new ArrayList<>(List.of(entry("version", String.valueOf(v)), entry("name", "Roof"),
                entry("elevation", "14"), entry("roof", "on"), entry("roofSlope", "6"), entry("roofShape", "MONOSLOPE"), entry("eaveToRidge", "")));
        assertThat(server.post("/projects/" + p.id() + "/levels", level).statusCode()).isIn(302, 303);
        HttpResponse<String> r = server.post("/projects/" + p.id() + "/settings",
                settings(server.store.projects().find(p.id()), Map.of("groundSnow", "15")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-groundSnow")).contains("eaveToRidge");
        assertThat(server.store.projects().find(p.id()).info().snow()).isNull();
    }
}
