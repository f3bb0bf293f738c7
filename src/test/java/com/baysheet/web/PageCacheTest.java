package com.baysheet.web;

import com.baysheet.auth.Role;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.DerivedMember;
import com.baysheet.project.Firm;
import com.baysheet.project.Project;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.StoredLevel;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Editor;
import com.baysheet.store.Store;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.time.Clock;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The kept result pages: each kind shows every change of what it reads (made here or through another server
 * over the same database), a browser's tag is answered 304 until something changes, and each user sees their own
 * header and form token on a page kept once for all of them.
 */
class PageCacheTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    /** Another server over the same database: its own store, its own cached results. */
    static Store elsewhere() {
        return Store.on(server.db.dataSource(), Derivation::derive, Clock.systemUTC());
    }

    static String base() { return "/projects/" + server.alderId(); }

    static DerivedMember girder() {
        return server.alderResults().derived().members().stream()
                .filter(m -> m.name().equals("Girder D/1-2") && m.level().equals("Level 3")).findFirst().orElseThrow();
    }

    /** One page of each kind: a member, the member list, the take-down list, a take-down, a framing plan. */
    static Map<String, String> pages() {
        Map<String, String> p = new LinkedHashMap<>();
        p.put("member", base() + "/members/" + girder().id());
        p.put("member list", base() + "/members");
        p.put("take-down list", base() + "/takedowns");
        p.put("take-down", base() + "/takedowns/" + server.alderResults().derived().takeDowns().get(0).id());
        p.put("plan", base() + "/plan");
        return p;
    }

    static String ok(Client c, String path) {
        HttpResponse<String> r = c.get(path);
        assertThat(r.statusCode()).as(path).isEqualTo(200);
        return r.body();
    }

    @Test
    void everyKindOfPageShowsAModelEditMadeThroughAnotherServer() {
        Map<String, String> pages = pages();
        Map<String, String> before = new LinkedHashMap<>();
        pages.forEach((kind, path) -> {
            String first = ok(server.engineer, path);
            assertThat(ok(server.engineer, path)).as(kind + ", kept: the same page").isEqualTo(first);
            before.put(kind, first);
        });
        Store other = elsewhere();
        Project p = other.projects().find(server.alderId());
        ProjectInfo i = p.info();
        String renamed = i.name() + " (phase 2)";
        other.projects().update(Editor.DEMO, p.id(), p.version(), new ProjectInfo(i.jobNumber(), renamed, i.address(), i.client(),
                i.edition(), i.units(), i.partitionAllowance(), i.reducePartitions(), i.upliftReducedDead(), i.snow(), i.floorMethod()));
        pages.forEach((kind, path) -> {
            String after = ok(server.engineer, path);
            assertThat(Html.text(after, "nav.project strong")).as(kind).isEqualTo(i.jobNumber() + " " + renamed);
            assertThat(Html.text(before.get(kind), "nav.project strong")).as(kind).isEqualTo(i.jobNumber() + " " + i.name());
        });
    }

    @Test
    void aRenamedLevelReachesTheMemberTheListTheTakeDownAndThePlan() {
        DerivedMember g = girder();
        Map<String, String> pages = pages();
        pages.values().forEach(path -> ok(server.engineer, path));
        Store other = elsewhere();
        StoredLevel l3 = other.levels().findByProject(server.alderId()).stream().filter(l -> l.name().equals(g.level())).findFirst().orElseThrow();
        Project p = other.projects().find(server.alderId());
        var info = l3.info();
        other.levels().update(Editor.DEMO, p.id(), p.version(), l3.id(),
                new com.baysheet.project.LevelInfo("Third floor", info.elevation(), info.roof(), info.roofSlope(), info.surface()));
        try {
            assertThat(Html.texts(ok(server.engineer, pages.get("member")), "dl.facts dd")).contains("Third floor");
            assertThat(Html.texts(ok(server.engineer, pages.get("member list")), "table.members td")).contains("Third floor")
                    .doesNotContain("Level 3");
            assertThat(Html.texts(ok(server.engineer, pages.get("take-down")), "table.takedown td a")).contains("Third floor");
            assertThat(Html.texts(ok(server.engineer, pages.get("plan")), ".level-switch a")).contains("Third floor")
                    .doesNotContain("Level 3");
        } finally {
            Project q = other.projects().find(server.alderId());
            other.levels().update(Editor.DEMO, q.id(), q.version(), l3.id(), info);
        }
    }

    @Test
    void aRoofSlopeEditChangesTheTakeDownTotals() {
        String path = pages().get("take-down list");
        String before = ok(server.engineer, path);
        Store other = elsewhere();
        Project p = other.projects().find(server.alderId());
        // the roof's slope changes its roof live load (ASCE 7-16 4.8.2, R2): the take-down totals move
        StoredLevel roof = other.levels().findByProject(server.alderId()).stream().filter(l -> l.info().roof()).findFirst().orElseThrow();
        var r = roof.info();
        other.levels().update(Editor.DEMO, p.id(), p.version(), roof.id(),
                new com.baysheet.project.LevelInfo(r.name(), r.elevation(), true, r.roofSlope() + 6, r.surface()));
        try {
            assertThat(Html.texts(ok(server.engineer, path), "table.list td.num")).isNotEqualTo(Html.texts(before, "table.list td.num"));
        } finally {
            Project q = other.projects().find(server.alderId());
            other.levels().update(Editor.DEMO, q.id(), q.version(), roof.id(), r);
        }
    }

    @Test
    void aRenamedMarkReachesTheMemberPageTheListAndThePlan() {
        DerivedMember g = girder();
        String member = pages().get("member"), list = pages().get("member list"), plan = pages().get("plan") + "?level="
                + server.levelId(server.alderId(), g.level());
        for (String path : List.of(member, list, plan)) ok(server.engineer, path);
        var mark = server.store.marks().of(server.alderId(), server.alderResults().derived()).ofMember(g.id()).orElseThrow();
        String was = mark.text();
        HttpResponse<String> renamed = server.post("/review/projects/" + server.alderId() + "/marks/" + mark.mark().id() + "/rename",
                List.of(Map.entry("mark", "ZQ9")));
        assertThat(renamed.statusCode()).isEqualTo(303);
        try {
            assertThat(Html.text(ok(server.engineer, member), "#mark a")).isEqualTo("ZQ9");
            assertThat(Html.texts(ok(server.engineer, list), "td.mark")).contains("ZQ9").doesNotContain(was);
            assertThat(Html.shown(ok(server.engineer, plan))).contains("ZQ9");
        } finally {
            server.post("/review/projects/" + server.alderId() + "/marks/" + mark.mark().id() + "/rename", List.of(Map.entry("mark", was)));
        }
        assertThat(Html.text(ok(server.engineer, member), "#mark a")).as("and back: never the kept page of the other name").isEqualTo(was);
    }

    @Test
    void theFirmsSettingsReachAKeptPageTheNameInTheHeaderTheSelfWeightInTheRecord() {
        String path = pages().get("member");
        // the demo project states its own self weights; for the firm's to reach its record it takes the firm's defaults
        long alder = server.alderId();
        var own = server.store.selfWeights().find(alder).orElse(null);
        server.store.selfWeights().set(Editor.DEMO, alder, server.version(alder), null);
        String before = ok(server.engineer, path);
        var firms = server.office.review().firm();
        Firm f = firms.get();
        firms.update(new Firm("Renamed Partners", "RP", f.defaultEdition(), f.infillBeamWeight(), f.gridBeamWeight(),
                f.girderWeight() + 150, f.columnWeight(), f.version()), AuditEvent.of(null, "test", "firm settings", "firm", "test", "127.0.0.1"));
        try {
            String after = ok(server.engineer, path);
            assertThat(Html.text(after, "header .firm")).contains("Renamed Partners");
            assertThat(Html.text(after, "section.record")).as("the girder's self weight is in its dead load")
                    .isNotEqualTo(Html.text(before, "section.record"));
        } finally {
            Firm now = firms.get();
            firms.update(new Firm(f.name(), f.logoText(), f.defaultEdition(), f.infillBeamWeight(), f.gridBeamWeight(), f.girderWeight(),
                    f.columnWeight(), now.version()), AuditEvent.of(null, "test", "firm settings", "firm", "test", "127.0.0.1"));
            server.store.selfWeights().set(Editor.DEMO, alder, server.version(alder), own);
        }
    }

    @Test
    void twoUsersSeeTheirOwnNameAndFormTokenOnOneKeptPageAndEachRoleItsOwnLinks() {
        String path = pages().get("member");
        Client tess = server.engineer, uma = TestLogin.as(server.app, server.office, "uma", Role.ENGINEER),
                kim = TestLogin.as(server.app, server.office, "kim", Role.CHECKER),
                ada = TestLogin.as(server.app, server.office, "ada", Role.ADMINISTRATOR);
        for (Client c : List.of(tess, uma, kim, ada)) {
            String page = ok(c, path);
            assertThat(Html.text(page, "a[href=/account/password]")).isEqualTo(c.user.initials() + " (" + c.user.role().label() + ")");
            assertThat(Html.one(page, "form.logout input[name=_csrf]").val()).isEqualTo(c.csrf);
            assertThat(Html.all(page, "a[href=/admin/users]")).as(c.user.username()).hasSize(c.user.role() == Role.ADMINISTRATOR ? 1 : 0);
            // the page's own forms carry each user's token; everything else in it is the one kept page
            assertThat(Html.one(page, "#own-weight-form input[name=_csrf]").val()).isEqualTo(c.csrf);
            assertThat(withoutTokens(page)).isEqualTo(withoutTokens(ok(tess, path)));
        }
    }

    @Test
    void aBrowsersTagIsAnswered304UntilThePageChangesAndOnlyForItsOwnSession() {
        String path = pages().get("member");
        HttpResponse<String> first = server.engineer.get(path);
        String tag = first.headers().firstValue("ETag").orElseThrow();
        assertThat(first.headers().firstValue("Cache-Control")).hasValue("private, no-cache");
        HttpResponse<String> again = server.engineer.get(path, "If-None-Match", tag);
        assertThat(again.statusCode()).isEqualTo(304);
        assertThat(again.body()).isEmpty();
        Client uma = TestLogin.as(server.app, server.office, "uma", Role.ENGINEER);
        assertThat(uma.get(path, "If-None-Match", tag).statusCode()).as("another session: another header and token").isEqualTo(200);
        Store other = elsewhere();
        Project p = other.projects().find(server.alderId());
        other.projects().update(Editor.DEMO, p.id(), p.version(), p.info());
        HttpResponse<String> changed = server.engineer.get(path, "If-None-Match", tag);
        // a save with the same settings still moves the version, which the page's own-weight form carries: a new page
        assertThat(changed.statusCode()).isEqualTo(200);
        assertThat(Html.field(changed.body(), "version")).isEqualTo(String.valueOf(other.projects().find(p.id()).version()));
        tag = changed.headers().firstValue("ETag").orElseThrow();
        assertThat(server.engineer.get(path, "If-None-Match", tag).statusCode()).isEqualTo(304);
        StoredLevel roof = other.levels().findByProject(server.alderId()).stream().filter(l -> l.info().roof()).findFirst().orElseThrow();
        Project q = other.projects().find(server.alderId());
        var r = roof.info();
        other.levels().update(Editor.DEMO, q.id(), q.version(), roof.id(),
                new com.baysheet.project.LevelInfo(r.name() + " deck", r.elevation(), true, r.roofSlope(), r.surface()));
        try {
            HttpResponse<String> moved = server.engineer.get(pages().get("plan"), "If-None-Match", tag);
            assertThat(moved.statusCode()).isEqualTo(200);
            String planTag = moved.headers().firstValue("ETag").orElseThrow();
            assertThat(server.engineer.get(pages().get("plan"), "If-None-Match", planTag).statusCode()).isEqualTo(304);
            Project s = other.projects().find(server.alderId());
            other.levels().update(Editor.DEMO, s.id(), s.version(), roof.id(), r);
            assertThat(server.engineer.get(pages().get("plan"), "If-None-Match", planTag).statusCode()).as("after a change").isEqualTo(200);
        } finally {
            StoredLevel now = other.levels().findByProject(server.alderId()).stream().filter(l -> l.id() == roof.id()).findFirst().orElseThrow();
            if (!now.info().equals(r)) {
                Project s = other.projects().find(server.alderId());
                other.levels().update(Editor.DEMO, s.id(), s.version(), roof.id(), r);
            }
        }
    }

    @Test
    void theConfirmationAfterASaveIsShownOnlyWhenAskedAndTheCautionAlways() {
        String path = pages().get("member");
        assertThat(Html.all(ok(server.engineer, path), ".notice.saved")).isEmpty();
        assertThat(Html.text(ok(server.engineer, path + "?saved=project"), ".notice.saved")).isEqualTo("Saved: project settings.");
        String page = ok(server.engineer, path);
        assertThat(Html.all(page, ".notice.saved")).isEmpty();
        assertThat(Html.text(page, "footer")).contains("licensed engineer", "adopted local code");
    }

    /** The page's main part with every form token taken out. */
    private static String withoutTokens(String page) {
        var main = Html.one(page, "main");
        main.select("input[name=_csrf]").remove();
        return main.outerHtml();
    }
}
