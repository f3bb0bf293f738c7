package com.baysheet.web;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Step;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.store.Results;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;

import static org.assertj.core.api.Assertions.assertThat;

/** The result pages of the demo, checked against the records they render. */
class ResultPagesTest {
    static final String CAUTION = "for review by a licensed engineer";
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static Results.Computed alder() { return server.alderResults(); }

    /** A record's text as a page shows it: runs of white space read as one space. */
    static String shown(String s) {
        return s.strip().replaceAll("\\s+", " ");
    }

    static String base() { return "/projects/" + server.alderId(); }

    @Test
    void memberPageRendersTheWholeRecordWithClausesAndCautions() {
        DerivedMember girder = alder().derived().members().stream()
                .filter(m -> m.name().equals("Girder D/1-2") && m.level().equals("Level 3")).findFirst().orElseThrow();
        HttpResponse<String> r = server.get(base() + "/members/" + girder.id());
        assertThat(r.statusCode()).isEqualTo(200);
        String body = Html.shown(r.body());
        assertThat(body).contains("Girder D/1-2", "Edge beam with cantilever slab", CAUTION, "adopted local code");
        CalcRecord rec = girder.result().record();
        for (Step s : rec.steps())
            assertThat(body).contains(shown(s.formula()), shown(s.substituted()), shown(s.shown()), shown(s.clause().label()));
        rec.inputs().forEach(e -> assertThat(body).contains(shown(e.label()), shown(e.shown())));
        rec.notes().forEach(n -> assertThat(body).contains(shown(n.text())));
        assertThat(body).contains("ASCE 7-16 2.3.1", "ASCE 7-16 2.4.1", "governs");
        assertThat(Html.all(r.body(), "svg .tributary")).isNotEmpty();
        assertThat(Html.all(r.body(), "svg .member.girder.selected")).hasSize(1);
        // the plan, drawn apart from the template, is in its place: one drawing, inside its figure, no marker left
        assertThat(Html.all(r.body(), "svg")).hasSize(1);
        assertThat(Html.all(r.body(), "figure svg .member")).hasSameSizeAs(Html.all(r.body(), "svg .member")).isNotEmpty();
        assertThat(r.body()).doesNotContainPattern("kept[0-9a-f]{32}");
    }

    @Test
    void columnPageNamesTheAreaAtItsLevelApartFromTheCumulativeAreaItIsReducedWith() {
        DerivedMember c = alder().derived().members().stream().filter(m -> m.name().equals("Column B/2 below Level 1")).findFirst().orElseThrow();
        String page = server.get(base() + "/members/" + c.id()).body();
        UnitLabels us = UnitLabels.of(server.alder().info().units());
        assertThat(Html.texts(page, "dt")).contains("Area at this level").doesNotContain("Tributary area");
        assertThat(Html.shown(page)).contains("AT supported, cumulative", shown(us.area(c.result().record().step("A_T").result())),
                "Kind (ASCE 7-16 Table 4.7-1)");
        assertThat(Html.texts(page, "sub")).contains("T");
    }

    @Test
    void memberListFiltersByLevelAndRoleAndShowsGoverningNumbers() {
        HttpResponse<String> r = server.get(base() + "/members?level=Level+1&role=COLUMN");
        String body = Html.shown(r.body());
        long columns = alder().derived().members().stream()
                .filter(m -> m.level().equals("Level 1") && m.role().name().equals("COLUMN")).count();
        assertThat(body).contains(columns + " members.", "Column B/2 below Level 1", CAUTION).doesNotContain("Girder A/1-2");
        DerivedMember c = alder().derived().members().stream().filter(m -> m.name().equals("Column B/2 below Level 1")).findFirst().orElseThrow();
        assertThat(body).contains(shown(c.result().record().entry("LRFD.P").shown()));
        assertThat(Html.shown(server.get(base() + "/members?kind=EDGE_BEAM_CANTILEVER").body())).contains("Girder D/1-2").doesNotContain("Girder B/1-2");
    }

