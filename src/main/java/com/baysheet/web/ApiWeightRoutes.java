package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.model.SelfWeights;
import com.baysheet.store.ModelJson;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import com.fasterxml.jackson.databind.JsonNode;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/** Self weights in the JSON API: what a project's members carry by role and by member, and one member's own. See docs/api.md. */
record ApiWeightRoutes(Store store) {
    /** The weights as the members carry them (plf or kN/m), where the role figures come from, and those entered per member. */
    record WeightsJson(String units, double infillBeam, double gridBeam, double girder, double column, String origin,
                       Map<String, Double> members) {
        static WeightsJson of(Results.Computed c) {
            SelfWeights w = c.model().building().selfWeights();
            return new WeightsJson(UnitLabels.of(c.project().info().units()).perLength(), w.infillBeam(), w.gridBeam(), w.girder(),
                    w.column(), w.origin(), w.members());
        }
    }

    void install(RoutesConfig r) {
        r.get("/api/projects/{project}/self-weights", ctx -> Json.send(ctx, WeightsJson.of(store.results().of(Ids.project(ctx)))),
                Admit.OFFICE);
        r.put("/api/projects/{project}/members/{member}/weight", this::setMember, Admit.PREPARER);
    }

    /** {"version": n, "ownWeight": w} sets the member's own weight; {"version": n, "ownWeight": null} goes back to its role's. */
    private void setMember(Context ctx) {
        Results.Computed c = store.results().of(Ids.project(ctx));
        DerivedMember m = c.derived().member(ctx.pathParam("member")).orElseThrow(() -> new NotFound("member", ctx.pathParam("member")));
        JsonNode b = Json.body(ctx);
        JsonNode w = b.path("ownWeight");
        if (w.isMissingNode() || !(w.isNull() || w.isNumber()))
            throw new InputError("ownWeight", w.isMissingNode() ? "nothing" : w, "give the weight per length, or null for the role's");
        store.selfWeights().setMember(Editors.of(ctx), c.project().id(), ModelJson.version(b), m.id(), m.name(), w.isNull() ? Double.NaN : w.asDouble());
        Json.send(ctx, 200, WeightsJson.of(store.results().of(c.project().id())));
    }
}
