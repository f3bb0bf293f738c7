package com.baysheet.web;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.model.SelfWeights;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/**
 * A single member's own weight per length, on its page: a value entered here replaces its role's (firm default or
 * project value) on its record, which then says "entered for this member"; a blank goes back to the role's. A
 * member of a typical group that is given its own weight becomes a typical member of its own (its input differs).
 */
record MemberWeightRoutes(Store store) {
    static final String FIELD = "ownWeight";

    void install(RoutesConfig r) {
        r.post("/projects/{project}/members/{member}/weight", this::update, Admit.PREPARER);
    }

    void update(Context ctx) {
        Results.Computed c = store.results().of(Ids.project(ctx));
        DerivedMember member = c.derived().member(ctx.pathParam("member"))
                .orElseThrow(() -> new NotFound("member", ctx.pathParam("member")));
        Form form = Form.of(ctx);
        long version = form.version();
        double w = form.optionalNumber(FIELD);
        if (!Double.isNaN(w) && w < 0) form.reject(FIELD, "must be 0 or more");
        form.attempt(() -> {
            store.selfWeights().setMember(Editors.of(ctx), c.project().id(), version, member.id(), member.name(), w);
            return member.id();
        }).ifPresentOrElse(done -> Pages.seeOther(ctx, "/projects/" + c.project().id() + "/members/" + member.id() + "#own-weight"),
                () -> {
                    PageCache.View v = MemberRoutes.page(ctx, store.versions().state(c.project().id()), form);
                    ctx.status(form.stale() ? 409 : 422).render(v.template(), v.model());
                });
    }

    /** The form's values and what the member carries now, for the member page. */
    static void put(Map<String, Object> m, Results.Computed c, DerivedMember member, Form submitted) {
        SelfWeights weights = c.model().building().selfWeights();
        Double own = weights.members().get(member.id());
        m.put("weightForm", submitted != null ? submitted : Form.filled(Map.of("version", String.valueOf(c.project().version()),
                FIELD, own == null ? "" : Display.plain(own))));
        double role = switch (member.role()) {
            case INFILL_BEAM -> weights.infillBeam();
            case GRID_BEAM -> weights.gridBeam();
            case GIRDER -> weights.girder();
            case COLUMN -> weights.column();
        };
        String roleName = member.role().name().toLowerCase().replace('_', ' ') + "s";
        m.put("weightNow", Display.of(weights.of(member.id(), role), Quantity.LINE_LOAD, c.project().info().units())
                + " (" + weights.originOf(member.id(), roleName) + ")");
    }
}