    @Test
    void memberListNamesTheKllTableAsTheProjectsEditionNumbersIt() {
        assertThat(Html.text(server.get(base() + "/members").body(), "label:containsOwn(Kind) > span")).isEqualTo("ASCE 7-16 Table 4.7-1");
        HttpResponse<String> made = server.json("POST", "/api/projects",
                "{\"jobNumber\": \"26-710\", \"name\": \"Older Code Shed\", \"units\": \"US\", \"edition\": \"ASCE 7-10\"}");
        assertThat(made.statusCode()).isEqualTo(201);
        String path = made.headers().firstValue("Location").orElseThrow().replace("/api", "");
        // ASCE 7-10 numbers its live load element factor table 4-2
        String older = server.get(path + "/members").body();
        assertThat(Html.text(older, "label:containsOwn(Kind) > span")).isEqualTo("ASCE 7-10 Table 4-2");
        assertThat(older).doesNotContain("4.7-1");
    }

    @Test
    void takeDownPageTabulatesEveryLevelFromTheTop() {
        TakeDown t = alder().derived().takeDowns().stream().filter(s -> s.gridPoint().equals("C/2")).findFirst().orElseThrow();
        String page = server.get(base() + "/takedowns/" + t.id()).body();
        String body = Html.shown(page);
        UnitLabels us = UnitLabels.of(server.alder().info().units());
        assertThat(body).contains("Column take-down at C/2", CAUTION, "Eq. 4.7-1");
        java.util.List<String> cells = Html.texts(page, "td, th");
        assertThat(cells.indexOf("Roof")).isNotNegative().isLessThan(cells.indexOf("Level 1"));
        for (TakeDown.Row row : t.rows())
            assertThat(body).contains(shown(us.force(row.liveReduced())), shown(us.force(row.lrfd())), row.lrfdCombination());
        // the area this level brings, the A_T supported (cumulative) and the reducible part that gave f, each named
        assertThat(String.join(" | ", Html.texts(page, "thead th"))).contains("Area at this level", "AT supported, cumulative",
                "Reducible AT, cumulative", "Influence area Σ KLL,i AT,r,i");
        assertThat(Html.texts(page, "thead th sub")).contains("T", "LL", "LL,i", "T,r,i");
        for (Step s : t.record().steps()) assertThat(body).contains(shown(s.formula()), shown(s.substituted()));
        assertThat(Html.shown(server.get(base() + "/takedowns").body())).contains("C/2", "B/4");
    }

    @Test
    void framingPlanDrawsGridNamesOccupancyLegendAndMemberLinks() {
        long level3 = alder().model().levels().stream().filter(l -> l.name().equals("Level 3")).findFirst().orElseThrow().id();
        String page = server.get(base() + "/plan?level=" + level3).body();
        String girder = alder().derived().onLevel("Level 3").stream().filter(m -> m.id().contains("-h")).findFirst().orElseThrow().id();
        assertThat(Html.texts(page, "svg text")).contains("A", "5");
        assertThat(Html.shown(page)).contains("Offices", "Office corridors above first floor", "Assembly: movable seats", CAUTION);
        assertThat(Html.all(page, "svg .cantilever")).isNotEmpty();
        assertThat(Html.all(page, "svg .opening")).isNotEmpty();
        assertThat(Html.all(page, "svg a").eachAttr("href")).contains(base() + "/members/" + girder);
    }

    @Test
    void siProjectShowsSiUnits() {
        Results.Computed deck = server.store.results().of(server.deck().id());
        DerivedMember m = deck.derived().members().get(0);
        String body = Html.shown(server.get("/projects/" + server.deck().id() + "/members/" + m.id()).body());
        assertThat(body).contains(" kN", "kPa", "Garages").doesNotContain(" kip");
    }

    @Test
    void apiRecordIsTheSameRecordAsThePage() {
        DerivedMember m = alder().derived().members().get(3);
        HttpResponse<String> r = server.get("/api" + base() + "/members/" + m.id() + "/record");
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("application/json");
        assertThat(r.body()).isEqualTo(com.baysheet.engine.record.RecordJson.write(m.result().record()));
    }
}
