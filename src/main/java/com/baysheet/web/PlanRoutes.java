package com.baysheet.web;

import com.baysheet.framing.DriftZones;
import com.baysheet.framing.model.Level;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.ProjectVersions;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/** The framing plan of a level, drawn from the model as SVG. */
record PlanRoutes(PageCache pages) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/plan", this::show, Admit.OFFICE);
    }

    /** ?level=ID picks the level; without it, the lowest level that has a floor. */
    void show(Context ctx) {
        pages.serve(ctx, s -> show(ctx, s));
    }

    private PageCache.View show(Context ctx, ProjectVersions.State s) {
        Results.Computed c = s.computed();
        Map<String, Object> m = MemberRoutes.base(c);
        String wanted = ctx.queryParam("level");
        StoredLevel stored = c.model().levels().stream()
                .filter(l -> wanted == null ? !c.model().unframed().contains(l.name()) : String.valueOf(l.id()).equals(wanted))
                .findFirst().orElse(null);
        if (wanted != null && stored == null) throw new NotFound("level", wanted);
        m.put("level", stored);
        Level level = stored == null ? null : c.model().building().levels().stream()
                .filter(l -> l.name().equals(stored.name())).findFirst().orElse(null);
        if (level != null)
            m.put("plan", PlanView.of(c.model().building().grid(), level, c.derived().onLevel(level.name()), null,
                    c.model().building().context().catalogue(), "/projects/" + c.project().id() + "/members/{id}",
                    c.model().building().lineLoads(),
                DriftZones.of(c.model().building(), level.name()), c.model().building().pointLoads(),
                s.marks().labels()));
        return new PageCache.View("plan/show", m);
    }
}
