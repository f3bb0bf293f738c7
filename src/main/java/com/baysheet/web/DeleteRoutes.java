package com.baysheet.web;

import com.baysheet.framing.DerivedMember;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Deleting a level or a project: a confirmation page says what goes (in the user's words: the level, how many
 * members and which marks, the issued sheets withdrawn) and its form carries {@code confirm=yes} ({@link Confirmed}).
 * What is deleted is kept for 30 days; the administrator restores it ({@link DeletedRoutes}).
 */
record DeleteRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/levels/{level}/delete", this::confirmLevel, Admit.OFFICE);
        r.post("/projects/{project}/levels/{level}/delete", this::deleteLevel, Admit.PREPARER);
        r.get("/projects/{project}/delete", this::confirmProject, Admit.OFFICE);
        r.post("/projects/{project}/delete", this::deleteProject, Admit.PREPARER);
    }

    void confirmLevel(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        renderLevel(ctx, p, l, fresh(p));
    }

    void deleteLevel(Context ctx) {
        Form form = Form.of(ctx);
        Confirmed.require(form);
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        long version = form.version();
        form.attempt(() -> { store.levels().delete(Editors.of(ctx), p.id(), version, l.id()); return l; })
                .ifPresentOrElse(done -> Pages.seeOther(ctx, Saved.DELETED.after("/projects/" + p.id() + "/levels")),
                        () -> renderLevel(ctx.status(form.stale() ? 409 : 422), store.projects().find(p.id()), l, form));
    }

    void confirmProject(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        renderProject(ctx, p, fresh(p));
    }

    void deleteProject(Context ctx) {
        Form form = Form.of(ctx);
        Confirmed.require(form);
        Project p = store.projects().find(Ids.project(ctx));
        long version = form.version();
        form.attempt(() -> { store.projects().delete(Editors.of(ctx), p.id(), version); return p; })
                .ifPresentOrElse(done -> Pages.seeOther(ctx, Saved.DELETED.after("/projects")),
                        () -> renderProject(ctx.status(form.stale() ? 409 : 422), store.projects().find(p.id()), form));
    }

    private static Form fresh(Project p) {
        return Form.filled(Map.of("version", String.valueOf(p.version())));
    }

    private void renderLevel(Context ctx, Project p, StoredLevel l, Form form) {
        var computed = store.results().of(p.id());
        List<DerivedMember> members = computed.derived().members().stream().filter(m -> m.level().equals(l.name())).toList();
        var marks = store.marks().of(p.id(), computed.derived());
        Map<String, Object> m = new HashMap<>();
        m.put("project", p);
        m.put("level", l);
        m.put("members", members.size());
        m.put("marks", String.join(", ", new TreeSet<>(members.stream().map(x -> marks.label(x.id())).toList())));
        m.put("bays", store.bays().findByLevel(p.id(), l.id()).size());
        m.put("lineLoads", store.lineLoads().findByLevel(p.id(), l.id()).size());
        m.put("pointLoads", store.pointLoads().findByLevel(p.id(), l.id()).size());
        m.put("followers", computed.model().levels().stream().filter(o -> o.linked() && o.typicalOf() == l.id()).map(StoredLevel::name).toList());
        m.put("withdrawn", store.levels().touchedByDelete(p.id(), p.version(), l.id()));
        m.put("form", form);
        ctx.render("levels/delete", m);
    }

    private void renderProject(Context ctx, Project p, Form form) {
        var computed = store.results().of(p.id());
        Map<String, Object> m = new HashMap<>();
        m.put("project", p);
        m.put("levels", computed.model().levels().size());
        m.put("members", computed.derived().members().size());
        m.put("issued", store.projects().issued(p.id()));
        m.put("form", form);
        ctx.render("projects/delete", m);
    }
}
