package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import com.baysheet.web.entry.LengthField;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Typical levels from a level's page: make other levels the same as this one, add levels above it that are the
 * same, copy its bays to other levels once, or unlink it from its typical. Each answers with the level's page.
 */
record TypicalRoutes(Store store) {
    void install(RoutesConfig r) {
        r.post("/projects/{project}/levels/{level}/typical", ctx -> act(ctx, (f, p, l) -> {
            List<Long> ids = levelIds(f);
            return () -> store.typicals().link(Editors.of(ctx), p.id(), f.version(), l.id(), ids);
        }), Admit.PREPARER);
        r.post("/projects/{project}/levels/{level}/repeat", ctx -> act(ctx, (f, p, l) -> {
            int count = f.integer("count");
            double height = f.length("storeyHeight", LengthField.span("Storey height"), p.info().units());
            return () -> store.typicals().repeat(Editors.of(ctx), p.id(), f.version(), l.id(), count, height);
        }), Admit.PREPARER);
        r.post("/projects/{project}/levels/{level}/copy", ctx -> act(ctx, (f, p, l) -> {
            List<Long> ids = levelIds(f);
            return () -> store.typicals().copy(Editors.of(ctx), p.id(), f.version(), l.id(), ids);
        }), Admit.PREPARER);
        r.post("/projects/{project}/levels/{level}/unlink", ctx -> act(ctx,
                (f, p, l) -> () -> store.typicals().unlink(Editors.of(ctx), p.id(), f.version(), l.id())), Admit.PREPARER);
    }

    /** What a form asks for, read with its errors recorded; run later, inside {@link Form#attempt}. */
    private interface Reading {
        Runnable read(Form f, Project p, StoredLevel l);
    }

    private void act(Context ctx, Reading reading) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        Form form = Form.of(ctx);
        form.version();
        Runnable action = reading.read(form, p, l);
        Optional<Object> done = form.attempt(() -> { action.run(); return l; });
        done.ifPresentOrElse(x -> Pages.seeOther(ctx, "/projects/" + p.id() + "/levels/" + l.id() + "/edit"),
                () -> LevelPage.render(ctx.status(form.stale() ? 409 : 422), store, p, l,
                        Form.filled(LevelForm.values(l, p.version())), form));
    }

    /** The ticked levels ("levels" checkboxes holding level ids). */
    private static List<Long> levelIds(Form f) {
        List<Long> out = new ArrayList<>();
        for (String v : f.values("levels")) {
            try {
                out.add(Long.parseLong(v.strip()));
            } catch (NumberFormatException e) {
                f.reject("levels", "is not a level (got \"" + v + "\")");
            }
        }
        if (out.isEmpty()) f.reject("levels", "tick at least one level");
        return out;
    }

}
