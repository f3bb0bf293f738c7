package com.baysheet.web;

import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Editor;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.function.ToLongFunction;

/**
 * The pages of one kind of load placed on a level (line loads, point loads): listed with the form to add one,
 * added, and deleted only through its confirmation page, whose form carries {@code confirm=yes} (the load leaves every
 * member that carried it).
 *
 * @param <E> what the add form reads
 * @param segment the path under the level ({@code line-loads})
 * @param id the load's id from its path parameter
 * @param start the add form's starting choices besides the version
 */
record LevelLoadRoutes<E>(Store store, String segment, String template, Map<String, String> start,
                          BiFunction<Form, UnitSystem, E> read, ToLongFunction<Context> id, Loads<E> loads) {
    /** Where the loads of this kind are kept. */
    interface Loads<E> {
        List<?> findByLevel(long project, long level);

        Object add(Editor who, long project, long version, long level, E entry);

        /** The load in the user's words ("North parapet (D, 1-5)"), or empty where the level has no load of this id. */
        java.util.Optional<String> describe(long project, long level, long id);

        void delete(Editor who, long project, long version, long level, long id);
    }

    void install(RoutesConfig r, String idParameter) {
        String base = "/projects/{project}/levels/{level}/" + segment;
        r.get(base, this::list, Admit.OFFICE);
        r.post(base, this::add, Admit.PREPARER);
        r.get(base + "/{" + idParameter + "}/delete", this::confirmDelete, Admit.OFFICE);
        r.post(base + "/{" + idParameter + "}/delete", this::delete, Admit.PREPARER);
    }

    void list(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        render(ctx, p, l, fresh(p));
    }

    void add(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        E e = read.apply(form, p.info().units());
        form.attempt(() -> loads.add(Editors.of(ctx), p.id(), version, l.id(), e))
                .ifPresentOrElse(saved -> Pages.seeOther(ctx, path(p, l)),
                        () -> render(ctx.status(form.stale() ? 409 : 422), p, l, form));
    }

    void confirmDelete(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        renderConfirm(ctx, p, l, id.applyAsLong(ctx), fresh(p));
    }

    void delete(Context ctx) {
        Form form = Form.of(ctx);
        Confirmed.require(form);
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        long load = id.applyAsLong(ctx);
        long version = form.version();
        form.attempt(() -> { loads.delete(Editors.of(ctx), p.id(), version, l.id(), load); return load; })
                .ifPresentOrElse(done -> Pages.seeOther(ctx, Saved.DELETED.after(path(p, l))),
                        () -> renderConfirm(ctx.status(form.stale() ? 409 : 422), store.projects().find(p.id()), l, load, form));
    }

    private void renderConfirm(Context ctx, Project p, StoredLevel l, long load, Form form) {
        String what = loads.describe(p.id(), l.id(), load).orElseThrow(() -> new com.baysheet.store.NotFound(segment, load));
        Map<String, Object> m = new HashMap<>();
        m.put("project", p);
        m.put("level", l);
        m.put("what", what);
        m.put("kind", segment.replace('-', ' ').replaceAll("s$", ""));
        m.put("action", path(p, l) + "/" + load + "/delete");
        m.put("back", path(p, l));
        m.put("form", form);
        ctx.render("levels/delete-load", m);
    }

    private Form fresh(Project p) {
        Map<String, String> values = new HashMap<>(start);
        values.put("version", String.valueOf(p.version()));
        return Form.filled(values);
    }

    private void render(Context ctx, Project p, StoredLevel l, Form form) {
        var computed = store.results().of(p.id());
        Map<String, Object> m = new HashMap<>();
        m.put("project", computed.project());
        m.put("level", l);
        m.put("levels", computed.model().levels());
        m.put("grid", computed.model().building().grid());
        m.put("loads", loads.findByLevel(p.id(), l.id()));
        m.put("form", form);
        m.put("units", UnitLabels.of(p.info().units()));
        m.put("occupancies", computed.model().building().context().catalogue().all());
        ctx.render(template, m);
    }

    private String path(Project p, StoredLevel l) {
        return "/projects/" + p.id() + "/levels/" + l.id() + "/" + segment;
    }
}
