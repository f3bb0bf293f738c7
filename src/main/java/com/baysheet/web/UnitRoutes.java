package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.Project;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.Map;

/** Converting a project between US and SI units: a page that says what changes, and the confirmed conversion. */
record UnitRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/units", ctx -> {
            Project p = store.projects().find(Ids.project(ctx));
            render(ctx, p, Form.filled(Map.of("version", String.valueOf(p.version()))));
        }, Admit.OFFICE);
        r.post("/projects/{project}/units", this::convert, Admit.PREPARER);
    }

    void convert(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        if (!form.checked("confirm")) form.reject("confirm", "tick the box to confirm that the results and the issued sheets change");
        form.attempt(() -> store.conversions().convert(Editors.of(ctx), p.id(), version, other(p)))
                .ifPresentOrElse(done -> Pages.seeOther(ctx, "/projects/" + p.id()),
                        () -> render(ctx.status(form.stale() ? 409 : 422), p, form));
    }

    private static UnitSystem other(Project p) {
        return p.info().units() == UnitSystem.US ? UnitSystem.SI : UnitSystem.US;
    }

    private void render(Context ctx, Project p, Form form) {
        Map<String, Object> m = new HashMap<>();
        m.put("project", p);
        m.put("to", other(p).name());
        m.put("form", form);
        ctx.render("projects/units", m);
    }
}
