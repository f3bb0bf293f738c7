package com.baysheet.web;

import com.baysheet.framing.TakeDown;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/** Column take-downs: the stacks of the project, and one stack level by level from the top down. */
record TakeDownRoutes(PageCache pages) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/takedowns", this::list, Admit.OFFICE);
        r.get("/projects/{project}/takedowns/{stack}", this::show, Admit.OFFICE);
    }

    void list(Context ctx) {
        pages.serve(ctx, s -> {
            Map<String, Object> m = MemberRoutes.base(s.computed());
            m.put("takeDowns", s.computed().derived().takeDowns());
            return new PageCache.View("takedowns/list", m);
        });
    }

    void show(Context ctx) {
        pages.serve(ctx, s -> show(ctx, s.computed()));
    }

    private PageCache.View show(Context ctx, Results.Computed c) {
        TakeDown t = c.derived().takeDown(ctx.pathParam("stack")).orElseThrow(() -> new NotFound("column stack", ctx.pathParam("stack")));
        Map<String, Object> m = MemberRoutes.base(c);
        m.put("takeDown", t);
        m.put("record", t.record());
        var calc = c.model().building().context();
        m.put("basicMethod", calc.floorMethod() == null);
        m.put("methodTitle", com.baysheet.engine.reduction.ReductionMethods.of(calc).title(calc));
        // the column below each level under every floor reduction method the project could choose
        var columns = t.rows().stream().map(r -> c.derived().member(r.member())).flatMap(java.util.Optional::stream).toList();
        m.put("methods", MethodTable.of(columns, "/projects/" + c.project().id() + "/members/", UnitLabels.of(c.project().info().units())));
        return new PageCache.View("takedowns/show", m);
    }
}
