package com.baysheet.web;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberRole;
import com.baysheet.framing.DriftZones;
import com.baysheet.framing.model.Level;
import com.baysheet.review.MarkSheets;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.ProjectVersions;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Derived members: the filtered list with governing numbers, and a member's whole calculation record with its plan. */
record MemberRoutes(PageCache pages) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/members", this::list, Admit.OFFICE);
        r.get("/projects/{project}/members/{member}", this::show, Admit.OFFICE);
    }

    void list(Context ctx) {
        pages.serve(ctx, s -> list(ctx, s));
    }

    private PageCache.View list(Context ctx, ProjectVersions.State s) {
        Results.Computed c = s.computed();
        MemberFilter filter = MemberFilter.of(ctx);
        UnitLabels units = UnitLabels.of(c.project().info().units());
        String href = "/projects/" + c.project().id() + "/members/";
        MarkSheets marks = s.marks();
        List<DerivedMember> shown = filter.apply(c.derived().members());
        if ("mark".equals(ctx.queryParam("group"))) shown = byMark(shown, marks);
        List<MemberRow> rows = shown.stream().map(m -> MemberRow.of(m, href + m.id(), units)).toList();
        Map<String, Object> m = base(c);
        m.put("marks", marks);
        m.put("byMark", "mark".equals(ctx.queryParam("group")));
        m.put("rows", rows);
        m.put("filter", filter);
        m.put("roles", MemberRole.values());
        m.put("kinds", MemberKind.values());
        m.put("kllClause", kllClause(c));
        return new PageCache.View("members/list", m);
    }

    void show(Context ctx) {
        pages.serve(ctx, s -> page(ctx, s, null));
    }

    /** The member page, with the own-weight form as submitted where it comes back refused (else its stored value). */
    static PageCache.View page(Context ctx, ProjectVersions.State s, Form weightForm) {
        Results.Computed c = s.computed();
        DerivedMember member = c.derived().member(ctx.pathParam("member"))
                .orElseThrow(() -> new NotFound("member", ctx.pathParam("member")));
        Level level = c.model().building().levels().stream().filter(l -> l.name().equals(member.level())).findFirst().orElseThrow();
        String href = "/projects/" + c.project().id() + "/members/{id}";
        Map<String, Object> m = base(c);
        m.put("member", member);
        MarkSheets marks = s.marks();
        m.put("mark", marks.ofMember(member.id()).orElse(null));
        m.put("record", member.result().record());
        UnitLabels units = UnitLabels.of(c.project().info().units());
        m.put("row", MemberRow.of(member, "", units));
        m.put("kllClause", kllClause(c));
        m.put("methods", member.result().methods());
        m.put("levelId", c.model().levels().stream().filter(l -> l.name().equals(member.level())).map(l -> l.id()).findFirst().orElse(null));
        // a column's area is this level's; the A_T it is reduced with is cumulative over the floors it supports
        m.put("supportedArea", member.role() != MemberRole.COLUMN ? null
                : member.result().floorReduction().map(lf -> units.area(lf.tributaryArea())).orElse(null));
        m.put("plan", PlanView.of(c.model().building().grid(), level, c.derived().onLevel(level.name()), member,
                c.model().building().context().catalogue(), href, c.model().building().lineLoads(),
                DriftZones.of(c.model().building(), level.name()), c.model().building().pointLoads(), marks.labels()));
        MemberWeightRoutes.put(m, c, member, weightForm);
        return new PageCache.View("members/show", m);
    }

    /** The members in the order of their marks (reading order), each mark's locations together. */
    private static List<DerivedMember> byMark(List<DerivedMember> members, MarkSheets marks) {
        java.util.Set<String> in = new java.util.HashSet<>();
        for (DerivedMember x : members) in.add(x.id());
        return marks.all().stream().flatMap(s -> s.group().members().stream()).filter(x -> in.contains(x.id())).toList();
    }

    /** The project's edition numbers its K_LL table (ASCE 7-16 Table 4.7-1, ASCE 7-10 Table 4-2): the label is data. */
    private static String kllClause(Results.Computed c) {
        return c.model().building().context().edition().clause("reduction.kll").label();
    }

    static Map<String, Object> base(Results.Computed c) {
        Map<String, Object> m = new HashMap<>();
        m.put("project", c.project());
        m.put("model", c.model());
        m.put("units", UnitLabels.of(c.project().info().units()));
        return m;
    }
}
