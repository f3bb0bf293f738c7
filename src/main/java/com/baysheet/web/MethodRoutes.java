package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.store.Results;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/** A level's members under every floor reduction method the project could choose: a page and its CSV. */
record MethodRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/levels/{level}/methods", this::show, Admit.OFFICE);
        r.get("/projects/{project}/levels/{level}/methods.csv", this::csv, Admit.OFFICE);
    }

    void show(Context ctx) {
        Results.Computed c = store.results().of(Ids.project(ctx));
        StoredLevel l = store.levels().find(c.project().id(), Ids.level(ctx));
        Map<String, Object> m = MemberRoutes.base(c);
        m.put("level", l);
        m.put("table", MethodTable.of(c.derived().onLevel(l.name()), "/projects/" + c.project().id() + "/members/",
                UnitLabels.of(c.project().info().units())));
        ctx.render("levels/methods", m);
    }

    void csv(Context ctx) {
        Results.Computed c = store.results().of(Ids.project(ctx));
        StoredLevel l = store.levels().find(c.project().id(), Ids.level(ctx));
        String unit = c.project().info().units() == com.baysheet.engine.units.UnitSystem.US ? "lb" : "kN";
        ctx.header("Content-Disposition", "attachment; filename=\"" + c.project().info().jobNumber().replaceAll("[^A-Za-z0-9_-]", "_")
                + "-level-" + l.id() + "-reduction-methods.csv\"");
        ctx.contentType("text/csv; charset=utf-8");
        ctx.result(MethodTable.csv(c.derived().onLevel(l.name()), unit));
    }
}
