package com.baysheet.web;

import com.baysheet.engine.member.MethodComparison;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberRole;
import com.baysheet.store.Results;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** The floor reduction method a project chooses, and the other methods shown beside it. */
class MethodPagesTest {
    static final String CAUTION = "for review by a licensed engineer";
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static Results.Computed alder() { return server.alderResults(); }

    static String base() { return "/projects/" + server.alderId(); }

    private static DerivedMember officeBeam() {
        return alder().derived().members().stream().filter(m -> m.role() != MemberRole.COLUMN && !m.result().methods().isEmpty())
                .findFirst().orElseThrow();
    }

    @Test
    void memberPageShowsEveryApplicableMethodBesideTheProjectsOwn() {
        DerivedMember m = officeBeam();
        String body = server.get(base() + "/members/" + m.id()).body();
        assertThat(body).contains("Floor live load under each reduction method", "(project&#39;s method)",
                "IBC 2021 alternative uniform live load reduction", CAUTION).doesNotContain("NBC 2020");
        for (MethodComparison.Row r : m.result().methods())
            assertThat(body).contains(Display.of(r.reduced(), Quantity.FORCE, server.alder().info().units()));
    }

    @Test
    void levelComparisonPageAndItsCsv() {
        String level = alder().derived().members().get(0).level();
        long id = server.levelId(server.alder().id(), level);
        HttpResponse<String> page = server.get(base() + "/levels/" + id + "/methods");
        assertThat(page.statusCode()).isEqualTo(200);
        assertThat(page.body()).contains("Floor live load reduction methods compared", CAUTION, "Download as CSV",
                "IBC 2015 alternative uniform live load reduction");
        HttpResponse<String> csv = server.get(base() + "/levels/" + id + "/methods.csv");
        assertThat(csv.statusCode()).isEqualTo(200);
        assertThat(csv.headers().firstValue("Content-Type").orElse("")).startsWith("text/csv");
        List<String> lines = csv.body().lines().toList();
        long members = alder().derived().onLevel(level).stream().filter(m -> !m.result().methods().isEmpty()).count();
        assertThat(lines).hasSize((int) members + 1);
        assertThat(lines.get(0)).startsWith("\"member\",\"name\",\"role\",\"L unreduced (lb)\"").contains("\"f, IBC 2021 alternative");
        // full precision, as the comparison gives it
        DerivedMember first = alder().derived().onLevel(level).stream().filter(m -> !m.result().methods().isEmpty()).findFirst().orElseThrow();
        assertThat(lines.get(1)).startsWith("\"" + first.id() + "\"").contains("\"" + first.result().methods().get(1).reduced() + "\"");
    }

    @Test
    void takeDownShowsEachLevelUnderEveryMethod() {
        var t = alder().derived().takeDowns().get(0);
        String body = server.get(base() + "/takedowns/" + t.id()).body();
        assertThat(body).contains("Floor live load under each reduction method", "IBC 2018 alternative uniform live load reduction");
    }

    @Test
    void theSettingsFormOffersTheMethodsAndRefusesOneNotWrittenForTheUnits() {
        HttpResponse<String> created = server.post("/projects", List.of(entry("jobNumber", "25-950"), entry("name", "Heron Yard Offices"),
                entry("edition", "ASCE 7-16"), entry("units", "US")));
        String location = created.headers().firstValue("Location").orElseThrow();
        long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
        String form = server.get(location + "/settings").body();
        assertThat(Html.all(form, "select[name=floorMethod] option").eachAttr("value")).contains("ibc-2021-alternative");
        assertThat(Html.shown(form)).contains("(SI projects only)");
        long v = server.version(id);
        HttpResponse<String> refused = server.post(location + "/settings", List.of(entry("version", String.valueOf(v)),
                entry("jobNumber", "25-950"), entry("name", "Heron Yard Offices"), entry("edition", "ASCE 7-16"), entry("units", "US"),
                entry("floorMethod", "en1991-recommended")));
        assertThat(refused.statusCode()).isEqualTo(422);
        assertThat(Html.text(refused.body(), "#error-floorMethod")).contains("SI");
        assertThat(server.version(id)).isEqualTo(v);
        HttpResponse<String> saved = server.post(location + "/settings", List.of(entry("version", String.valueOf(v)),
                entry("jobNumber", "25-950"), entry("name", "Heron Yard Offices"), entry("edition", "ASCE 7-16"), entry("units", "US"),
                entry("floorMethod", "ibc-2021-alternative")));
        assertThat(saved.statusCode()).isEqualTo(303);
        assertThat(server.store.projects().find(id).info().floorMethod()).isEqualTo("ibc-2021-alternative");
        assertThat(Html.all(server.get(location + "/settings").body(), "select[name=floorMethod] option[selected]").eachAttr("value"))
                .containsExactly("ibc-2021-alternative");
    }
}
