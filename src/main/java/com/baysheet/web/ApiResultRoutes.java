package com.baysheet.web;

import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

/** The JSON API for results: members (filtered as on the member list), their calculation records, and take-downs. */
record ApiResultRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/api/projects/{project}/members", this::members, Admit.OFFICE);
        r.get("/api/projects/{project}/members/{member}", ctx -> {
            DerivedMember m = member(ctx);
            Results.Computed c = results(ctx);
            String mark = store.marks().of(c.project().id(), c.derived()).label(m.id());
            Json.send(ctx, new ApiViews.MemberDetail(ApiViews.MemberJson.of(m), mark, m.result().record(), m.result().methods()));
        }, Admit.OFFICE);
        r.get("/api/projects/{project}/members/{member}/record", ctx ->
                ctx.contentType("application/json; charset=utf-8").result(RecordJson.write(member(ctx).result().record())), Admit.OFFICE);
        r.get("/api/projects/{project}/takedowns", ctx -> Json.send(ctx, results(ctx).derived().takeDowns().stream().map(ApiViews.TakeDownJson::of).toList()), Admit.OFFICE);
        r.get("/api/projects/{project}/takedowns/{stack}", ctx -> Json.send(ctx, ApiViews.TakeDownJson.of(takeDown(ctx))), Admit.OFFICE);
    }

    void members(Context ctx) {
        Json.send(ctx, MemberFilter.of(ctx).apply(results(ctx).derived().members()).stream().map(ApiViews.MemberJson::of).toList());
    }

    private Results.Computed results(Context ctx) {
        return store.results().of(Ids.project(ctx));
    }

    private DerivedMember member(Context ctx) {
        String id = ctx.pathParam("member");
        return results(ctx).derived().member(id).orElseThrow(() -> new NotFound("member", id));
    }

    private TakeDown takeDown(Context ctx) {
        String id = ctx.pathParam("stack");
        return results(ctx).derived().takeDown(id).orElseThrow(() -> new NotFound("column stack", id));
    }
}
