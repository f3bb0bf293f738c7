package com.baysheet.web;

import com.baysheet.project.Project;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.Map;

/**
 * A project's life after its first job: copied as a new job (its model under a new job number, no sheets), archived
 * (kept, out of the default list, its model closed) and un-archived. Archiving is a preparer's, like every change to
 * the work: it removes nothing and is undone by the same people, on the same settings page.
 */
record JobRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/copy", this::copyForm, Admit.OFFICE);
        r.post("/projects/{project}/copy", this::copy, Admit.PREPARER);
        r.post("/projects/{project}/archive", ctx -> archive(ctx, true), Admit.PREPARER);
        r.post("/projects/{project}/unarchive", ctx -> archive(ctx, false), Admit.PREPARER);
    }

    void copyForm(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        render(ctx, p, Form.filled(Map.of("jobNumber", "", "name", p.info().name())));
    }

    void copy(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        form.attempt(() -> store.imports().copy(Editors.of(ctx), p.id(), form.text("jobNumber"), form.text("name")))
                .ifPresentOrElse(copied -> Pages.seeOther(ctx, Saved.COPIED.after("/projects/" + copied.id())),
                        () -> render(ctx.status(form.stale() ? 409 : 422), p, form));
    }

    void archive(Context ctx, boolean archived) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        form.attempt(() -> store.projects().archive(Editors.of(ctx), p.id(), version, archived))
                .ifPresentOrElse(done -> Pages.seeOther(ctx, (archived ? Saved.ARCHIVED : Saved.UNARCHIVED).after("/projects/" + p.id())),
                        () -> ProjectRoutes.renderSettings(ctx.status(form.stale() ? 409 : 422), store, p, form, null, null));
    }

    private void render(Context ctx, Project p, Form form) {
        Map<String, Object> m = new HashMap<>();
        m.put("project", p);
        m.put("form", form);
        ctx.render("projects/copy", m);
    }
}
