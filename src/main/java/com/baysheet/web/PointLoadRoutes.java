package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.store.PointLoadEntry;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.Map;

/** A level's point loads (rooftop units, tanks, hung equipment, in a bay or on a member): listed, added, and deleted after a confirmation. */
final class PointLoadRoutes {
    private final Store store;

    PointLoadRoutes(Store store) {
        this.store = store;
    }

    void install(RoutesConfig r) {
        r.get("/projects/{project}/levels/{level}/point-loads", this::list, Admit.OFFICE);
        r.post("/projects/{project}/levels/{level}/point-loads", this::add, Admit.PREPARER);
        r.post("/projects/{project}/levels/{level}/point-loads/{pointLoad}/delete", this::delete, Admit.PREPARER);
    }

    void list(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        render(ctx, p, l, Form.filled(new HashMap<>(Map.of("version", String.valueOf(p.version()), "placeBy", "bay"))),
                Form.filled(Map.of()));
    }

    void add(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        PointLoadEntry e = PointLoadForm.read(form, p.info().units());
        form.attempt(() -> store.pointLoads().add(Editors.of(ctx), p.id(), version, l.id(), e))
                .ifPresentOrElse(saved -> Pages.seeOther(ctx, path(p, l)),
                        () -> render(ctx.status(form.stale() ? 409 : 422), p, l, form, Form.filled(Map.of())));
    }

    /** Deletes only with the confirmation box ticked: a point load leaves every member it was shared onto. */
    void delete(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        long id = Ids.pointLoad(ctx);
        Form form = Form.of(ctx);
        long version = form.version();
        if (!form.checked("confirm")) form.reject("confirm", "tick the box to confirm the deletion");
        form.attempt(() -> { store.pointLoads().delete(Editors.of(ctx), p.id(), version, l.id(), id); return id; })
                .ifPresentOrElse(done -> Pages.seeOther(ctx, path(p, l)), () -> render(ctx.status(form.stale() ? 409 : 422), p, l,
                        Form.filled(new HashMap<>(Map.of("version", String.valueOf(p.version()), "placeBy", "bay"))),
                        form));
    }

    private void render(Context ctx, Project p, StoredLevel l, Form form, Form deleteForm) {
        var computed = store.results().of(p.id());
        Map<String, Object> m = new HashMap<>();
        m.put("project", computed.project());
        m.put("level", l);
        m.put("levels", computed.model().levels());
        m.put("grid", computed.model().building().grid());
        m.put("loads", store.pointLoads().findByLevel(p.id(), l.id()));
        m.put("form", form);
        m.put("deleteForm", deleteForm);
        m.put("units", UnitLabels.of(p.info().units()));
        m.put("occupancies", computed.model().building().context().catalogue().all());
        ctx.render("pointloads/list", m);
    }

    private static String path(Project p, StoredLevel l) {
        return "/projects/" + p.id() + "/levels/" + l.id() + "/point-loads";
    }
}
